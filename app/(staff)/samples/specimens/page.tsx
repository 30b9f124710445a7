import { IgnoredValues } from "@/components/lists/ignored-values";
import { ListCard } from "@/components/lists/list-card";
import { ListRows, type ListColumn } from "@/components/lists/list-rows";
import { ListFilterBar } from "@/components/lists/list-filter-bar";
import { Pager } from "@/components/lists/pager";
import { SampleTabs } from "@/components/lists/sample-tabs";
import { SortHeader } from "@/components/lists/sort-header";
import { stateTagParts } from "@/components/ui/state-tag";
import { formatDateTime } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { readFilterSelection } from "@/lib/server/lists/list-filter-options";
import { listSpecimens } from "@/lib/server/lists/list-specimens";
import { listQueryToFilterParts, parseListQuery, type RawSearchParams } from "@/lib/validation/list-query";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Samples: specimens" };

const BASE = "/samples/specimens";
const SPECIMEN_COLUMNS: ListColumn[] = [{ href: "/samples/specimens/", mono: true }, { href: "/samples/coupons/", subHref: "/samples/rolls/", mono: true }, {}, {}, {}, {}, {}, { mono: true }, { tag: true }];

export default async function SpecimensPage({ searchParams }: { searchParams: Promise<RawSearchParams> }) {
  const actor = await requirePageUser("sample.view");
  const zone = await getLabTimeZone();
  const { query, ignored } = parseListQuery("specimens", await searchParams);
  const [list, options] = await Promise.all([listSpecimens({ actor, query }), readFilterSelection({ actor, clientOrganizationId: query.clientOrganizationId, projectId: query.projectId })]);
  const sort = { kind: "specimens" as const, query, basePath: BASE };
  return (
    <>
      <h1>Samples</h1>
      <SampleTabs current="specimens" />
      <ListFilterBar {...listQueryToFilterParts("specimens", query)} client={options.client} project={options.project} show="state" dateLabel="Prepared" searchHint="P26-00003, C26-…, R26-… or a roll number" />
      <IgnoredValues ignored={ignored} />
      <ListCard
        title="Specimens" total={list.total} testId="specimen-list" empty="No specimen matches these filters."
        pager={<Pager kind="specimens" query={query} total={list.total} pageCount={list.pageCount} basePath={BASE} noun="specimens" />}
      >
        <table className="list">
          <thead>
            <tr>
              <SortHeader label="Lab number" column="labNumber" {...sort} /><th>Coupon / roll</th><th>Method</th><th>Die ⌀ (mm)</th><th>Thickness (mm)</th>
              <th>Prepared by</th><SortHeader label="Prepared" column="prepared" {...sort} /><th>Where</th><SortHeader label="State" column="state" {...sort} />
            </tr>
          </thead>
          <ListRows
            columns={SPECIMEN_COLUMNS}
            rows={list.rows.map((s) => [
              s.labNumber, [s.couponLabNumber, s.rollLabNumber], s.intendedMethodCode, String(s.dieDiameterMm), String(s.initialThicknessMm),
              s.preparedByName, formatDateTime(s.preparedAt, zone), s.locationCode, stateTagParts(s.state),
            ])}
          />
        </table>
      </ListCard>
    </>
  );
}

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
import { listCoupons } from "@/lib/server/lists/list-coupons";
import { readFilterSelection } from "@/lib/server/lists/list-filter-options";
import { listQueryToFilterParts, parseListQuery, type RawSearchParams } from "@/lib/validation/list-query";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Samples: coupons" };

const BASE = "/samples/coupons";
const COUPON_COLUMNS: ListColumn[] = [{ href: "/samples/coupons/", mono: true }, { href: "/samples/rolls/", mono: true }, {}, {}, {}, {}, {}, { mono: true }, { tag: true }];

export default async function CouponsPage({ searchParams }: { searchParams: Promise<RawSearchParams> }) {
  const actor = await requirePageUser("sample.view");
  const zone = await getLabTimeZone();
  const { query, ignored } = parseListQuery("coupons", await searchParams);
  const [list, options] = await Promise.all([listCoupons({ actor, query }), readFilterSelection({ actor, clientOrganizationId: query.clientOrganizationId, projectId: query.projectId })]);
  const sort = { kind: "coupons" as const, query, basePath: BASE };
  return (
    <>
      <h1>Samples</h1>
      <SampleTabs current="coupons" />
      <ListFilterBar {...listQueryToFilterParts("coupons", query)} client={options.client} project={options.project} show="state" dateLabel="Cut" searchHint="C26-00007, R26-00042 or a roll number" />
      <IgnoredValues ignored={ignored} />
      <ListCard
        title="Coupons" total={list.total} testId="coupon-list" empty="No coupon matches these filters."
        pager={<Pager kind="coupons" query={query} total={list.total} pageCount={list.pageCount} basePath={BASE} noun="coupons" />}
      >
        <table className="list">
          <thead>
            <tr>
              <SortHeader label="Lab number" column="labNumber" {...sort} /><th>Roll</th><th>Position</th><th>Size (mm)</th>
              <th>Cut by</th><SortHeader label="Cut" column="cut" {...sort} /><th>Specimens</th><th>Where</th><SortHeader label="State" column="state" {...sort} />
            </tr>
          </thead>
          <ListRows
            columns={COUPON_COLUMNS}
            rows={list.rows.map((c) => [
              c.labNumber, c.rollLabNumber, c.positionInSample, `${c.lengthMm} × ${c.widthMm}`, c.cutByName,
              formatDateTime(c.cutAt, zone), String(c.specimenCount), c.locationCode, stateTagParts(c.state),
            ])}
          />
        </table>
      </ListCard>
    </>
  );
}

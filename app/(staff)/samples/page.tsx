import { IgnoredValues } from "@/components/lists/ignored-values";
import { ListCard } from "@/components/lists/list-card";
import { ListRows, type ListColumn } from "@/components/lists/list-rows";
import { ListFilterBar } from "@/components/lists/list-filter-bar";
import { Pager } from "@/components/lists/pager";
import { SampleTabs } from "@/components/lists/sample-tabs";
import { SortHeader } from "@/components/lists/sort-header";
import { stateTagParts } from "@/components/ui/state-tag";
import { formatDate } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { readFilterSelection } from "@/lib/server/lists/list-filter-options";
import { listRolls } from "@/lib/server/lists/list-rolls";
import { listQueryToFilterParts, parseListQuery, type RawSearchParams } from "@/lib/validation/list-query";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Samples: rolls" };

const BASE = "/samples";
const ROLL_COLUMNS: ListColumn[] = [{ href: "/samples/rolls/", mono: true }, {}, {}, {}, { mono: true }, {}, { mono: true }, { tag: true }];

export default async function SamplesPage({ searchParams }: { searchParams: Promise<RawSearchParams> }) {
  const actor = await requirePageUser("sample.view");
  const zone = await getLabTimeZone();
  const { query, ignored } = parseListQuery("rolls", await searchParams);
  const [list, options] = await Promise.all([listRolls({ actor, query }), readFilterSelection({ actor, clientOrganizationId: query.clientOrganizationId, projectId: query.projectId })]);
  const sort = { kind: "rolls" as const, query, basePath: BASE };
  return (
    <>
      <h1>Samples</h1>
      <SampleTabs current="rolls" />
      <ListFilterBar {...listQueryToFilterParts("rolls", query)} client={options.client} project={options.project} show="state" dateLabel="Received" searchHint="R26-00042 or a roll number" />
      <IgnoredValues ignored={ignored} />
      <ListCard
        title="Rolls" total={list.total} testId="roll-list" empty="No roll matches these filters."
        pager={<Pager kind="rolls" query={query} total={list.total} pageCount={list.pageCount} basePath={BASE} noun="rolls" />}
      >
        <table className="list">
          <thead>
            <tr>
              <SortHeader label="Lab number" column="labNumber" {...sort} /><SortHeader label="Roll / lot" column="rollNumber" {...sort} /><th>Client / project</th>
              <th>Product</th><SortHeader label="Received" column="received" {...sort} /><th>Coupons</th><th>Where</th><SortHeader label="State" column="state" {...sort} />
            </tr>
          </thead>
          <ListRows
            columns={ROLL_COLUMNS}
            rows={list.rows.map((r) => [
              r.labNumber, [r.rollNumber, `lot ${r.lotNumber}`], [r.clientName, r.projectName], r.product,
              [formatDate(r.receivedAt, zone), r.shipmentLabNumber], String(r.couponCount), r.locationCode, stateTagParts(r.state),
            ])}
          />
        </table>
      </ListCard>
    </>
  );
}

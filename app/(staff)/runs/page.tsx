import Link from "next/link";
import { IgnoredValues } from "@/components/lists/ignored-values";
import { ListCard } from "@/components/lists/list-card";
import { ListRows, type ListColumn } from "@/components/lists/list-rows";
import { Pager } from "@/components/lists/pager";
import { SortHeader } from "@/components/lists/sort-header";
import { RunListFilters } from "@/components/runs/run-list-filters";
import { stateTagParts } from "@/components/ui/state-tag";
import { formatDate } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { readFilterSelection } from "@/lib/server/lists/list-filter-options";
import { listRunFilterChoices, listRunPage } from "@/lib/server/lists/list-runs";
import { listQueryToFilterParts, listQueryToSearch, parseListQuery, type RawSearchParams } from "@/lib/validation/list-query";

export const metadata = { title: "Runs" };

const BASE = "/runs";
const RUN_COLUMNS: ListColumn[] = [{ href: "/runs/", mono: true }, {}, { mono: true }, {}, { mono: true }, {}, {}, { tag: true }];

/** Every run, paged, filtered and sorted on the server; a technician has a link to their own. */
export default async function RunsPage({ searchParams }: { searchParams: Promise<RawSearchParams> }) {
  const actor = await requirePageUser("run.view");
  const zone = await getLabTimeZone();
  const { query, ignored } = parseListQuery("runs", await searchParams);
  const operates = can(actor.role, "run.operate");
  const [list, choices, options] = await Promise.all([listRunPage({ actor, query }), listRunFilterChoices({ actor }), readFilterSelection({ actor, clientOrganizationId: query.clientOrganizationId })]);
  const sort = { kind: "runs" as const, query, basePath: BASE };
  const mine = operates && query.technicianId === actor.id;
  return (
    <>
      <div className="page-head">
        <div>
          <h1>{mine ? "My runs" : "Runs"}</h1>
          <p className="muted">
            Hydraulic tests, newest first.{" "}
            {operates && (mine ? <Link href={BASE}>Show everyone&apos;s runs</Link> : <Link href={`${BASE}${listQueryToSearch("runs", { technicianId: actor.id })}`}>Show only mine</Link>)}
          </p>
        </div>
        {operates && <div className="links"><Link className="button" href="/runs/new">Start a run</Link></div>}
      </div>
      <RunListFilters {...listQueryToFilterParts("runs", query)} choices={choices} client={options.client} basePath={BASE} />
      <IgnoredValues ignored={ignored} />
      <ListCard
        title={mine ? "My runs" : "Runs"} total={list.total} testId="run-list" empty="No run matches these filters."
        pager={<Pager kind="runs" query={query} total={list.total} pageCount={list.pageCount} basePath={BASE} noun="runs" />}
      >
        <table className="list">
          <thead>
            <tr>
              <SortHeader label="Run" column="labNumber" {...sort} /><th>Method</th><th>Specimen</th><th>Client</th><th>Cell</th>
              <SortHeader label="Mounted" column="mounted" {...sort} /><th>Technician</th><SortHeader label="State" column="state" {...sort} />
            </tr>
          </thead>
          <ListRows
            columns={RUN_COLUMNS}
            rows={list.rows.map((r) => [
              r.labNumber, `ASTM ${r.methodCode}`, r.specimenLabNumber, r.clientName, r.cellAssetTag, formatDate(r.assignedAt, zone), r.technicianName,
              stateTagParts(r.state, "run"),
            ])}
          />
        </table>
      </ListCard>
    </>
  );
}

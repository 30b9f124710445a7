import Link from "next/link";
import { IgnoredValues } from "@/components/lists/ignored-values";
import { ListCard } from "@/components/lists/list-card";
import { ListRows, type ListColumn } from "@/components/lists/list-rows";
import { ListFilterBar } from "@/components/lists/list-filter-bar";
import { Pager } from "@/components/lists/pager";
import { SortHeader } from "@/components/lists/sort-header";
import { formatDateTime } from "@/lib/format/dates";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { readFilterSelection } from "@/lib/server/lists/list-filter-options";
import { listShipments } from "@/lib/server/lists/list-shipments";
import { can } from "@/lib/policy/permissions";
import { listQueryToFilterParts, parseListQuery, type RawSearchParams } from "@/lib/validation/list-query";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Intake" };

const BASE = "/intake";
const SHIPMENT_COLUMNS: ListColumn[] = [{ href: "/intake/shipments/", mono: true }, {}, {}, {}, {}, { tag: true }];

export default async function IntakePage({ searchParams }: { searchParams: Promise<RawSearchParams> }) {
  const actor = await requirePageUser("shipment.view");
  const zone = await getLabTimeZone();
  const { query, ignored } = parseListQuery("shipments", await searchParams);
  const [list, options] = await Promise.all([listShipments({ actor, query }), readFilterSelection({ actor, clientOrganizationId: query.clientOrganizationId, projectId: query.projectId })]);
  const sort = { kind: "shipments" as const, query, basePath: BASE };
  return (
    <>
      <h1>Intake</h1>
      <p className="muted">Shipments as they arrived at the door, newest first.</p>
      <ListFilterBar {...listQueryToFilterParts("shipments", query)} client={options.client} project={options.project} show="acknowledged" dateLabel="Received" searchHint="S26-00012 or a roll number" />
      <IgnoredValues ignored={ignored} />
      <ListCard
        title="Shipments" total={list.total} testId="shipment-list"
        empty="No shipment matches these filters."
        actions={can(actor.role, "shipment.create") && <Link className="button" href="/intake/new">Log a shipment</Link>}
        pager={<Pager kind="shipments" query={query} total={list.total} pageCount={list.pageCount} basePath={BASE} noun="shipments" />}
      >
        <table className="list">
          <thead>
            <tr>
              <SortHeader label="Shipment" column="labNumber" {...sort} /><th>Client / project</th><SortHeader label="Received" column="received" {...sort} />
              <th>Delivered by</th><th>Rolls</th><th>Receipt</th>
            </tr>
          </thead>
          <ListRows
            columns={SHIPMENT_COLUMNS}
            rows={list.rows.map((s) => [
              s.labNumber, [s.clientName, s.projectName], formatDateTime(s.receivedAt, zone), [s.deliveredBy, s.conditionNotes || null], String(s.rollCount),
              s.acknowledgedAt ? ["acknowledged", "state-ok"] : ["to acknowledge", "state-warn"],
            ])}
          />
        </table>
      </ListCard>
    </>
  );
}

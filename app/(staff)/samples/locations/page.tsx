import { SampleTabs } from "@/components/lists/sample-tabs";
import { LocationForm } from "@/components/samples/location-form";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listStorageLocations } from "@/lib/server/samples/list-storage-locations";

export const metadata = { title: "Storage locations" };

export default async function LocationsPage() {
  const actor = await requirePageUser("sample.view");
  const locations = await listStorageLocations({ actor });
  return (
    <>
      <h1>Storage locations</h1>
      <SampleTabs current="locations" />
      <p className="muted">Where rolls, coupons and specimens are kept. Every move between them is a custody event.</p>
      <div className="grid" style={{ gridTemplateColumns: "minmax(0, 2fr) minmax(280px, 1fr)" }}>
        <section className="card">
          <table className="list" data-testid="location-list">
            <thead><tr><th>Code</th><th>Name</th><th>Rolls</th><th>Coupons</th><th>Specimens</th><th>In use</th></tr></thead>
            <tbody>{locations.map((l) => (
              <tr key={l.id}><td className="mono">{l.code}</td><td>{l.name}<div className="muted">{l.description}</div></td><td>{l._count.rolls}</td><td>{l._count.coupons}</td><td>{l._count.specimens}</td><td>{l.active ? "yes" : "no"}</td></tr>
            ))}</tbody>
          </table>
        </section>
        {can(actor.role, "location.manage") && <section className="card"><h2>New location</h2><LocationForm /></section>}
      </div>
    </>
  );
}

import Link from "next/link";
import { CreateClientForm } from "@/components/clients/create-client-form";
import { ActiveTag } from "@/components/ui/active-tag";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listClientOrganizations } from "@/lib/server/clients/list-client-organizations";
import { ScrollArea } from "@/components/ui/scroll-area";

export const metadata = { title: "Clients" };

export default async function ClientsPage() {
  const actor = await requirePageUser("client.manage");
  const clients = await listClientOrganizations({ actor });
  return (
    <>
      <h1>Clients</h1>
      <p className="muted">The organisations the lab tests for, with their contacts, portal users and projects. Clients are deactivated, never deleted, so their records stay.</p>
      <div className="grid" style={{ gridTemplateColumns: "minmax(0, 2fr) minmax(300px, 1fr)" }}>
        <section className="card">
          <h2>Client organisations <span className="count">{clients.length}</span></h2>
          <ScrollArea>
            <table className="list" data-testid="client-list">
              <thead><tr><th>Code</th><th>Name</th><th>Projects</th><th>Contacts</th><th>Portal users</th><th>Status</th></tr></thead>
              <tbody>
                {clients.map((c) => (
                  <tr key={c.id} data-code={c.code}>
                    <td><Link className="mono" href={`/admin/clients/${c.code}`}>{c.code}</Link></td>
                    <td>{c.name}{c.address && <div className="muted">{c.address}</div>}</td>
                    <td>{c._count.projects}</td><td>{c._count.contacts}</td><td>{c._count.users}</td>
                    <td><ActiveTag active={c.active} /></td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
        </section>
        <section className="card">
          <h2>New client</h2>
          <CreateClientForm />
        </section>
      </div>
    </>
  );
}

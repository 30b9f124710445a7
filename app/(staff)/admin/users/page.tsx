import { CreateUserForm } from "@/components/users/create-user-form";
import { ActiveTag } from "@/components/ui/active-tag";
import { ChangeRoleForm } from "@/components/users/change-role-form";
import { UserRowActions } from "@/components/users/user-row-actions";
import { formatDate } from "@/lib/format/dates";
import { ROLE_LABELS } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listClientOrganizationsForSelect, listUsers } from "@/lib/server/users/list-users";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { ScrollArea } from "@/components/ui/scroll-area";

export const metadata = { title: "People" };

export default async function UsersPage() {
  const actor = await requirePageUser("user.manage");
  const zone = await getLabTimeZone();
  const [users, organizations] = await Promise.all([listUsers({ actor }), listClientOrganizationsForSelect({ actor })]);
  return (
    <>
      <h1>People</h1>
      <p className="muted">Accounts of lab staff and client contacts. Accounts are deactivated, never deleted, so the records they signed keep their names.</p>
      <div className="grid" style={{ gridTemplateColumns: "minmax(0, 2fr) minmax(300px, 1fr)" }}>
        <section className="card">
          <h2>Accounts <span className="count">{users.length}</span></h2>
          <ScrollArea>
            <table className="list" data-testid="user-list">
              <thead><tr><th>Name</th><th>Role</th><th>Since</th><th>Status</th><th><span className="visually-hidden">Actions</span></th></tr></thead>
              <tbody>
                {users.map((u) => (
                  <tr key={u.id} data-email={u.email}>
                    <td>{u.name}<div className="muted">{u.email}</div></td>
                    <td>{ROLE_LABELS[u.role]}{u.clientOrganization && <div className="muted">{u.clientOrganization.name}</div>}</td>
                    <td>{formatDate(u.createdAt, zone)}</td>
                    <td><ActiveTag active={u.active} /></td>
                    <td>{u.id !== actor.id && <><UserRowActions userId={u.id} active={u.active} version={u.version} name={u.name} /><ChangeRoleForm userId={u.id} version={u.version} name={u.name} role={u.role} clientOrganizationId={u.clientOrganizationId} organizations={organizations} /></>}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
        </section>
        <section className="card">
          <h2>New account</h2>
          <CreateUserForm organizations={organizations} />
        </section>
      </div>
    </>
  );
}

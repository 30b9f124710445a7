import Link from "next/link";
import { notFound } from "next/navigation";
import { AddContactForm } from "@/components/clients/add-contact-form";
import { AddProjectForm } from "@/components/clients/add-project-form";
import { ClientDetailsForm } from "@/components/clients/client-details-form";
import { EditContactForm } from "@/components/clients/edit-contact-form";
import { EditProjectForm } from "@/components/clients/edit-project-form";
import { ActiveTag } from "@/components/ui/active-tag";
import { isAppError } from "@/lib/errors/app-error";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getClientOrganization } from "@/lib/server/clients/get-client-organization";
import { ScrollArea } from "@/components/ui/scroll-area";

type Props = { params: Promise<{ code: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Client ${decodeURIComponent((await params).code)}` };
}

export default async function ClientPage({ params }: Props) {
  const actor = await requirePageUser("client.manage");
  const code = decodeURIComponent((await params).code);
  const org = await getClientOrganization({ actor, code }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  return (
    <>
      <p className="muted"><Link href="/admin/clients">Clients</Link> ›</p>
      <div className="page-head">
        <div>
          <h1>{org.name} <span className="mono muted">{org.code}</span> <ActiveTag active={org.active} /></h1>
          <p className="muted">{org.projects.length} project{org.projects.length === 1 ? "" : "s"} · {org.contacts.filter((c) => c.active).length} active contact{org.contacts.length === 1 ? "" : "s"}</p>
        </div>
      </div>
      <div className="stack-gap">
        <div className="grid">
          <section className="card"><h2>Details</h2><ClientDetailsForm clientOrganizationId={org.id} version={org.version} name={org.name} address={org.address ?? ""} active={org.active} /></section>
          <section className="card"><h2>New contact</h2>{org.active ? <AddContactForm clientOrganizationId={org.id} /> : <p className="empty">Reactivate the client to add contacts.</p>}</section>
        </div>
        <section className="card">
          <h2>Contacts <span className="count">{org.contacts.length}</span></h2>
          {org.contacts.length === 0 ? <p className="empty">No contact yet. A contact needs an e-mail address; with portal access they sign in to see this client&apos;s projects.</p> : (
            <ScrollArea>
              <table className="list" data-testid="client-contacts">
                <thead><tr><th>Name</th><th>E-mail</th><th>Phone</th><th>Portal</th><th>Status</th><th><span className="visually-hidden">Actions</span></th></tr></thead>
                <tbody>
                  {org.contacts.map((c) => (
                    <tr key={c.id} data-email={c.email}>
                      <td>{c.name}{c.jobTitle && <div className="muted">{c.jobTitle}</div>}</td>
                      <td>{c.email}</td><td>{c.phone ?? "—"}</td>
                      <td>{c.user ? (c.user.active ? "signs in" : "account deactivated") : "no account"}</td>
                      <td><ActiveTag active={c.active} /></td>
                      <td>
                        <details className="row-more">
                          <summary>Edit</summary>
                          <EditContactForm contactId={c.id} version={c.version} name={c.name} email={c.email} phone={c.phone ?? ""} jobTitle={c.jobTitle ?? ""} active={c.active} hasPortalAccount={!!c.user} />
                        </details>
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </ScrollArea>
          )}
          {org.users.length > 0 && <p className="muted">Portal users not listed as contacts: {org.users.map((u) => `${u.name} (${u.email}${u.active ? "" : ", deactivated"})`).join("; ")}.</p>}
        </section>
        <section className="card">
            <h2>Projects <span className="count">{org.projects.length}</span></h2>
            {org.projects.length === 0 ? <p className="empty">No project yet.</p> : (
              <ScrollArea>
                <table className="list" data-testid="client-projects">
                  <thead><tr><th>Code</th><th>Project and site</th><th>Specification</th><th>Shipments</th><th>Status</th><th><span className="visually-hidden">Actions</span></th></tr></thead>
                  <tbody>
                    {org.projects.map((p) => (
                      <tr key={p.id} data-code={p.code}>
                        <td className="mono">{p.code}</td>
                        <td>{p.name}<div className="muted">{p.siteName}{p.siteLocation ? `, ${p.siteLocation}` : ""}</div></td>
                        <td>{p.specifications[0] ? <Link href={`/specifications/${p.specifications[0].id}`}>{p.specifications[0].name}</Link> : <Link href="/specifications/new">none yet</Link>}</td>
                        <td>{p._count.shipments}<div><a href={`/api/projects/${encodeURIComponent(p.code)}/results-xlsx`} download data-testid="project-results-xlsx">Results (XLSX)</a></div></td>
                        <td><ActiveTag active={p.active} /></td>
                        <td>
                          <details className="row-more">
                            <summary>Edit</summary>
                            <EditProjectForm projectId={p.id} version={p.version} name={p.name} siteName={p.siteName} siteLocation={p.siteLocation ?? ""} active={p.active} />
                          </details>
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </ScrollArea>
            )}
        </section>
        <section className="card"><h2>New project</h2>{org.active ? <AddProjectForm clientOrganizationId={org.id} templates={org.templates} /> : <p className="empty">Reactivate the client to add projects.</p>}</section>
      </div>
    </>
  );
}

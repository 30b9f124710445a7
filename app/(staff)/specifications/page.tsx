import Link from "next/link";
import { LimitsTable } from "@/components/specifications/limits-table";
import styles from "@/components/specifications/specifications.module.css";
import { formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { listSpecifications } from "@/lib/server/specifications/list-specifications";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

export const metadata = { title: "Specifications" };

export default async function SpecificationsPage() {
  const actor = await requirePageUser("certificate.view");
  const zone = await getLabTimeZone();
  const { templates, projects } = await listSpecifications({ actor });
  const manage = can(actor.role, "specification.manage");
  return (
    <>
      <div className="page-head">
        <div className={styles.headText}>
          <h1>Specifications</h1>
          <p className="muted">The limits results are judged against: the lab's templates, and each project's own specification. A project's newest specification is the one its certificates apply; conformance is decided per ASTM E29, by rounding to the limit's last written place or absolutely, as each limit says.</p>
        </div>
        {manage && <div className="links"><Link className="button" href="/specifications/new">New project specification</Link></div>}
      </div>
      <div className="stack-gap">
        <section className="card" data-testid="templates">
          <h2>Lab templates <span className="count">{templates.length === 0 ? "none" : templates.length}</span></h2>
          {templates.length === 0 ? <p className="empty">No templates yet.</p> : templates.map((t) => (
            <div key={t.id} className={styles.specBlock}>
              <h3 className={styles.specTitle}><Link href={`/specifications/${t.id}`}>{t.name}</Link></h3>
              <LimitsTable limits={t.limits} />
            </div>
          ))}
        </section>
        <section className="card" data-testid="project-specifications">
          <h2>Projects <span className="count">{projects.length === 0 ? "none" : projects.length}</span></h2>
          {projects.length === 0 ? <p className="empty">No projects yet.</p> : projects.map((p) => (
            <div key={p.id} className={styles.specBlock} data-project={p.code}>
              <h3 className={styles.specTitle}>
                <span className="mono">{p.code}</span> {p.name} <span className={styles.projectMeta}>{p.clientOrganization.name} · {p.siteName}</span>
              </h3>
              {p.specifications.length === 0 ? (
                <p className="empty">
                  No specification yet, so its certificates state no conformance.{" "}
                  {manage && <Link href={`/specifications/new?projectId=${p.id}`}>Create one</Link>}
                </p>
              ) : p.specifications.map((s, i) => (
                <div key={s.id}>
                  <p>
                    <Link href={`/specifications/${s.id}`}>{s.name}</Link>{" "}
                    {i === 0 ? <span className="state state-ok">In use</span> : <span className="state state-warn">Superseded by a newer one</span>}{" "}
                    <span className="muted">created {formatDateTime(s.createdAt, zone)}</span>
                  </p>
                  {i === 0 && <LimitsTable limits={s.limits} testId={`limits-${p.code}`} />}
                </div>
              ))}
            </div>
          ))}
        </section>
      </div>
    </>
  );
}

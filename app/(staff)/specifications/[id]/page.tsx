import Link from "next/link";
import { notFound } from "next/navigation";
import { LimitForm } from "@/components/specifications/limit-form";
import { LimitsTable } from "@/components/specifications/limits-table";
import styles from "@/components/specifications/specifications.module.css";
import { TryValue } from "@/components/specifications/try-value";
import { RecordFacts } from "@/components/samples/record-facts";
import { isAppError } from "@/lib/errors/app-error";
import { formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getSpecification } from "@/lib/server/specifications/get-specification";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ id: string }> };

export const metadata = { title: "Specification" };

export default async function SpecificationPage({ params }: Props) {
  const actor = await requirePageUser("certificate.view");
  const zone = await getLabTimeZone();
  const { id } = await params;
  const spec = await getSpecification({ actor, id }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const manage = can(actor.role, "specification.manage");
  return (
    <>
      <p className="muted"><Link href="/specifications">Specifications</Link> ›</p>
      <div className="page-head">
        <div className={styles.headText}>
          <h1>
            {spec.name}{" "}
            {spec.isTemplate ? <span className="state">Lab template</span> : spec.inUse ? <span className="state state-ok">In use</span> : <span className="state state-warn">Superseded by a newer one</span>}
          </h1>
          <p className="muted">
            {spec.project ? <>Project <span className="mono">{spec.project.code}</span> {spec.project.name} · {spec.project.clientOrganization.name}</> : "Projects copy a template's limits when their specification is created from it."}
          </p>
        </div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <RecordFacts facts={[["Limits", String(spec.limits.length)], ["Created", formatDateTime(spec.createdAt, zone)], ["Last changed", formatDateTime(spec.updatedAt, zone)]]} />
          {!spec.isTemplate && !spec.inUse && <p className="notice notice-caution">This project has a newer specification; certificates apply that one, not this.</p>}
        </section>
        <section className="card">
          <h2>Limits <span className="count">{spec.limits.length === 0 ? "none" : spec.limits.length}</span></h2>
          <LimitsTable limits={spec.limits} testId="specification-limits" />
        </section>
        <div className="grid">
          <section className="card">
            <h2>Try a value</h2>
            <TryValue limits={spec.limits} />
          </section>
          {manage && (
            <section className="card">
              <h2>Add or change a limit</h2>
              <LimitForm specificationId={spec.id} limits={spec.limits} />
            </section>
          )}
        </div>
      </div>
    </>
  );
}

import Link from "next/link";
import { notFound } from "next/navigation";
import { ConformanceMatrixTable } from "@/components/conformance/conformance-matrix-table";
import { SamplingCoverageTable } from "@/components/conformance/sampling-coverage-table";
import { CertificateTable } from "@/components/portal/certificate-table";
import { ProjectRolls } from "@/components/portal/project-rolls";
import { ProjectShipments } from "@/components/portal/project-shipments";
import { isAppError } from "@/lib/errors/app-error";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getPortalProject } from "@/lib/server/portal/get-portal-project";
import { getProjectConformance } from "@/lib/server/conformance/get-project-conformance";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ code: string }> };

export const metadata = { title: "Project" };

export default async function PortalProjectPage({ params }: Props) {
  const actor = await requirePageUser("portal.view");
  const zone = await getLabTimeZone();
  const { code } = await params;
  // Another organisation's project is not found, exactly like one that does not exist.
  const [project, conformance] = await Promise.all([getPortalProject({ actor, projectCode: code }), getProjectConformance({ actor, projectCode: code })]).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  return (
    <>
      <div className="page-head">
        <div>
          <p className="muted"><Link href="/portal">Our projects</Link> /</p>
          <h1 data-testid="project-name">{project.name}</h1>
          <p className="muted"><span className="mono">{project.code}</span> · {project.siteName}{project.siteLocation ? `, ${project.siteLocation}` : ""}</p>
        </div>
      </div>
      <div className="stack-gap">
        <section className="card">
          <h2>Conformance to {conformance.specificationName ?? "the specification"}</h2>
          <ConformanceMatrixTable limits={conformance.limits} rows={conformance.rows} />
        </section>
        <section className="card">
          <h2>Sampling coverage</h2>
          <SamplingCoverageTable coverage={conformance.coverage} limits={conformance.limits} />
        </section>
        <section className="card">
          <h2>Rolls <span className="count">{project.rolls.length}</span></h2>
          <ProjectRolls zone={zone} rolls={project.rolls} />
        </section>
        <section className="card">
          <h2>Certificates <span className="count">{project.certificates.length === 0 ? "none yet" : project.certificates.length}</span></h2>
          {project.certificates.length === 0 ? (
            <p className="empty">No certificate has been issued for this project yet.</p>
          ) : (
            <CertificateTable zone={zone} certificates={project.certificates} />
          )}
        </section>
        <section className="card">
          <h2>Shipments received <span className="count">{project.shipments.length}</span></h2>
          <ProjectShipments zone={zone} shipments={project.shipments} />
        </section>
      </div>
    </>
  );
}

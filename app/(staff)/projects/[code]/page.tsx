import Link from "next/link";
import { notFound } from "next/navigation";
import { ConformanceMatrixTable } from "@/components/conformance/conformance-matrix-table";
import { SamplingCoverageTable } from "@/components/conformance/sampling-coverage-table";
import { isAppError } from "@/lib/errors/app-error";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getProjectConformance } from "@/lib/server/conformance/get-project-conformance";

type Props = { params: Promise<{ code: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Project ${(await params).code}` };
}

/** A project's whole conformance job: one verdict per roll against its specification, and the sampling coverage. */
export default async function ProjectConformancePage({ params }: Props) {
  const actor = await requirePageUser("sample.view");
  const { code } = await params;
  const data = await getProjectConformance({ actor, projectCode: decodeURIComponent(code) }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const failing = data.rows.filter((r) => r.verdict === "fails").length;
  const short = data.coverage.filter((c) => !c.covered).length;
  return (
    <>
      <div className="page-head">
        <div>
          <h1>{data.project.name} <span className="muted mono">{data.project.code}</span></h1>
          <p className="muted">{data.project.clientOrganization.name} · {data.project.siteName} · specification: {data.specificationName ?? "none yet"} (<Link href="/specifications">library</Link>)</p>
        </div>
      </div>
      <div className="stack-gap">
        {(failing > 0 || short > 0) && (
          <p className="notice notice-error" data-testid="project-attention">
            {failing > 0 && `${failing} roll${failing === 1 ? " does" : "s do"} not conform. `}
            {short > 0 && `${short} propert${short === 1 ? "y is" : "ies are"} short of the specification's testing frequency.`}
          </p>
        )}
        <section className="card"><h2>Conformance matrix</h2><ConformanceMatrixTable limits={data.limits} rows={data.rows} rollHref={(n) => `/samples/rolls/${n}`} /></section>
        <section className="card"><h2>Sampling coverage</h2><SamplingCoverageTable coverage={data.coverage} limits={data.limits} /></section>
      </div>
    </>
  );
}

import { notFound } from "next/navigation";
import { EditDraftForm } from "@/components/certificates/edit-draft-form";
import { IssueCertificateForm } from "@/components/certificates/issue-certificate-form";
import { ReviseCertificateForm } from "@/components/certificates/revise-certificate-form";
import { isAppError } from "@/lib/errors/app-error";
import { inSentence } from "@/lib/format/sentence-case";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { formatDateTime } from "@/lib/format/dates";
import { can } from "@/lib/policy/permissions";
import { formatPropertyValue } from "@/lib/format/result-numbers";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getCertificate } from "@/lib/server/certificates/get-certificate";
import { getDraftEditor } from "@/lib/server/certificates/get-draft-editor";
import { getLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";

type Props = { params: Promise<{ number: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Certificate ${(await params).number}` };
}

const STATUS_TONE: Record<string, string> = { ISSUED: "state-ok", SUPERSEDED: "state-warn", REVOKED: "state-bad", DRAFT: "" };

export default async function CertificatePage({ params }: Props) {
  const actor = await requirePageUser("certificate.view");
  const zone = await getLabTimeZone();
  const { number } = await params;
  const certificate = await getCertificate({ actor, number }).catch((error) => {
    if (isAppError(error) && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const mayIssue = can(actor.role, "certificate.issue");
  const latest = certificate.revisions[0];
  const draft = mayIssue && latest?.status === "DRAFT" ? await getDraftEditor({ actor, revisionId: latest.id }) : null;
  const included = new Set(draft?.content.resultIds ?? []);
  const includedIndex = new Set(draft?.content.indexResultIds ?? []);
  return (
    <>
      <h1>Certificate <span className="mono">{certificate.number}</span></h1>
      <p className="muted">{certificate.clientOrganization.name} · {certificate.project.name} ({certificate.project.code})</p>
      <div className="stack-gap">
        {certificate.revisions.map((r) => (
          <section key={r.id} className="card" data-testid={`revision-${r.revision}`}>
            <h2>Revision {r.revision} <span className={`state ${STATUS_TONE[r.status] ?? ""}`} data-testid={`revision-${r.revision}-status`}>{r.status.toLowerCase()}</span></h2>
            {r.reason && <p>Reason: {r.reason}</p>}
            <ul>
              {r.results.filter(({ result }) => (r.id === latest?.id && draft ? included.has(result.id) : !r.contents[0] || r.contents[0].resultIds.includes(result.id))).map(({ result }) => <li key={result.id}>{result.run.labNumber} · specimen {result.run.specimen.labNumber} · {result.property === "INDEX_FLUX" ? "index flux" : "hydraulic conductivity at 20 °C"} {formatPropertyValue(result.property, result.value, result.unit, actor.resultUnits ?? "SI").text}</li>)}
              {r.indexResults
                .map(({ indexTestResult: x }) => x)
                .filter((x) => (r.id === latest?.id && draft ? includedIndex.has(x.id) : !r.contents[0] || r.contents[0].indexResultIds.includes(x.id)))
                .map((x) => <li key={x.id}>roll {x.indexTest.roll.labNumber} · ASTM {x.indexTest.methodCode} · {inSentence(TEST_PROPERTY_LABELS[x.property])} {formatPropertyValue(x.property, x.value, x.unit, actor.resultUnits ?? "SI").text}</li>)}
            </ul>
            {r.issuedAt && (
              <p className="muted">
                Issued {formatDateTime(r.issuedAt, zone)} · signed by {r.signatures.map((s) => `${s.signer.name} (${s.meaning})`).join(", ")} · verification code <span className="mono" data-testid={`revision-${r.revision}-code`}>{r.verificationCode}</span> · {r.pdfSha256 ? <>SHA-256 <span className="mono" title={r.pdfSha256}>{r.pdfSha256.slice(0, 16)}…</span></> : "no PDF stored (a demo record; issue a new revision to produce one)"}
              </p>
            )}
            {r.status !== "DRAFT" && r.pdfSha256 && <p><a className="button button-quiet" href={`/api/certificates/${certificate.number}/pdf?revision=${r.revision}`} data-testid={`revision-${r.revision}-pdf`}>Download PDF</a> <a href={`/verify/${r.verificationCode}`}>Verification page</a></p>}
            {r.status === "DRAFT" && draft && r.id === latest?.id && (
              <div className="stack-gap" data-testid="draft-editor">
                <h3>Draft content <span className="count">version {draft.content.version}</span></h3>
                <EditDraftForm key={draft.content.version} revisionId={r.id} content={draft.content} results={draft.results} indexResults={draft.indexResults} specifications={draft.specifications} signatories={draft.signatories} />
                <p><a className="button button-quiet" href={`/api/certificates/${certificate.number}/preview?revision=${r.revision}`} target="_blank" rel="noopener" data-testid="draft-preview">Preview the PDF</a> <span className="muted">The certificate exactly as it would be issued now, marked DRAFT on every page.</span></p>
                {draft.problems.length > 0 && <div className="notice notice-caution" data-testid="draft-problems">{draft.problems.map((p) => <p key={p.message}>{p.message}</p>)}</div>}
                <IssueCertificateForm revisionId={r.id} />
              </div>
            )}
          </section>
        ))}
        {mayIssue && latest?.status === "ISSUED" && <section className="card"><h2>Correct this certificate</h2><ReviseCertificateForm certificateId={certificate.id} /></section>}
      </div>
    </>
  );
}

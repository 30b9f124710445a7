import "server-only";
import { certificatePdfFileName } from "@/lib/certificates/revision-standing";
import { formatDateTime } from "@/lib/format/dates";
import { certificateIssuedNotice } from "@/lib/notices/notice-texts";
import { getDb } from "../db/client";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { publicBaseUrl } from "../public-address";
import { sendNotice, type NoticeOutcome } from "./send-notice";

/**
 * Tells the client's active contacts that a certificate revision was issued, with its PDF attached and the
 * address that verifies it. Called after the issue has committed; never throws (the certificate stands
 * whether or not the e-mail goes), and sends at most once per revision.
 */
export async function notifyCertificateIssued(revisionId: string): Promise<NoticeOutcome> {
  try {
    const db = getDb();
    const revision = await db.certificateRevision.findUnique({
      where: { id: revisionId },
      select: {
        revision: true, status: true, reason: true, issuedAt: true, verificationCode: true, pdf: true,
        certificate: { select: { number: true, project: { select: { code: true, name: true } }, clientOrganization: { select: { name: true, contacts: { where: { active: true }, select: { email: true } } } } } },
      },
    });
    if (!revision || revision.status !== "ISSUED") return "failed";
    const [lab, zone] = await Promise.all([db.laboratory.findUnique({ where: { id: "lab" }, select: { name: true } }), readLabTimeZone(db)]);
    const { certificate } = revision;
    const base = publicBaseUrl();
    const text = certificateIssuedNotice({
      labName: lab?.name ?? "The laboratory",
      clientName: certificate.clientOrganization.name,
      number: certificate.number,
      revision: revision.revision,
      reason: revision.reason,
      projectCode: certificate.project.code,
      projectName: certificate.project.name,
      issuedAtText: formatDateTime(revision.issuedAt, zone),
      verifyUrl: `${base}/verify/${encodeURIComponent(revision.verificationCode)}`,
      portalUrl: `${base}/portal`,
    });
    return await sendNotice({
      ...text,
      key: `certificate-issued:${revisionId}`,
      kind: "certificate-issued",
      to: certificate.clientOrganization.contacts.map((c) => c.email),
      attachments: revision.pdf ? [{ filename: certificatePdfFileName(certificate.number, revision.revision, "ISSUED"), content: Buffer.from(revision.pdf), contentType: "application/pdf" }] : [],
    });
  } catch (error) {
    console.error("[notice] the certificate notice could not be prepared", error);
    return "failed";
  }
}

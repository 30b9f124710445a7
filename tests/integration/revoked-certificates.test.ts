import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { beforeAll, describe, expect, it } from "vitest";
import { CertificateTable } from "@/components/portal/certificate-table";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { verifyCertificate } from "@/lib/server/certificates/verify-certificate";
import { withActor } from "@/lib/server/db/transaction";
import { getCertificatePdf } from "@/lib/server/portal/get-portal-certificate-pdf";
import { listPortalCertificates } from "@/lib/server/portal/list-portal-certificates";
import { makeOrganization, makeProject, makeUser, unique } from "../support/factories";
import { issueRevision } from "../support/issue-certificate-revision";
import { failure } from "../support/refusals";

const DAY = 86_400_000;
let client: CurrentUser;
let qa: CurrentUser;
let admin: CurrentUser;
let number: string;
let codes: { superseded: string; revoked: string };
let revokedAt: Date;
let supersededAt: Date;

// A certificate corrected once (revision 1 superseded by revision 2), then withdrawn (revision 2 revoked).
beforeAll(async () => {
  const org = await makeOrganization();
  const project = await makeProject(org.id);
  [client, qa, admin] = await Promise.all([makeUser("CLIENT_USER", { clientOrganizationId: org.id }), makeUser("QA_MANAGER"), makeUser("LAB_ADMIN")]);
  number = unique("Q").toUpperCase();
  supersededAt = new Date(Date.now() - 4 * DAY);
  revokedAt = new Date(Date.now() - DAY);
  codes = await withActor(qa, async (tx) => {
    const certificate = await tx.certificate.create({ data: { number, projectId: project.id, clientOrganizationId: org.id } });
    const first = await issueRevision(tx, certificate.id, 1, { daysAgo: 6 });
    const second = await issueRevision(tx, certificate.id, 2, { supersedesId: first.id, daysAgo: 4 });
    await tx.certificateRevision.update({ where: { id: first.id }, data: { status: "SUPERSEDED", supersededAt } });
    await tx.certificateRevision.update({ where: { id: second.id }, data: { status: "REVOKED", revokedAt } });
    return { superseded: first.verificationCode, revoked: second.verificationCode };
  });
});

describe("a revoked certificate revision", () => {
  it("is refused to the client for download, by number and by revision, with the reason and date", async () => {
    const day = revokedAt.toISOString().slice(0, 10);
    for (const revision of [2, undefined]) {
      const refusal = await failure(getCertificatePdf({ actor: client, number, revision }));
      expect(refusal.code, `revision ${revision}`).toBe("GONE");
      expect(refusal.status).toBe(410);
      expect(refusal.message).toBe(
        `Certificate ${number} revision 2 was revoked on ${day}: the laboratory has withdrawn it and its results must not be relied on, so it is no longer offered for download. Ask the laboratory which certificate stands.`,
      );
    }
    // The superseded revision stays downloadable, under a name that says it no longer stands.
    expect(await getCertificatePdf({ actor: client, number, revision: 1 })).toMatchObject({ status: "SUPERSEDED", fileName: `${number}-rev1-superseded.pdf` });
  });

  it("is marked revoked in the client's certificate list, with no download link; the superseded one keeps its link", async () => {
    const [listed] = await listPortalCertificates({ actor: client });
    expect(listed!.revisions.map((r) => [r.revision, r.status, r.supersededByRevision])).toEqual([[2, "REVOKED", null], [1, "SUPERSEDED", 2]]);
    const html = renderToStaticMarkup(createElement(CertificateTable, { certificates: [listed!] }));
    const row = (revision: number) => new RegExp(`<tr[^>]*data-revision="${revision}"[^>]*>(.*?)</tr>`).exec(html)?.[1] ?? "";
    expect(row(2)).toContain(">Revoked<");
    expect(row(2)).toContain(`since ${revokedAt.toISOString().slice(0, 10)}`);
    expect(row(2)).toContain("withdrawn; not offered");
    expect(row(2)).not.toContain("/pdf");
    expect(row(1)).toContain(">Superseded by revision 2<");
    expect(row(1)).toContain(`href="/api/certificates/${number}/pdf?revision=1"`);
    expect(row(1)).toContain(">Download (superseded)<");
  });

  it("still reaches the laboratory's staff, named as revoked", async () => {
    for (const actor of [qa, admin]) {
      const file = await getCertificatePdf({ actor, number, revision: 2 });
      expect(file).toMatchObject({ status: "REVOKED", fileName: `${number}-rev2-REVOKED.pdf` });
      expect(file.pdf.toString("latin1")).toBe("%PDF-1.4 test");
    }
  });

  it("is answered as revoked, with the date, on the public verification page; the superseded one as superseded", async () => {
    expect(await verifyCertificate(codes.revoked)).toMatchObject({ status: "REVOKED", number, revision: 2, since: revokedAt, supersededBy: null });
    expect(await verifyCertificate(codes.superseded)).toMatchObject({ status: "SUPERSEDED", number, revision: 1, since: supersededAt, supersededBy: { revision: 2 } });
  });
});

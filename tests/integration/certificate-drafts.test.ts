import { writeFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import type { CertificateSnapshot } from "@/lib/certificates/certificate-snapshot";
import { withActor } from "@/lib/server/db/transaction";
import { buildCertificateSnapshot } from "@/lib/server/certificates/build-certificate-snapshot";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { editCertificateDraft } from "@/lib/server/certificates/edit-certificate-draft";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { listCertifiableResults } from "@/lib/server/certificates/list-certifiable-results";
import { getPortalProject } from "@/lib/server/portal/get-portal-project";
import { previewCertificateDraft } from "@/lib/server/certificates/preview-certificate-draft";
import { reviseCertificate } from "@/lib/server/certificates/revise-certificate";
import { findBrowser } from "../../e2e/support/find-browser";
import { db, makeUser, TEST_PASSWORD } from "../support/factories";
import { approvedRun } from "../support/approved-run";
import { failure } from "../support/refusals";

const SYSTEM = { id: "system:test" };
const browser = findBrowser();
if (!browser && process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("these tests issue certificates and need Chromium");


/** A project specification with the given limits (GRI-GCL3 values as cited in public specifications, DOMAIN.md). */
function makeSpecification(projectId: string, limits: Array<"INDEX_FLUX" | "HYDRAULIC_CONDUCTIVITY">) {
  const rows = { INDEX_FLUX: { property: "INDEX_FLUX" as const, limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM" as const, significantDigits: 1 }, HYDRAULIC_CONDUCTIVITY: { property: "HYDRAULIC_CONDUCTIVITY" as const, limitText: "5e-11", unit: "m/s", direction: "MAXIMUM" as const, significantDigits: 1 } };
  return withActor(SYSTEM, (tx) => tx.specification.create({ data: { name: `Spec ${limits.join(" + ")}`, revision: "Rev. C", projectId, limits: { create: limits.map((l) => rows[l]) } } }));
}

const draftOf = async (certificateId: string) => db().certificateRevision.findFirstOrThrow({ where: { certificateId }, orderBy: { revision: "desc" } });
const contentCount = async (revisionId: string) => db().certificateDraftContent.count({ where: { revisionId } });

describe("certificate drafts", () => {
  it("prints results in the units the project's specification writes its limits in (cm/s), converted exactly", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { project, k } = await approvedRun(technician.id, qa);
    // GRI-GCL3's 5e-11 m/s as a client's specification writes it: 5e-9 cm/s (DOMAIN.md).
    await withActor(SYSTEM, (tx) => tx.specification.create({ data: { name: "Spec in cm/s", projectId: project.id, limits: { create: [{ property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-9", unit: "cm/s", direction: "MAXIMUM", significantDigits: 1 }] } } }));
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [k] } });
    const draft = await draftOf(certificate.id);
    expect((await db().certificateDraftContent.findFirstOrThrow({ where: { revisionId: draft.id } })).unitSystem).toBe("CENTIMETRE");
    const snapshot = await db().$transaction((tx) => buildCertificateSnapshot(tx, { revisionId: draft.id, signer: qa, meaning: "Reviewed", now: new Date(), baseUrl: "http://localhost" }));
    const line = snapshot.tests[0]!.results[0]!;
    const stored = await db().result.findUniqueOrThrow({ where: { id: k } });
    // 1 m/s = 100 cm/s exactly; the display keeps two significant digits of the converted value.
    expect(line.display).toBe(`${(stored.value * 100).toExponential(1).replace(/e-(\d+)$/, (_, e: string) => ` × 10⁻${[...e].map((d) => "⁰¹²³⁴⁵⁶⁷⁸⁹"[Number(d)]).join("")}`)} cm/s`);
    expect(line.conformance).toMatchObject({ unit: "cm/s", limitText: "5e-9", conforms: true });
  });

  it("edits append content versions; a result left out is free for another certificate and is refused back while that one holds it", async () => {
    const [technician, qa, qa2] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER"), makeUser("QA_MANAGER")]);
    const { project, flux, k } = await approvedRun(technician.id, qa);
    const spec = await makeSpecification(project.id, ["INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY"]);
    const first = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [flux, k] } });
    const draft = await draftOf(first.id);
    expect(await db().certificateDraftContent.findFirstOrThrow({ where: { revisionId: draft.id } })).toMatchObject({ version: 1, resultIds: [flux, k], specificationId: spec.id });

    await editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 1, resultIds: [flux], specificationId: spec.id, remarks: "Flux only, as the client asked.", signatoryId: qa2.id, unitSystem: "CENTIMETRE" } });
    // Someone editing from the older version is told, and nothing is saved.
    const stale = await failure(editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 1, resultIds: [flux, k], unitSystem: "SI" } }));
    expect(stale.code).toBe("CONFLICT");
    expect(await contentCount(draft.id)).toBe(2);
    // The runtime role may add versions but never rewrite or remove one.
    await expect(db().$executeRawUnsafe(`UPDATE "CertificateDraftContent" SET remarks = 'x' WHERE "revisionId" = '${draft.id}'`)).rejects.toThrow(/permission denied/);
    await expect(db().$executeRawUnsafe(`DELETE FROM "CertificateDraftContent" WHERE "revisionId" = '${draft.id}'`)).rejects.toThrow(/permission denied/);

    // k20, left out of the first draft, is offered for a new certificate again and goes on a second one ...
    const offered = (await listCertifiableResults({ actor: qa })).flatMap((g) => g.results.map((r) => r.id));
    expect(offered).toContain(k);
    expect(offered).not.toContain(flux);
    const second = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [k] } });
    // ... so the first may not take it back while the second includes it; nothing is saved.
    const taken = await failure(editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 2, resultIds: [flux, k], unitSystem: "SI" } }));
    expect(taken.code).toBe("CONFLICT");
    expect(taken.message).toContain(second.number);
    expect(await contentCount(draft.id)).toBe(2);
    // The database holds the rule too, whatever the app checks.
    // (the trigger's refusal is a unique violation named result_on_one_live_certificate, which Prisma reports as such)
    await expect(withActor(qa, (tx) => tx.certificateDraftContent.create({ data: { revisionId: draft.id, version: 3, resultIds: [flux, k], createdById: qa.id } }))).rejects.toThrow(/Unique constraint failed|already on certificate/);
    expect(await contentCount(draft.id)).toBe(2);
  });

  it.skipIf(!browser)("refuses to issue a draft with no results or whose specification lacks a limit, then issues one that names its signatory", async () => {
    const [technician, qa, qa2] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER"), makeUser("QA_MANAGER")]);
    const { project, flux, k } = await approvedRun(technician.id, qa);
    const fluxOnly = await makeSpecification(project.id, ["INDEX_FLUX"]);
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [flux, k] } });
    const draft = await draftOf(certificate.id);

    const lacking = await failure(issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } }));
    expect(lacking.code).toBe("INVALID_INPUT");
    expect(lacking.message).toContain("Spec INDEX_FLUX sets no limit for hydraulic conductivity (20 °C)");

    await editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 1, resultIds: [], specificationId: fluxOnly.id, unitSystem: "SI" } });
    const empty = await failure(issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } }));
    expect(empty.message).toContain("The draft includes no results");
    const unchanged = await db().certificateRevision.findUniqueOrThrow({ where: { id: draft.id }, include: { signatures: true } });
    expect([unchanged.status, unchanged.signatures.length, unchanged.pdf]).toEqual(["DRAFT", 0, null]);

    await editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 2, resultIds: [flux], specificationId: fluxOnly.id, remarks: "Index flux only.", signatoryId: qa2.id, unitSystem: "SI" } });
    // The preview is the document as it would be issued, and writes nothing.
    const preview = await previewCertificateDraft({ actor: qa, number: certificate.number, revision: "1" });
    expect(preview.pdf.subarray(0, 4).toString()).toBe("%PDF");
    // SEEPLINE_KEEP_PDFS=dir keeps the preview and the issued PDF to look at (pdftoppm).
    if (process.env.SEEPLINE_KEEP_PDFS) writeFileSync(`${process.env.SEEPLINE_KEEP_PDFS}/draft-preview.pdf`, preview.pdf);
    expect(await contentCount(draft.id)).toBe(3);
    expect((await failure(issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } }))).code).toBe("FORBIDDEN");
    await issueCertificate({ actor: qa2, input: { revisionId: draft.id, password: TEST_PASSWORD } });
    const issuedRow = await db().certificateRevision.findUniqueOrThrow({ where: { id: draft.id } });
    if (process.env.SEEPLINE_KEEP_PDFS) writeFileSync(`${process.env.SEEPLINE_KEEP_PDFS}/issued.pdf`, issuedRow.pdf!);
    const snapshot = issuedRow.snapshot as CertificateSnapshot;
    expect(snapshot.tests.flatMap((t) => t.results.map((r) => r.property))).toEqual(["INDEX_FLUX"]);
    expect(snapshot).toMatchObject({ remarks: "Index flux only.", specification: { name: "Spec INDEX_FLUX", revision: "Rev. C" }, signatory: { name: qa2.name } });
    expect(snapshot.decisionRule).toContain("Index flux: ASTM E29 rounding method");
    expect(snapshot.tests[0]!.method.edition).toBe("D5887/D5887M-20");
    expect(snapshot.tests[0]!.specimen).toMatchObject({ dieDiameterMm: expect.any(Number), initialThicknessMm: expect.any(Number), postTestThicknessMm: 5.9, permeant: "de-aired water" });
    expect(snapshot.tests[0]!.dates!.permeationStartedAt).not.toBeNull();
    // Total head h = Δp / γw (DOMAIN.md; γw 9.81 kN/m³, common practice) with no burette levels recorded:
    // 14 kPa / 9.81 = 1.4271 m, beside the 14 kPa line-pressure difference; the gradient is h over 5.9 mm.
    expect(snapshot.tests[0]!.conditions.headKPa).toBeCloseTo(14, 9);
    expect(snapshot.tests[0]!.conditions.meanHeadM).toBeCloseTo(14 / 9.81, 4);
    expect(snapshot.tests[0]!.specimen!.gradient).toBeCloseTo(14 / 9.81 / 0.0059, 1);
    // Area of the die-cut specimen: A = pi d^2 / 4 (DOMAIN.md).
    expect(snapshot.tests[0]!.specimen!.areaMm2).toBeCloseTo((Math.PI * snapshot.tests[0]!.specimen!.dieDiameterMm ** 2) / 4, 9);
    expect(snapshot.tests[0]!.results[0]!.display).toMatch(/^\d\.\d × 10⁻[⁰¹²³⁴⁵⁶⁷⁸⁹]+ m³\/m²\/s$/);
    // Issued content is frozen: no new version joins it.
    await expect(withActor(qa, (tx) => tx.certificateDraftContent.create({ data: { revisionId: draft.id, version: 4, resultIds: [flux], createdById: qa.id } }))).rejects.toThrow(/cannot be changed/);
  }, 90_000);

  it.skipIf(!browser)("a revision without a reason is refused; one that changes a remark says so and why on its first page", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { project, flux, k } = await approvedRun(technician.id, qa);
    await makeSpecification(project.id, ["INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY"]);
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [flux, k] } });
    await issueCertificate({ actor: qa, input: { revisionId: (await draftOf(certificate.id)).id, password: TEST_PASSWORD } });

    const noReason = await failure(reviseCertificate({ actor: qa, input: { certificateId: certificate.id, reason: " " } }));
    expect(noReason.fieldErrors).toHaveProperty("reason");
    expect(await db().certificateRevision.count({ where: { certificateId: certificate.id } })).toBe(1);

    const revision2 = await reviseCertificate({ actor: qa, input: { certificateId: certificate.id, reason: "The remark on specimen preparation was missing" } });
    const content = await db().certificateDraftContent.findFirstOrThrow({ where: { revisionId: revision2.id } });
    await editCertificateDraft({ actor: qa, input: { revisionId: revision2.id, baseVersion: 1, resultIds: content.resultIds, specificationId: content.specificationId ?? "", remarks: "Specimens trimmed by die from the roll sample.", unitSystem: "SI" } });
    await issueCertificate({ actor: qa, input: { revisionId: revision2.id, password: TEST_PASSWORD } });
    const revised = await db().certificateRevision.findUniqueOrThrow({ where: { id: revision2.id } });
    if (process.env.SEEPLINE_KEEP_PDFS) writeFileSync(`${process.env.SEEPLINE_KEEP_PDFS}/revision2.pdf`, revised.pdf!);
    const snapshot = revised.snapshot as CertificateSnapshot;
    expect(snapshot.supersedes).toEqual({ revision: 1, reason: "The remark on specimen preparation was missing" });
    expect(snapshot.changes).toEqual(['Remarks changed; they now read: "Specimens trimmed by die from the roll sample."']);
  }, 90_000);

  it.skipIf(!browser)("the client's portal lists an issued certificate on a roll only when the final content includes the roll's result", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const kept = await approvedRun(technician.id, qa);
    const leftOut = await approvedRun(technician.id, qa, kept.project.id);
    const spec = await makeSpecification(kept.project.id, ["INDEX_FLUX"]);
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: kept.project.id, resultIds: [kept.flux, leftOut.flux] } });
    const draft = await draftOf(certificate.id);
    await editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 1, resultIds: [kept.flux], specificationId: spec.id, unitSystem: "SI" } });
    await issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } });

    const client = await makeUser("CLIENT_USER", { clientOrganizationId: kept.project.clientOrganizationId });
    const portal = await getPortalProject({ actor: client, projectCode: kept.project.code });
    const rollOf = async (runId: string) => (await db().run.findUniqueOrThrow({ where: { id: runId }, select: { specimen: { select: { coupon: { select: { roll: { select: { labNumber: true } } } } } } } })).specimen.coupon.roll.labNumber;
    const byRoll = Object.fromEntries(portal.rolls.map((r) => [r.labNumber, r]));
    expect(byRoll[await rollOf(kept.run.id)]!.certificateNumbers).toEqual([certificate.number]);
    expect(byRoll[await rollOf(leftOut.run.id)]!.certificateNumbers).toEqual([]);
    expect(byRoll[await rollOf(leftOut.run.id)]!.progress.at(-1)!.status).not.toBe("done");
  }, 90_000);
});

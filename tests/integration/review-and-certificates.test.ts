import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { approveRun } from "@/lib/server/review/approve-run";
import { returnRun } from "@/lib/server/review/return-run";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { reviseCertificate } from "@/lib/server/certificates/revise-certificate";
import { findBrowser } from "../../e2e/support/find-browser";
import { db, makeUser, TEST_PASSWORD } from "../support/factories";
import { makePermeatingRun } from "../support/run-fixtures";
import { failure } from "../support/refusals";
import { withOwner } from "../support/owner";

const SYSTEM = { id: "system:test" };
const browser = findBrowser();
if (!browser && process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("these tests issue certificates and need Chromium");

/**
 * A run submitted for review with steady readings (volumes only, so constant head) that meet the D5887
 * criteria, its instruments calibrated with standard uncertainties (invented data).
 */
async function makeSubmittedRun(performerId: string, projectId?: string) {
  const { run, project } = await makePermeatingRun(performerId, projectId ? { projectId } : {});
  return withActor(SYSTEM, async (tx) => {
    const submitted = await tx.run.update({ where: { id: run.id }, data: { state: "SUBMITTED", terminatedAt: new Date(), terminationKind: "CRITERIA_MET", postTestThicknessMm: 5.9, submittedAt: new Date() } });
    const stepMl = 2e-9 * ((Math.PI * 0.1 ** 2) / 4) * 21_600 * 1e6;
    await tx.reading.createMany({
      data: Array.from({ length: 8 }, (_, i) => ({ runId: run.id, sequence: i + 1, takenAt: new Date(), elapsedS: i * 21_600, inflowCumulativeMl: i * stepMl, outflowCumulativeMl: i * stepMl * 0.98, headPa: 14_000, temperatureC: 20, recordedById: performerId })),
    });
    return { run: submitted, project };
  });
}

describe("QA review", () => {
  it("refuses a QA manager approving their own run, in the policy and in the database", async () => {
    const qa = await makeUser("QA_MANAGER");
    const { run } = await makeSubmittedRun(qa.id);
    const refused = await failure(approveRun({ actor: qa, input: { runId: run.id, version: 1 } }));
    expect(refused.code).toBe("FORBIDDEN");
    expect(refused.message).toBe("You performed this run, so another QA manager must review it.");
    await expect(withActor(qa, (tx) => tx.review.create({ data: { runId: run.id, reviewerId: qa.id, decision: "APPROVED" } }))).rejects.toThrow(/cannot be approved by the person who performed it/);
    await expect(withActor(qa, (tx) => tx.result.create({ data: { runId: run.id, property: "INDEX_FLUX", value: 1e-9, unit: "m3/m2/s", approvedById: qa.id, approvedAt: new Date() } }))).rejects.toThrow(/cannot be approved by the person who performed/);
  });

  it("returns a run with comments the technician sees, and approves another into results with uncertainty", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const first = await makeSubmittedRun(technician.id);
    expect((await failure(returnRun({ actor: qa, input: { runId: first.run.id, version: 1, comments: "" } }))).fieldErrors).toHaveProperty("comments");
    await returnRun({ actor: qa, input: { runId: first.run.id, version: 1, comments: "Reading 3 looks like a refill" } });
    expect(await db().run.findUniqueOrThrow({ where: { id: first.run.id }, include: { reviews: true } })).toMatchObject({ state: "RETURNED", reviews: [{ decision: "RETURNED", comments: "Reading 3 looks like a refill", reviewerId: qa.id }] });
    expect((await failure(approveRun({ actor: technician, input: { runId: first.run.id, version: 2 } }))).code).toBe("FORBIDDEN");

    const second = await makeSubmittedRun(technician.id);
    await approveRun({ actor: qa, input: { runId: second.run.id, version: 1 } });
    const results = await db().result.findMany({ where: { runId: second.run.id } });
    expect(results.map((r) => r.property).sort()).toEqual(["HYDRAULIC_CONDUCTIVITY", "INDEX_FLUX"]);
    const flux = results.find((r) => r.property === "INDEX_FLUX")!;
    expect(flux.value).toBeGreaterThan(1.9e-9);
    expect(flux.value).toBeLessThan(2.1e-9);
    expect(flux.expandedUncertainty).toBeGreaterThan(0);
    expect(flux.approvedById).toBe(qa.id);
    expect((await db().run.findUniqueOrThrow({ where: { id: second.run.id } })).state).toBe("APPROVED");
  });
});

describe.skipIf(!browser)("certificates", () => {
  it("issue with the password, freeze the issued revision, and supersede it by a signed correction", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { run, project } = await makeSubmittedRun(technician.id);
    await approveRun({ actor: qa, input: { runId: run.id, version: 1 } });
    const resultIds = (await db().result.findMany({ where: { runId: run.id }, select: { id: true } })).map((r) => r.id);
    expect((await failure(createCertificateDraft({ actor: technician, input: { projectId: project.id, resultIds } }))).code).toBe("FORBIDDEN");
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds } });
    const draft = await db().certificateRevision.findFirstOrThrow({ where: { certificateId: certificate.id } });

    expect((await failure(issueCertificate({ actor: qa, input: { revisionId: draft.id, password: "wrong one" } }))).fieldErrors).toHaveProperty("password");
    expect((await db().certificateRevision.findUniqueOrThrow({ where: { id: draft.id } })).status).toBe("DRAFT");

    const issued = await issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } });
    const stored = await db().certificateRevision.findUniqueOrThrow({ where: { id: draft.id }, include: { signatures: true } });
    expect(stored.status).toBe("ISSUED");
    expect(Buffer.from(stored.pdf!).subarray(0, 4).toString()).toBe("%PDF");
    expect(stored.pdfSha256).toBe(issued.pdfSha256);
    expect(stored.pdfSha256).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.signatures).toMatchObject([{ signerId: qa.id, signerRole: "QA_MANAGER" }]);
    expect((stored.snapshot as { number: string }).number).toBe(certificate.number);

    await expect(db().certificateRevision.update({ where: { id: draft.id }, data: { reason: "edited later" } })).rejects.toThrow(/issued and cannot be changed/);
    await expect(db().certificateRevision.delete({ where: { id: draft.id } })).rejects.toThrow(/permission denied/);
    await expect(withOwner(qa, (tx) => tx.certificateRevision.delete({ where: { id: draft.id } }))).rejects.toThrow(/cannot be deleted/);

    const revision2 = await reviseCertificate({ actor: qa, input: { certificateId: certificate.id, reason: "Client name spelt wrongly" } });
    await issueCertificate({ actor: qa, input: { revisionId: revision2.id, password: TEST_PASSWORD } });
    const revisions = await db().certificateRevision.findMany({ where: { certificateId: certificate.id }, orderBy: { revision: "asc" } });
    expect(revisions.map((r) => [r.revision, r.status])).toEqual([[1, "SUPERSEDED"], [2, "ISSUED"]]);
    expect(revisions[1]!.supersedesId).toBe(revisions[0]!.id);
    expect(revisions[0]!.pdfSha256).toBe(issued.pdfSha256);

  }, 90_000);
});

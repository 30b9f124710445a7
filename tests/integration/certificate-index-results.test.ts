import { describe, expect, it } from "vitest";
import { buildCertificateSnapshot } from "@/lib/server/certificates/build-certificate-snapshot";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { reviseCertificate } from "@/lib/server/certificates/revise-certificate";
import { findBrowser } from "../../e2e/support/find-browser";
import { editCertificateDraft } from "@/lib/server/certificates/edit-certificate-draft";
import { getDraftEditor } from "@/lib/server/certificates/get-draft-editor";
import { listCertifiableResults } from "@/lib/server/certificates/list-certifiable-results";
import { recordIndexTest } from "@/lib/server/index-tests/record-index-test";
import { reviewIndexTest } from "@/lib/server/index-tests/review-index-test";
import { withActor } from "@/lib/server/db/transaction";
import { isUniqueViolation } from "@/lib/server/db/database-fault";
import { setSpecificationLimit } from "@/lib/server/specifications/set-specification-limit";
import { daysAgo } from "../support/custody-chain";
import { db, makeUser, TEST_PASSWORD } from "../support/factories";
import { makeIndexInstruments, OBSERVATIONS, receiveProjectRolls } from "../support/index-test-fixtures";
import { codeOf, failure } from "../support/refusals";

/**
 * Two rolls of one lot; the specification asks for swell index and fluid loss once per lot. Roll A's swell
 * index (27.5 mL/2 g, ASTM D5890) is approved, its fluid loss only recorded (awaiting review); roll B has none.
 */
async function scenario() {
  const [clerk, technician, qa] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
  const { project, rolls } = await receiveProjectRolls(clerk, 5, [{ lot: "L1", lengthM: 45, widthM: 4.5 }, { lot: "L1", lengthM: 45, widthM: 4.5 }]);
  const spec = await withActor(qa, (tx) => tx.specification.create({ data: { name: "Liner specification", revision: "Rev. 2", projectId: project.id } }));
  for (const l of [
    { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM" },
    { property: "FLUID_LOSS", limitText: "18", unit: "mL", direction: "MAXIMUM" },
  ] as const) await setSpecificationLimit({ actor: qa, input: { specificationId: spec.id, conformanceMethod: "ROUNDING", testingFrequencyPerLot: true, ...l } });
  const i = await makeIndexInstruments();
  const [a, b] = rolls as [(typeof rolls)[0], (typeof rolls)[0]];
  const input = (observations: { methodCode: string }, instruments: Record<string, string>) => ({ rollId: a.id, methodCode: observations.methodCode, testedAt: daysAgo(1).toISOString(), instruments, observations });
  const swell = await recordIndexTest({ actor: technician, input: input(OBSERVATIONS.D5890(), { balanceId: i.balanceId, cylinderId: i.cylinderId }) });
  const fluid = await recordIndexTest({ actor: technician, input: input(OBSERVATIONS.D5891(), { balanceId: i.balanceId, filterPressId: i.filterPressId, cylinderId: i.cylinderId }) });
  await reviewIndexTest({ actor: qa, input: { indexTestId: swell.id, version: 1, decision: "APPROVED" } });
  const swellResult = (await db().indexTestResult.findFirstOrThrow({ where: { indexTestId: swell.id } })).id;
  const fluidResult = (await db().indexTestResult.findFirstOrThrow({ where: { indexTestId: fluid.id } })).id;
  return { qa, project, a, b, swellResult, fluidResult };
}

const browser = findBrowser();
if (!browser && process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("these tests issue certificates and need Chromium");

const latestRevision = (certificateId: string) => db().certificateRevision.findFirstOrThrow({ where: { certificateId }, orderBy: { revision: "desc" } });

describe("index-test results on certificates", () => {
  it("a draft reports an approved index test with its method edition, specimens and E29 decision, and says why each other property is not reported", async () => {
    const { qa, project, a, b, swellResult } = await scenario();
    const offered = (await listCertifiableResults({ actor: qa })).find((g) => g.project.id === project.id)!;
    expect(offered.indexResults.map((r) => r.id)).toEqual([swellResult]);
    expect(offered.limited).toEqual(expect.arrayContaining(["SWELL_INDEX", "FLUID_LOSS"]));

    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [swellResult] } });
    const revision = await latestRevision(certificate.id);
    const snapshot = await db().$transaction((tx) => buildCertificateSnapshot(tx, { revisionId: revision.id, signer: qa, meaning: "Reviewed", now: new Date(), baseUrl: "http://localhost" }));
    expect(snapshot.tests).toEqual([]);
    const test = snapshot.indexTests![0]!;
    // The edition the migration installs for D5890 (from memory), one 2 g specimen, 27.5 mL/2 g to three digits.
    expect(test.method).toEqual({ code: "D5890", title: "Swell index (ASTM D5890)", edition: "D5890-19" });
    expect(test.rollLabNumber).toBe(a.labNumber);
    expect(test.instruments).toHaveLength(2);
    // The report of a D5890 test gives the hydration time and the water's temperature (from memory of the
    // standard's reporting clause; fixture: 18 h, 21 °C).
    expect(test.conditions).toEqual(["Water at 21 °C; read after 18 h."]);
    expect(test.results[0]).toMatchObject({ property: "SWELL_INDEX", specimenCount: 1, conformance: { conforms: true, direction: "MINIMUM", method: "ROUNDING" } });
    expect(snapshot.decisionRule).toContain("Bentonite swell index: ASTM E29 rounding method");
    expect(snapshot.samples.map((s) => s.rollLabNumber)).toEqual([a.labNumber]);

    const coverage = snapshot.propertyCoverage!;
    expect(coverage.rows.map((r) => [r.rollLabNumber, r.cells.map((c) => c.status)])).toEqual([[a.labNumber, ["reported", "pending"]]]);
    expect(coverage.notTested).toEqual([`Bentonite fluid loss of ${a.labNumber}: pending: Fluid loss (ASTM D5891) awaits the QA manager's review.`]);
    expect(coverage.otherRolls).toEqual([b.labNumber]);
  });

  it("an index-test result is on one live certificate only; left out of a draft it is free again; an unapproved one is refused", async () => {
    const { qa, project, swellResult, fluidResult } = await scenario();
    const first = await createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [swellResult] } });
    const second = await failure(createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [swellResult] } }));
    expect(second.code).toBe("CONFLICT");
    expect(second.message).toContain(`already on certificate ${first.number}`);
    expect(await codeOf(createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [fluidResult] } }))).toBe("INVALID_INPUT");

    // The database refuses it too, whatever the code does: a second certificate's row for the same result.
    expect(await codeOf(createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [], resultIds: [] } }))).toBe("INVALID_INPUT");
    const loose = await withActor(qa, async (tx) => {
      const c = await tx.certificate.create({ data: { number: `C-TEST-${Date.now()}`, projectId: project.id, clientOrganizationId: project.clientOrganizationId } });
      return tx.certificateRevision.create({ data: { certificateId: c.id, revision: 1, verificationCode: `TEST-${Date.now()}` } });
    });
    const refused = await withActor(qa, (tx) => tx.certificateIndexResult.create({ data: { revisionId: loose.id, indexTestResultId: swellResult } })).then(() => null, (e: unknown) => e);
    expect(isUniqueViolation(refused, "result_on_live_certificate"), String(refused)).toBe(true);

    // Left out of the first draft (a new content version), the result may go on another certificate.
    const draft = await latestRevision(first.id);
    const editor = await getDraftEditor({ actor: qa, revisionId: draft.id });
    expect(editor.indexResults.map((r) => r.id)).toEqual([swellResult]);
    await editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 1, resultIds: [], indexResultIds: [], unitSystem: "SI" } });
    expect((await db().certificateIndexResult.count({ where: { revisionId: draft.id } }))).toBe(1);
    const taken = await createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [swellResult] } });
    // ...and then the first draft cannot take it back.
    const back = await failure(editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 2, resultIds: [], indexResultIds: [swellResult], unitSystem: "SI" } }));
    expect(back.message).toContain(`already on certificate ${taken.number}`);
  });

  it.skipIf(!browser)("a revision carries the index-test results on, can leave one out, and says so on its first page", async () => {
    const { qa, project, swellResult } = await scenario();
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [swellResult] } });
    await issueCertificate({ actor: qa, input: { revisionId: (await latestRevision(certificate.id)).id, password: TEST_PASSWORD } });
    // The issued revision still holds the result: another certificate cannot take it.
    expect((await failure(createCertificateDraft({ actor: qa, input: { projectId: project.id, indexResultIds: [swellResult] } }))).code).toBe("CONFLICT");
    await reviseCertificate({ actor: qa, input: { certificateId: certificate.id, reason: "Swell index to be reported on the lot's own certificate" } });
    const draft = await latestRevision(certificate.id);
    expect((await db().certificateDraftContent.findFirstOrThrow({ where: { revisionId: draft.id } })).indexResultIds).toEqual([swellResult]);
    await editCertificateDraft({ actor: qa, input: { revisionId: draft.id, baseVersion: 1, resultIds: [], indexResultIds: [], remarks: "Index results follow separately.", unitSystem: "SI" } });
    const snapshot = await db().$transaction((tx) => buildCertificateSnapshot(tx, { revisionId: draft.id, signer: qa, meaning: "Reviewed", now: new Date(), baseUrl: "http://localhost" }));
    expect(snapshot.changes).toEqual(expect.arrayContaining([expect.stringMatching(/^Removed: bentonite swell index of roll R\d{2}-\d{5} \(ASTM D5890\)\.$/)]));
  });
});

import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { approveRun } from "@/lib/server/review/approve-run";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { getDraftEditor } from "@/lib/server/certificates/get-draft-editor";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { listCertifiableResults } from "@/lib/server/certificates/list-certifiable-results";
import { db, makeUser, TEST_PASSWORD } from "../support/factories";
import { makePermeatingRun } from "../support/run-fixtures";
import { failure } from "../support/refusals";

const SYSTEM = { id: "system:test" };

/** An approved D5887 run (index flux and k20, invented steady readings) of a new project, with its two result ids. */
async function approvedRun(technicianId: string, qa: Parameters<typeof approveRun>[0]["actor"]) {
  const { run, project } = await makePermeatingRun(technicianId);
  await withActor(SYSTEM, async (tx) => {
    await tx.run.update({ where: { id: run.id }, data: { state: "SUBMITTED", terminatedAt: new Date(), terminationKind: "CRITERIA_MET", postTestThicknessMm: 5.9, submittedAt: new Date() } });
    const stepMl = 2e-9 * ((Math.PI * 0.1 ** 2) / 4) * 21_600 * 1e6;
    await tx.reading.createMany({
      data: Array.from({ length: 8 }, (_, i) => ({ runId: run.id, sequence: i + 1, takenAt: new Date(), elapsedS: i * 21_600, inflowCumulativeMl: i * stepMl, outflowCumulativeMl: i * stepMl * 0.98, headPa: 14_000, temperatureC: 20, recordedById: technicianId })),
    });
  });
  await approveRun({ actor: qa, input: { runId: run.id, version: 1 } });
  const results = await db().result.findMany({ where: { runId: run.id }, select: { id: true, property: true } });
  return { run, project, flux: results.find((r) => r.property === "INDEX_FLUX")!.id, k: results.find((r) => r.property === "HYDRAULIC_CONDUCTIVITY")!.id };
}

/** A project specification limiting only the properties given (invented values). */
function makeSpecification(projectId: string, name: string, limits: Array<"INDEX_FLUX" | "HYDRAULIC_CONDUCTIVITY">) {
  const rows = { INDEX_FLUX: { property: "INDEX_FLUX" as const, limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM" as const, significantDigits: 1 }, HYDRAULIC_CONDUCTIVITY: { property: "HYDRAULIC_CONDUCTIVITY" as const, limitText: "5e-11", unit: "m/s", direction: "MAXIMUM" as const, significantDigits: 1 } };
  return withActor(SYSTEM, (tx) => tx.specification.create({ data: { name, projectId, limits: { create: limits.map((l) => rows[l]) } } }));
}

describe("a result the chosen specification sets no limit for", () => {
  it("is marked beforehand, on the new-certificate screen and in the draft editor, with the words signing then refuses it with", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { run, project, flux, k } = await approvedRun(technician.id, qa);
    const both = await makeSpecification(project.id, "Both limits", ["INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY"]);
    const fluxOnly = await makeSpecification(project.id, "Flux only", ["INDEX_FLUX"]);
    const expected = `Flux only sets no limit for hydraulic conductivity (20 °C) (the result of ${run.labNumber}): choose a specification that does, or leave the result out.`;

    // The new-certificate screen judges by the newest specification, as a new draft does.
    const group = (await listCertifiableResults({ actor: qa })).find((g) => g.project.id === project.id)!;
    expect(group.noLimit).toEqual({ [k]: expected });

    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [flux, k] } });
    const draft = await db().certificateRevision.findFirstOrThrow({ where: { certificateId: certificate.id } });
    const editor = await getDraftEditor({ actor: qa, revisionId: draft.id });
    expect(editor.content.specificationId).toBe(fluxOnly.id);
    const byId = new Map(editor.results.map((r) => [r.id, r.noLimit]));
    expect(byId.get(k)).toEqual({ [fluxOnly.id]: expected });
    expect(byId.get(flux)).toEqual({});
    expect(byId.get(k)).not.toHaveProperty(both.id);

    const refused = await failure(issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } }));
    expect(refused.message).toBe(`Nothing was signed. ${expected}`);
  });
});

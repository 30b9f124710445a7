import { withActor } from "@/lib/server/db/transaction";
import { approveRun } from "@/lib/server/review/approve-run";
import { db } from "./factories";
import { makePermeatingRun } from "./run-fixtures";

const SYSTEM = { id: "system:test" };

/** An approved D5887 run (index flux and k20, invented steady readings) of a project (a new one unless named), with its two result ids. */
export async function approvedRun(technicianId: string, qa: Parameters<typeof approveRun>[0]["actor"], projectId?: string) {
  const { run, project } = await makePermeatingRun(technicianId, projectId ? { projectId } : {});
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

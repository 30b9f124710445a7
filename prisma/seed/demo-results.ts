// The demo's approved results, computed exactly as approval computes them (lib/evaluation, lib/results).
import type { TestMethod } from "@/lib/hydraulics";
import { resultRecord } from "@/lib/results/result-record";
import { resultsOfVerdict } from "@/lib/results/results-of-verdict";
import type { Tx } from "@/lib/server/db/transaction";
import { evaluateRunRecords } from "@/lib/server/runs/evaluate-run-records";

export async function recordDemoResults(tx: Tx, runId: string, approval: { approvedById: string; approvedAt: Date }) {
  const run = await tx.run.findUniqueOrThrow({ where: { id: runId }, select: { methodCode: true, labNumber: true } });
  const verdict = await evaluateRunRecords(tx, runId);
  if (!verdict.evaluation?.termination.met) throw new Error(`demo run ${run.labNumber} does not meet its criteria: ${verdict.reason ?? verdict.evaluation?.termination.criteria.filter((c) => !c.met).map((c) => c.message).join(" ")}`);
  const results = resultsOfVerdict(verdict, run.methodCode as TestMethod, { earlyEnd: false });
  const created = [];
  for (const r of results)
    created.push(
      await tx.result.create({
        data: {
          runId, property: r.property, value: r.value, unit: r.unit, expandedUncertainty: r.expandedUncertainty, temperatureC: r.temperatureC, unitWeightBasis: r.unitWeightBasis,
          methodSettingsVersionId: verdict.settings.versionId, evaluation: resultRecord(r.property, verdict, r.uncertaintyBudget, null), ...approval,
        },
      }),
    );
  return created;
}

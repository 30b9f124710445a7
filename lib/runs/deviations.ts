/**
 * The deviations a reviewer and the certificate must show for a run: anything done otherwise than the
 * method and the lab's procedure expect. Pure; the caller passes what it loaded.
 */
export function runDeviations(run: {
  terminationKind: string | null;
  terminationReason: string | null;
  calibrationOverrideReason: string | null;
  stages: ReadonlyArray<{ sequence: number; kind: string; marginAcknowledged: boolean }>;
  checklist: ReadonlyArray<{ question: string; answer: boolean }>;
  correctedReadings: number;
}): string[] {
  const deviations: string[] = [];
  if (run.terminationKind === "EARLY_END") deviations.push(`Permeation ended before the termination criteria were met: ${run.terminationReason ?? "no reason recorded"}.`);
  if (run.calibrationOverrideReason) deviations.push(`Equipment used past its calibration date with QA approval: ${run.calibrationOverrideReason}.`);
  for (const stage of run.stages)
    if (stage.marginAcknowledged) deviations.push(`Stage ${stage.sequence} (${stage.kind.toLowerCase().replace("_", "-")}) ran with less than the confining margin, acknowledged by the technician.`);
  for (const item of run.checklist) if (!item.answer) deviations.push(`Specimen preparation: "${item.question}" was answered no.`);
  if (run.correctedReadings > 0) deviations.push(`${run.correctedReadings} reading${run.correctedReadings === 1 ? " was" : "s were"} corrected after entry, with reasons kept in the record.`);
  return deviations;
}

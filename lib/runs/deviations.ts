/**
 * The deviations a reviewer and the certificate must show for a run: anything done otherwise than the
 * method and the lab's procedure expect. Pure; the caller passes what it loaded.
 */
export function runDeviations(run: {
  terminationKind: string | null;
  terminationReason: string | null;
  calibrationOverrideReason: string | null;
  stages: ReadonlyArray<{ sequence: number; kind: string; marginAcknowledged: boolean; departureNote?: string | null }>;
  checklist: ReadonlyArray<{ question: string; answer: boolean }>;
  correctedReadings: number;
  /** The statement of a leakage check at or above the method's limit, and who acknowledged it. */
  leakage?: { statement: string; acknowledgedBy: string | null } | null;
}): string[] {
  const deviations: string[] = [];
  if (run.terminationKind === "EARLY_END") deviations.push(`Permeation ended before the termination criteria were met: ${run.terminationReason ?? "no reason recorded"}.`);
  if (run.calibrationOverrideReason) deviations.push(`Equipment used past its calibration date with QA approval: ${run.calibrationOverrideReason}.`);
  for (const stage of run.stages) {
    if (!stage.marginAcknowledged) continue;
    const name = `Stage ${stage.sequence} (${stage.kind.toLowerCase().replace("_", "-")})`;
    // Stages recorded before departures were described only ever broke the confining margin.
    deviations.push(stage.departureNote ? `${name} departed from the method, acknowledged by the technician: ${stage.departureNote}` : `${name} ran with less than the confining margin, acknowledged by the technician.`);
  }
  for (const item of run.checklist) if (!item.answer) deviations.push(`Specimen preparation: "${item.question}" was answered no.`);
  if (run.leakage) deviations.push(`${run.leakage.statement}${run.leakage.acknowledgedBy ? ` Acknowledged by ${run.leakage.acknowledgedBy} at approval.` : ""}`);
  if (run.correctedReadings > 0) deviations.push(`${run.correctedReadings} reading${run.correctedReadings === 1 ? " was" : "s were"} corrected after entry, with reasons kept in the record.`);
  return deviations;
}

import "server-only";
import type { RunStep } from "@/lib/runs/run-state-machine";
import { stagePressureRules } from "@/lib/methods/hydraulic/hydraulic-settings-use";
import { checkStage } from "@/lib/runs/stage-pressure-check";
import { enteredPressureToPa } from "@/lib/units/pressure-entry";
import { AppError } from "@/lib/errors/app-error";
import { recordStageSchema } from "@/lib/validation/runs";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { loadSettingsInUse } from "../methods/settings-in-use";
import { parseOrThrow } from "../validation/parse";
import { advanceRun, loadRunForStep } from "./run-guards";

const STEP_FOR_KIND: Record<string, RunStep> = {
  SATURATION: "add-stage", BACK_PRESSURE: "add-stage", EQUILIBRATION: "start-equilibration", PERMEATION: "start-permeation",
};
/**
 * Records a saturation, back-pressure, equilibration or permeation stage with its three pressures, checked
 * by the run's method settings for that stage (lib/runs/stage-pressure-check.ts): the confining margin
 * before permeation; the prescribed pressures, the cell above the influent line and the equilibration
 * time at permeation. A departure is saved only when the technician has acknowledged it, and is then a
 * deviation on the certificate; a pressure above any instrument's rated maximum is refused outright.
 * Starting permeation puts the specimen (and its roll) under test.
 */
export async function recordStage(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(recordStageSchema, options.input);
  const pressures = {
    cellPa: enteredPressureToPa(input.cellPressure, input.pressureUnit),
    influentPa: enteredPressureToPa(input.influentPressure, input.pressureUnit),
    effluentPa: enteredPressureToPa(input.effluentPressure, input.pressureUnit),
  };
  return withActor(options.actor, async (tx) => {
    const { run, toState } = await loadRunForStep(tx, { actor: options.actor, runId: input.runId, version: input.version, step: STEP_FOR_KIND[input.kind]! });
    const settings = await loadSettingsInUse(tx, { ...run, settingsChosenBy: null });
    const instruments = await tx.runEquipment.findMany({ where: { runId: run.id }, select: { equipment: { select: { assetTag: true, ratedMaxPressurePa: true } } } });
    const equilibration = input.kind === "PERMEATION" ? await tx.runStage.findFirst({ where: { runId: run.id, kind: "EQUILIBRATION" }, orderBy: { sequence: "asc" }, select: { startedAt: true } }) : null;
    const check = checkStage({
      kind: input.kind,
      pressures,
      rules: stagePressureRules(settings.values),
      instruments: instruments.map((i) => i.equipment),
      ...(input.kind === "PERMEATION" && { equilibrationS: equilibration ? (input.startedAt.getTime() - equilibration.startedAt.getTime()) / 1000 : null }),
    });
    if (check.refusals.length > 0)
      throw new AppError("INVALID_INPUT", `Refused: ${check.refusals.join(" ")} Never exceed an instrument's rated pressure.`, { fieldErrors: { cellPressure: "Above a rated maximum." } });
    const departureNote = check.departures.map((d) => d.message).join(" ") || null;
    if (departureNote && !input.acknowledgeMargin)
      throw new AppError("INVALID_INPUT", departureNote, { fieldErrors: { acknowledgeMargin: "Tick to confirm you have read this warning and the lab's procedure allows it." }, details: { marginWarning: true, rules: check.departures.map((d) => d.rule) } });

    const previous = await tx.runStage.findFirst({ where: { runId: run.id }, orderBy: { sequence: "desc" } });
    if (previous && input.startedAt < previous.startedAt)
      throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { startedAt: `A stage cannot start before the previous one (${previous.startedAt.toISOString().slice(0, 16).replace("T", " ")} UTC).` } });
    if (previous && !previous.endedAt) await tx.runStage.update({ where: { id: previous.id }, data: { endedAt: input.startedAt } });
    const stage = await tx.runStage.create({
      data: {
        runId: run.id, sequence: (previous?.sequence ?? 0) + 1, kind: input.kind, cellPressurePa: pressures.cellPa, influentPressurePa: pressures.influentPa,
        effluentPressurePa: pressures.effluentPa, startedAt: input.startedAt, marginAcknowledged: departureNote !== null, departureNote, recordedById: options.actor.id,
      },
      select: { id: true, sequence: true },
    });
    await advanceRun(tx, run, toState);
    if (input.kind === "PERMEATION") {
      await applyCustodyAction(tx, { actor: options.actor, kind: "specimen", id: run.specimen.id, action: "TEST_STARTED", at: input.startedAt, note: `Permeation of ${run.labNumber}` });
      const roll = await tx.roll.findUniqueOrThrow({ where: { id: run.specimen.coupon.rollId }, select: { state: true } });
      if (roll.state !== "UNDER_TEST") await applyCustodyAction(tx, { actor: options.actor, kind: "roll", id: run.specimen.coupon.rollId, action: "TEST_STARTED", at: input.startedAt, note: `Specimen ${run.specimen.labNumber}` });
    }
    return { ...stage, marginWarning: departureNote };
  });
}

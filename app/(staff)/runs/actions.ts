"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { abandonRun } from "@/lib/server/runs/abandon-run";
import { assignSpecimenToCell } from "@/lib/server/runs/assign-specimen-to-cell";
import { grantCalibrationOverride } from "@/lib/server/runs/grant-calibration-override";
import { recordPostTest } from "@/lib/server/runs/record-post-test";
import { recordStage } from "@/lib/server/runs/record-stage";
import { submitRun } from "@/lib/server/runs/submit-run";
import { terminateRun } from "@/lib/server/runs/terminate-run";

const refresh = () => {
  revalidatePath("/runs", "layout");
  revalidatePath("/cells");
};

export async function assignSpecimenAction(input: unknown) {
  return toActionResult(async () => {
    const run = await assignSpecimenToCell({ actor: await requireUser("run.operate"), input });
    refresh();
    return run;
  }, "Run started.");
}

export async function recordStageAction(input: unknown) {
  return toActionResult(async () => {
    const stage = await recordStage({ actor: await requireUser("run.operate"), input });
    refresh();
    return stage;
  }, "Stage recorded.");
}

export async function terminateRunAction(input: unknown) {
  return toActionResult(async () => {
    const result = await terminateRun({ actor: await requireUser("run.operate"), input });
    refresh();
    return result;
  }, "Run terminated.");
}

export async function recordPostTestAction(input: unknown) {
  return toActionResult(async () => {
    const result = await recordPostTest({ actor: await requireUser("run.operate"), input });
    refresh();
    return result;
  }, "Post-test data recorded.");
}

export async function submitRunAction(input: unknown) {
  return toActionResult(async () => {
    const result = await submitRun({ actor: await requireUser("run.operate"), input });
    refresh();
    return result;
  }, "Submitted for review.");
}

export async function grantOverrideAction(input: unknown) {
  return toActionResult(async () => {
    const result = await grantCalibrationOverride({ actor: await requireUser("calibration.override"), input });
    refresh();
    return result;
  }, "Override recorded.");
}

export async function abandonRunAction(input: unknown) {
  return toActionResult(async () => {
    const result = await abandonRun({ actor: await requireUser("run.operate"), input });
    refresh();
    return result;
  }, "Run abandoned; its cell is free.");
}

"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { approveRun } from "@/lib/server/review/approve-run";
import { chooseRunSettings } from "@/lib/server/review/choose-run-settings";
import { returnRun } from "@/lib/server/review/return-run";

export async function approveRunAction(input: unknown) {
  return toActionResult(async () => {
    const result = await approveRun({ actor: await requireUser("run.review"), input });
    revalidatePath("/review", "layout");
    return result;
  }, "Run approved; its results can now go on a certificate.");
}

export async function returnRunAction(input: unknown) {
  return toActionResult(async () => {
    const result = await returnRun({ actor: await requireUser("run.review"), input });
    revalidatePath("/review", "layout");
    return result;
  }, "Run returned to the technician with your comments.");
}

export async function chooseRunSettingsAction(input: unknown) {
  return toActionResult(async () => {
    const result = await chooseRunSettings({ actor: await requireUser("run.review"), input });
    revalidatePath("/review", "layout");
    return result;
  }, "The run is now judged by the chosen settings version.");
}

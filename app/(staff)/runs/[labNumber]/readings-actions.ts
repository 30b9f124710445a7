"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { correctReading } from "@/lib/server/readings/correct-reading";
import { recordReadings } from "@/lib/server/readings/record-readings";

export async function recordReadingsAction(input: unknown) {
  return toActionResult(async () => {
    const result = await recordReadings({ actor: await requireUser("run.operate"), input });
    revalidatePath(`/runs/${result.labNumber}`);
    return result;
  }, "Readings saved.");
}

export async function correctReadingAction(input: unknown) {
  return toActionResult(async () => {
    const result = await correctReading({ actor: await requireUser("run.operate"), input });
    revalidatePath(`/runs/${result.labNumber}`);
    return result;
  }, "Correction saved; the original stays in the reading's history.");
}

"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { recordIndexTest } from "@/lib/server/index-tests/record-index-test";
import { reviewIndexTest } from "@/lib/server/index-tests/review-index-test";

export async function recordIndexTestAction(input: unknown) {
  return toActionResult(async () => {
    const result = await recordIndexTest({ actor: await requireUser("run.operate"), input });
    revalidatePath("/samples", "layout");
    return result;
  }, "Index test recorded; it now waits for QA review.");
}

export async function reviewIndexTestAction(input: unknown) {
  return toActionResult(async () => {
    const result = await reviewIndexTest({ actor: await requireUser("run.review"), input });
    revalidatePath("/index-tests", "layout");
    revalidatePath("/review", "layout");
    return result;
  }, "Decision recorded.");
}

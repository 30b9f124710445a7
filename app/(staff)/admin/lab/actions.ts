"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { updateLabDetails } from "@/lib/server/lab/update-lab-details";

export async function updateLabDetailsAction(input: unknown) {
  return toActionResult(async () => {
    const lab = await updateLabDetails({ actor: await requireUser("lab.configure"), input });
    // The lab's name and time zone appear on every page.
    revalidatePath("/", "layout");
    return lab;
  }, "The lab's details are saved; new documents and every page use them now.");
}

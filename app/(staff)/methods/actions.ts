"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { createMethodSettingsVersion } from "@/lib/server/methods/create-method-settings-version";

export async function createMethodSettingsVersionAction(input: unknown) {
  return toActionResult(async () => {
    const created = await createMethodSettingsVersion({ actor: await requireUser("method.manage"), input });
    revalidatePath("/methods", "layout");
    return created;
  }, "New settings version saved; runs started from now on are judged by it.");
}

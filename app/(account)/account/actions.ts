"use server";

import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { changeOwnPassword } from "@/lib/server/users/change-own-password";

export async function changeOwnPasswordAction(input: unknown) {
  return toActionResult(async () => {
    await changeOwnPassword({ actor: await requireUser("account.self"), input });
    return null;
  }, "Your password has been changed.");
}

"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { changeUserRole } from "@/lib/server/users/change-user-role";
import { createUser } from "@/lib/server/users/create-user";
import { resetPassword } from "@/lib/server/users/reset-password";
import { setUserActive } from "@/lib/server/users/set-user-active";

export async function createUserAction(input: unknown) {
  return toActionResult(async () => {
    const user = await createUser({ actor: await requireUser("user.manage"), input });
    revalidatePath("/admin/users");
    return user;
  }, "Account created. Give the person their password by a safe route; they can change it under My account.");
}

export async function setUserActiveAction(input: unknown) {
  return toActionResult(async () => {
    await setUserActive({ actor: await requireUser("user.manage"), input });
    revalidatePath("/admin/users");
    return null;
  }, "Account updated.");
}

export async function resetPasswordAction(input: unknown) {
  return toActionResult(async () => {
    await resetPassword({ actor: await requireUser("user.manage"), input });
    return null;
  }, "Password reset; the person's open sessions have ended.");
}

export async function changeUserRoleAction(input: unknown) {
  return toActionResult(async () => {
    const result = await changeUserRole({ actor: await requireUser("user.manage"), input });
    revalidatePath("/admin/users");
    return result;
  }, "Role changed; the person's open sessions have ended and the new role applies from their next sign-in.");
}

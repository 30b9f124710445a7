"use server";

import { revalidatePath } from "next/cache";
import { createApiToken } from "@/lib/server/api-tokens/create-api-token";
import { revokeApiToken } from "@/lib/server/api-tokens/revoke-api-token";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requestClientAddress } from "@/lib/server/auth/request-client-address";
import { reissueOwnSession } from "@/lib/server/auth/reissue-session";
import { requireUser } from "@/lib/server/auth/require-permission";
import { changeOwnPassword } from "@/lib/server/users/change-own-password";
import { setOwnResultUnits } from "@/lib/server/users/set-own-result-units";

export async function changeOwnPasswordAction(input: unknown) {
  return toActionResult(async () => {
    const { sessionVersion } = await changeOwnPassword({ actor: await requireUser("account.self"), input, clientAddress: await requestClientAddress() });
    // Every other session has ended; this browser carries on with a fresh one.
    await reissueOwnSession(sessionVersion);
    return null;
  }, "Your password has been changed; you have been signed out everywhere else.");
}

export async function createApiTokenAction(input: unknown) {
  return toActionResult(async () => createApiToken({ actor: await requireUser("account.self"), input }), "Token created. Copy it now: it is shown only once.");
}

export async function revokeOwnApiTokenAction(input: unknown) {
  return toActionResult(async () => {
    await revokeApiToken({ actor: await requireUser("account.self"), input });
    revalidatePath("/account");
    return null;
  }, "Token revoked; requests with it are refused from now on.");
}

export async function setOwnResultUnitsAction(input: unknown) {
  return toActionResult(async () => {
    const saved = await setOwnResultUnits({ actor: await requireUser("account.self"), input });
    revalidatePath("/", "layout");
    return saved;
  }, "Results will be shown in the units you chose.");
}

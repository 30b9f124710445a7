"use server";

import { revalidatePath } from "next/cache";
import { revokeApiToken } from "@/lib/server/api-tokens/revoke-api-token";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";

export async function revokeAnyApiTokenAction(input: unknown) {
  return toActionResult(async () => {
    await revokeApiToken({ actor: await requireUser("user.manage"), input });
    revalidatePath("/admin/api-tokens");
    return null;
  }, "Token revoked; requests with it are refused from now on.");
}

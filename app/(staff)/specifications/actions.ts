"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { createProjectSpecification } from "@/lib/server/specifications/create-project-specification";
import { setSpecificationLimit } from "@/lib/server/specifications/set-specification-limit";

// Thin adapters: who is acting, the operation, and a fresh library afterwards.
const refresh = () => revalidatePath("/specifications", "layout");

export async function createProjectSpecificationAction(input: unknown) {
  return toActionResult(async () => {
    const specification = await createProjectSpecification({ actor: await requireUser("specification.manage"), input });
    refresh();
    return { id: specification.id };
  }, "Specification created.");
}

export async function setSpecificationLimitAction(input: unknown) {
  return toActionResult(async () => {
    const limit = await setSpecificationLimit({ actor: await requireUser("specification.manage"), input });
    refresh();
    return { id: limit.id };
  }, "Limit saved.");
}

import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { storageLocationSchema } from "@/lib/validation/samples";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/** Adds a storage place (shelf, rack, humid room bench) where items can be kept. */
export async function createStorageLocation(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "location.manage");
  const input = parseOrThrow(storageLocationSchema, options.input);
  return withActor(options.actor, async (tx) => {
    if (await tx.storageLocation.findUnique({ where: { code: input.code }, select: { id: true } }))
      throw new AppError("CONFLICT", `There is already a location ${input.code}.`, { fieldErrors: { code: "Already in use." } });
    return tx.storageLocation.create({ data: { code: input.code, name: input.name, description: input.description ?? null }, select: { id: true, code: true } });
  });
}

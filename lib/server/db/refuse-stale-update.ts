import "server-only";
import { AppError } from "@/lib/errors/app-error";

/**
 * After an update guarded by the version the person saw: nothing happens when one row changed; otherwise
 * the record was changed by someone else since (CONFLICT) or does not exist (NOT_FOUND).
 */
export async function refuseStaleUpdate(updated: { count: number }, stillThere: () => Promise<unknown>): Promise<void> {
  if (updated.count === 1) return;
  throw new AppError((await stillThere()) ? "CONFLICT" : "NOT_FOUND");
}

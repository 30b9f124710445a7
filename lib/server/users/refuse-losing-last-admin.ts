import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { Tx } from "../db/transaction";

/**
 * Refuses a change that would leave the lab without an active administrator (nobody could then manage
 * people, equipment or the lab's details). The administrators' rows are locked first, so two changes made
 * at the same moment cannot each leave the other as the last one and then both go through.
 */
export async function refuseLosingLastAdmin(
  tx: Tx,
  user: { id: string; name: string; role: string; active: boolean },
  after: { role: string; active: boolean },
  field: string,
): Promise<void> {
  const isAdminNow = user.role === "LAB_ADMIN" && user.active;
  if (!isAdminNow || (after.role === "LAB_ADMIN" && after.active)) return;
  await tx.$queryRaw`SELECT id FROM "User" WHERE role = 'LAB_ADMIN' AND active FOR UPDATE`;
  const others = await tx.user.count({ where: { role: "LAB_ADMIN", active: true, id: { not: user.id } } });
  if (others === 0) {
    const message = `${user.name} is the last active lab administrator, so they cannot ${after.active ? "lose that role" : "be deactivated"}; make another person a lab administrator first.`;
    throw new AppError("INVALID_INPUT", message, { fieldErrors: { [field]: message } });
  }
}

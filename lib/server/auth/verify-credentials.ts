import "server-only";
import { signInSchema } from "@/lib/validation/account";
import type { RoleName } from "@/lib/policy/permissions";
import { getDb, type Db } from "../db/client";
import { burnPasswordCheck, verifyPassword } from "./password";
import { checkPasswordThrottled } from "./password-throttle";

export type VerifiedUser = { id: string; name: string; email: string; role: RoleName; sessionVersion: number };

/**
 * Checks an e-mail and password for sign-in, under the password throttle (counted per account at the
 * client's address, per address and per account, in the database, so it holds across app instances and
 * parallel requests). Throws AppError TOO_MANY_ATTEMPTS while blocked; returns null for wrong credentials.
 */
export async function verifyCredentials(raw: unknown, db: Db = getDb(), now: Date = new Date(), address: string | null = null): Promise<VerifiedUser | null> {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const user = await db.user.findUnique({ where: { email }, omit: { passwordHash: false } });
  // An unknown address costs as long as a wrong password, and is counted the same way.
  const ok = await checkPasswordThrottled({ email, address }, async () => (user ? user.active && (await verifyPassword(password, user.passwordHash)) : (await burnPasswordCheck(password), false)), { db, now });
  if (!ok || !user) return null;
  return { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion };
}

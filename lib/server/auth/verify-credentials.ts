import "server-only";
import { blockSecondsAfter, FAILURE_MEMORY_S } from "@/lib/policy/sign-in-throttle";
import { AppError } from "@/lib/errors/app-error";
import { signInSchema } from "@/lib/validation/account";
import type { RoleName } from "@/lib/policy/permissions";
import { getDb, type Db } from "../db/client";
import { burnPasswordCheck, verifyPassword } from "./password";

export type VerifiedUser = { id: string; name: string; email: string; role: RoleName; sessionVersion: number };

/**
 * Checks an e-mail and password for sign-in. Failures are counted per address in the database (so the
 * count holds across app instances); after a few, sign-in for that address is refused for a while.
 * Throws AppError TOO_MANY_ATTEMPTS while blocked; returns null for wrong credentials.
 */
export async function verifyCredentials(raw: unknown, db: Db = getDb(), now: Date = new Date()): Promise<VerifiedUser | null> {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  const key = `email:${email}`;

  const throttle = await db.signInThrottle.findUnique({ where: { key } });
  if (throttle?.blockedUntil && throttle.blockedUntil > now) {
    const waitS = Math.ceil((throttle.blockedUntil.getTime() - now.getTime()) / 1000);
    throw new AppError("TOO_MANY_ATTEMPTS", `Too many failed sign-ins for this address; try again in ${waitS} s.`, {
      details: { retryAfterS: waitS },
    });
  }

  const user = await db.user.findUnique({ where: { email }, omit: { passwordHash: false } });
  const ok = user ? user.active && (await verifyPassword(password, user.passwordHash)) : (await burnPasswordCheck(password), false);

  if (!ok || !user) {
    const stale = !throttle || now.getTime() - throttle.lastFailureAt.getTime() > FAILURE_MEMORY_S * 1000;
    const failures = (stale ? 0 : throttle.failures) + 1;
    const blockS = blockSecondsAfter(failures);
    const blockedUntil = blockS > 0 ? new Date(now.getTime() + blockS * 1000) : null;
    await db.signInThrottle.upsert({
      where: { key },
      create: { key, failures, lastFailureAt: now, blockedUntil },
      update: { failures, lastFailureAt: now, blockedUntil },
    });
    return null;
  }

  if (throttle) await db.signInThrottle.delete({ where: { key } });
  return { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion };
}

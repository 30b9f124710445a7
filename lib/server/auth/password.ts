import "server-only";
import bcrypt from "bcryptjs";

// bcrypt with cost 12 by default (about a quarter of a second here); tests may lower it, never below 10.
function cost(): number {
  const requested = Number(process.env.SEEPLINE_BCRYPT_COST ?? 12);
  return Number.isInteger(requested) && requested >= 10 && requested <= 15 ? requested : 12;
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, cost());
}

export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

// Compared against when the e-mail is unknown, so that a wrong address costs as long as a wrong password.
let dummyHash: Promise<string> | null = null;
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= bcrypt.hash("no account has this password", cost());
  await bcrypt.compare(password, await dummyHash);
}

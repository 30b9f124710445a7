// Creates a lab administrator in a database, for the first sign-in on an empty production database.
// Usage: DATABASE_URL=... npm run user:create-admin -- --email you@lab.example --name "Your Name"
// The password is read from standard input (one line), so it never appears in the shell history.
import { parseArgs } from "node:util";
import { createInterface } from "node:readline";
import { createUserSchema } from "@/lib/validation/account";
import { hashPassword } from "@/lib/server/auth/password";
import { createDb } from "@/lib/server/db/client";
import { withActor } from "@/lib/server/db/transaction";

async function readPassword(): Promise<string> {
  if (process.stdin.isTTY) process.stdout.write("Password for the new administrator (at least 12 characters): ");
  const lines = createInterface({ input: process.stdin });
  for await (const line of lines) return line;
  return "";
}

async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set.");
  const { values } = parseArgs({ options: { email: { type: "string" }, name: { type: "string" } } });
  const input = createUserSchema.safeParse({ email: values.email, name: values.name, role: "LAB_ADMIN", password: await readPassword() });
  if (!input.success) throw new Error(input.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("\n"));
  const db = createDb(url);
  try {
    const user = await withActor({ id: "system:create-admin" }, async (tx) =>
      tx.user.create({ data: { email: input.data.email, name: input.data.name, role: "LAB_ADMIN", passwordHash: await hashPassword(input.data.password) }, select: { id: true, email: true } }),
      { db },
    );
    console.log(`Administrator ${user.email} created.`);
  } finally {
    await db.$disconnect();
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});

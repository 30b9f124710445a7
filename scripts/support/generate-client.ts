import { createHash } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { ROOT } from "./paths";
import { generateClient } from "./prisma-cli";

const SCHEMA = path.join(ROOT, "prisma", "schema.prisma");
const STAMP = path.join(ROOT, "lib", "generated", "prisma", ".schema-hash");

/** Generates the Prisma client when it is missing or older than the schema. */
export async function generateClientIfNeeded(): Promise<boolean> {
  const hash = createHash("sha256").update(readFileSync(SCHEMA)).digest("hex");
  if (existsSync(STAMP) && readFileSync(STAMP, "utf8") === hash) return false;
  await generateClient();
  writeFileSync(STAMP, hash);
  return true;
}

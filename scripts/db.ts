// Database chores with the project's offline Prisma set-up (see prisma.config.ts):
//   npm run db:generate                    generate the Prisma client
//   npm run db:migrate                     apply committed migrations (MIGRATION_DATABASE_URL, else DATABASE_URL)
//   npm run db:create-roles -- <admin url> create the migration owner and the app's runtime role on a server
//   npm run db:new-migration -- <name>     write a new migration from the schema change, no database needed
import { execFileSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { ROOT } from "./support/paths";
import { applyMigrations, generateClient, runPrisma } from "./support/prisma-cli";
import { createRoles } from "./support/create-roles";

async function newMigration(name: string | undefined) {
  if (!name || !/^[a-z0-9_]+$/.test(name)) throw new Error("give the migration a name of lower-case letters, digits and _.");
  // The previous schema is the committed one; the change is what the working tree adds to it.
  const previous = execFileSync("git", ["show", "HEAD:prisma/schema.prisma"], { cwd: ROOT, encoding: "utf8" });
  const previousFile = path.join(ROOT, "tmp", "previous-schema.prisma");
  mkdirSync(path.dirname(previousFile), { recursive: true });
  writeFileSync(previousFile, previous);
  const url = process.env.DATABASE_URL ?? "postgresql://postgres@127.0.0.1:5432/postgres";
  const sql = await runPrisma(["migrate", "diff", "--from-schema-datamodel", previousFile, "--to-schema-datamodel", "prisma/schema.prisma", "--script"], url);
  const stamp = new Date().toISOString().replace(/\D/g, "").slice(0, 14);
  const dir = path.join(ROOT, "prisma", "migrations", `${stamp}_${name}`);
  mkdirSync(dir, { recursive: true });
  writeFileSync(path.join(dir, "migration.sql"), sql.split("\n").filter((l) => !l.startsWith("Loaded Prisma config")).join("\n"));
  console.log(`wrote ${path.relative(ROOT, dir)}/migration.sql; add any triggers or constraints by hand, then commit it.`);
}

async function main() {
  const [command, arg] = process.argv.slice(2);
  if (command === "generate") return generateClient();
  if (command === "migrate") {
    const url = process.env.MIGRATION_DATABASE_URL || process.env.DATABASE_URL;
    if (!url) throw new Error("MIGRATION_DATABASE_URL (or DATABASE_URL) is not set.");
    return applyMigrations(url);
  }
  if (command === "create-roles") return createRoles(arg);
  if (command === "new-migration") return newMigration(arg);
  throw new Error("usage: db.ts generate | migrate | new-migration <name> | create-roles <admin url>");
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});

import { createHash } from "node:crypto";
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { ROOT } from "./paths";

// What a production build depends on. A fresh clone has new file times, so contents are hashed, not dates.
const INPUTS = ["app", "components", "lib", "public", "proxy.ts", "instrumentation-client.ts", "next.config.js", "tsconfig.json", "package-lock.json", "prisma/schema.prisma"];
const STAMP = path.join(ROOT, ".next", "seepline-build-stamp");

function* files(entry: string): Generator<string> {
  const full = path.join(ROOT, entry);
  if (!existsSync(full)) return;
  if (statSync(full).isFile()) {
    yield entry;
    return;
  }
  for (const name of readdirSync(full).sort()) yield* files(path.join(entry, name));
}

export function sourceHash(): string {
  const hash = createHash("sha256");
  for (const input of INPUTS) for (const file of files(input)) hash.update(file).update("\0").update(readFileSync(path.join(ROOT, file)));
  return hash.digest("hex");
}

export function buildIsCurrent(hash: string): boolean {
  return existsSync(path.join(ROOT, ".next", "BUILD_ID")) && existsSync(STAMP) && readFileSync(STAMP, "utf8") === hash;
}

export function recordBuild(hash: string): void {
  writeFileSync(STAMP, hash);
}

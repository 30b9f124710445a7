import { existsSync, readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { ROOT } from "./paths";

const DIR = path.join(ROOT, "tmp", "probe");

/** The security and reliability probe's figures written since `since` (e2e/probe), as printable lines. */
export function probeTable(since: number): string[] {
  if (!existsSync(DIR)) return [];
  const rows = readdirSync(DIR)
    .filter((name) => name.endsWith(".json") && statSync(path.join(DIR, name)).mtimeMs >= since)
    .sort()
    .map((name) => JSON.parse(readFileSync(path.join(DIR, name), "utf8")) as { label: string; values: Record<string, number | string> });
  if (rows.length === 0) return [];
  const width = Math.max(...rows.map((r) => r.label.length));
  return ["Security and reliability probe (e2e/probe):", ...rows.map((r) => `  ${r.label.padEnd(width)}  ${Object.entries(r.values).map(([k, v]) => `${k} ${v}`).join(" · ")}`)];
}

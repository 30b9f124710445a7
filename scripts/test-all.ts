// `npm test`: every check the project has, in the order that fails fastest: types, lint, then the unit,
// integration and end-to-end tests in one vitest run. Ends with one plain summary line.
import { mkdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { generateClientIfNeeded } from "./support/generate-client";
import { BIN, ROOT } from "./support/paths";
import { probeTable } from "./support/probe-table";
import { runCommand } from "./support/run-command";

const RESULTS = path.join(ROOT, "tmp", "vitest-results.json");

async function step(title: string, work: () => Promise<unknown>) {
  console.log(`\n== ${title}`);
  await work();
}

async function main() {
  const only = process.argv.slice(2); // e.g. `npm test -- --project unit`
  const started = Date.now();
  await step("Prisma client", generateClientIfNeeded);
  if (only.length === 0) {
    await step("Type check (tsc, strict)", () => runCommand(BIN("tsc"), ["--noEmit", "-p", "."], { cwd: ROOT }));
    await step("Lint (eslint)", () => runCommand(BIN("eslint"), ["--max-warnings=0", "."], { cwd: ROOT }));
  }
  mkdirSync(path.dirname(RESULTS), { recursive: true });
  let failed: unknown = null;
  await step("Tests (vitest: unit, integration, e2e)", () =>
    runCommand(BIN("vitest"), ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${RESULTS}`, ...only], { cwd: ROOT }),
  ).catch((error) => (failed = error));

  const probe = probeTable(started);
  if (probe.length > 0) console.log(`\n${probe.join("\n")}`);
  const summary = JSON.parse(readFileSync(RESULTS, "utf8")) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  console.log(`\nTests: ${summary.numPassedTests} passed, ${summary.numFailedTests} failed, ${summary.numPendingTests + summary.numTodoTests} skipped`);
  if (failed || summary.numFailedTests > 0) process.exit(1);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});

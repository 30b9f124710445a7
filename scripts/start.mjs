#!/usr/bin/env node
// `npm start`: the one command that takes a fresh clone to a running lab app. This file needs nothing but
// Node itself, because on a fresh clone node_modules does not exist yet; it installs the dependencies,
// then hands over to scripts/serve.ts.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const installedMarker = path.join(root, "node_modules", ".package-lock.json");
const lockfile = path.join(root, "package-lock.json");

function dependenciesMissing() {
  if (!existsSync(installedMarker)) return true;
  return statSync(lockfile).mtimeMs > statSync(installedMarker).mtimeMs + 1000;
}

if (dependenciesMissing()) {
  console.log("Seepline: installing dependencies (npm ci), once per fresh clone or lockfile change...");
  const npm = process.platform === "win32" ? "npm.cmd" : "npm";
  const result = spawnSync(npm, ["ci", "--no-audit", "--no-fund", "--loglevel=error"], { cwd: root, stdio: "inherit" });
  if (result.status !== 0) {
    console.error("Seepline: npm ci failed; see the messages above.");
    process.exit(result.status ?? 1);
  }
}

const mode = process.argv[2] ?? "serve";
const script = { serve: "serve.ts", test: "test-all.ts" }[mode];
if (!script) {
  console.error(`Seepline: unknown mode ${mode}`);
  process.exit(2);
}
const child = spawn(path.join(root, "node_modules", ".bin", "tsx"), ["--conditions=react-server", path.join(root, "scripts", script), ...process.argv.slice(3)], {
  cwd: root,
  stdio: "inherit",
});
// The child handles Ctrl-C itself (it stops what it started); this process just waits for it.
for (const signal of ["SIGINT", "SIGTERM"]) process.on(signal, () => child.kill(signal));
child.on("exit", (code, signal) => process.exit(code ?? (signal ? 1 : 0)));

import { spawn } from "node:child_process";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { browserAvailable } from "../support/session";
import { recordFigure } from "./support/figures";

const ROOT = path.resolve(import.meta.dirname, "../..");

/** Processes whose command line mentions `text` (Chromium and its helpers carry the profile folder). */
function processesMentioning(text: string): number[] {
  return readdirSync("/proc")
    .filter((name) => /^\d+$/.test(name))
    .filter((pid) => {
      try {
        return readFileSync(`/proc/${pid}/cmdline`, "utf8").includes(text) && !readFileSync(`/proc/${pid}/stat`, "utf8").includes(") Z ");
      } catch {
        return false;
      }
    })
    .map(Number);
}

async function waitFor(check: () => boolean, timeoutMs: number): Promise<number> {
  const start = Date.now();
  while (!check()) {
    if (Date.now() - start > timeoutMs) return -1;
    await new Promise((r) => setTimeout(r, 200));
  }
  return Date.now() - start;
}

describe.skipIf(!browserAvailable())("probe: Chromium dies with the server that started it", () => {
  it("after a SIGKILL of the server, its Chromium is gone and its profile folder removed within seconds", async () => {
    const server = spawn(path.join(ROOT, "node_modules", ".bin", "tsx"), ["--conditions=react-server", path.join(import.meta.dirname, "fixtures", "render-and-wait.ts")], { cwd: ROOT, stdio: ["ignore", "pipe", "inherit"], env: { ...process.env } });
    const line = await new Promise<string>((resolve, reject) => {
      let seen = "";
      server.stdout!.on("data", (chunk) => {
        seen += chunk;
        const match = /READY .*/.exec(seen);
        if (match) resolve(match[0]);
      });
      server.once("exit", (code) => reject(new Error(`the stand-in server exited (${code}) before rendering: ${seen}`)));
    });
    const profile = line.split(" ")[2]!;
    expect(profile).toMatch(/seepline-pdf-\d+-/);
    // tsx runs the script in a child node process: kill every process of the stand-in, as a SIGKILL of a server would.
    const browsers = processesMentioning(profile);
    expect(browsers.length).toBeGreaterThan(0);
    for (const pid of processesMentioning(path.join("fixtures", "render-and-wait.ts"))) process.kill(pid, "SIGKILL");

    const took = await waitFor(() => processesMentioning(profile).length === 0 && !existsSync(profile), 15_000);
    recordFigure("12-chromium", { label: "Chromium after SIGKILL of its server", values: { "browser processes": browsers.length, "gone and profile removed after ms": took } });
    expect(processesMentioning(profile)).toEqual([]);
    expect(existsSync(profile)).toBe(false);
  }, 60_000);
});

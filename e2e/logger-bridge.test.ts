import { spawn, type ChildProcess } from "node:child_process";
import { appendFileSync, copyFileSync, mkdtempSync, writeFileSync } from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import pg from "pg";
import type { Browser } from "puppeteer";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { chooseByLabel, fill } from "./support/forms";
import { baseUrl, browserAvailable, launchBrowser, pageSignedInAs, textOf } from "./support/session";

const ROOT = path.resolve(import.meta.dirname, "..");
const LAB_NUMBER = /T\d{2}-\d{5}/;

/** A TCP relay in front of the app that the test can take away and bring back, as an app restart would. */
function makeRelay(target: URL) {
  const sockets = new Set<net.Socket>();
  let server: net.Server | null = null;
  let port = 0;
  return {
    get port() {
      return port;
    },
    async start() {
      server = net.createServer((client) => {
        const upstream = net.connect(Number(target.port || 80), target.hostname);
        for (const s of [client, upstream]) {
          sockets.add(s);
          s.on("close", () => sockets.delete(s));
          s.on("error", () => s.destroy());
        }
        client.pipe(upstream).pipe(client);
      });
      await new Promise<void>((resolve) => server!.listen(port, "127.0.0.1", resolve));
      port = (server.address() as net.AddressInfo).port;
    },
    async stop() {
      for (const s of sockets) s.destroy();
      await new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve()));
      server = null;
    },
  };
}

async function until(what: string, check: () => Promise<boolean>, timeoutMs = 60_000) {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`timed out waiting for ${what}`);
}

describe.skipIf(!browserAvailable())("the data-logger bridge (a real process against the app)", () => {
  let browser: Browser;
  let bridge: ChildProcess | null = null;
  let made: { token: string; tokenName: string } | null = null;
  const relay = makeRelay(new URL(inject("baseUrl") || "http://127.0.0.1:1"));
  const db = new pg.Client({ connectionString: inject("appDatabaseUrl") });
  beforeAll(async () => {
    browser = await launchBrowser();
    await db.connect();
  });
  afterAll(async () => {
    bridge?.kill("SIGKILL");
    await relay.stop();
    await db.end();
    await browser?.close();
  });

  it("technician makes a data-logger token on My account; the bridge tails the logger's CSV through a kill and restart and an outage of the app, and every line is saved exactly once", async () => {
    // --- The token, made as a technician would make it, shown once.
    const tech = await pageSignedInAs(browser, "technician@quillfen.test");
    await tech.goto(`${baseUrl()}/`);
    await tech.click("a::-p-text(My account)");
    await tech.waitForSelector('form[aria-label="New API token"]');
    const tokenName = `CELL-03 logger ${Date.now()}`;
    await fill(tech, "Token name", tokenName);
    await chooseByLabel(tech, "What it may do", "Post readings");
    await fill(tech, "Cells", "CELL-03");
    await tech.click("button::-p-text(Create token)");
    await tech.waitForSelector('[data-testid="new-token"] pre', { timeout: 30_000 });
    const token = (await textOf(tech, '[data-testid="new-token"] pre')).trim();
    made = { token, tokenName };
    expect(token).toMatch(/^slp_[A-Za-z0-9_-]{43}$/);
    await tech.waitForFunction((name) => document.querySelector(`[data-token-name="${name}"]`) !== null, { timeout: 30_000 }, tokenName);
    expect(await textOf(tech, `[data-token-name="${tokenName}"]`)).toMatch(/CELL-03[\s\S]*valid until/);
    await tech.goto(`${baseUrl()}/cells`);
    const runNumber = (await textOf(tech, '[data-cell="CELL-03"]')).match(LAB_NUMBER)![0];
    await tech.browserContext().close();

    // --- The logger's rows continue the run's readings in force: later, inflow falling, outflow rising (invented).
    // Times as milliseconds since the epoch: the column holds UTC without a zone, which pg would read as local time.
    const last = (await db.query<{ ms: string; inflow: number; outflow: number }>(
      `SELECT EXTRACT(EPOCH FROM r."takenAt") * 1000 AS ms, r."inflowLevelMm" AS inflow, r."outflowLevelMm" AS outflow FROM "Reading" r JOIN "Run" u ON u.id = r."runId"
       WHERE u."labNumber" = $1 AND NOT EXISTS (SELECT 1 FROM "Reading" c WHERE c."correctsId" = r.id) ORDER BY r."elapsedS" DESC LIMIT 1`, [runNumber],
    )).rows[0]!;
    const lastAt = new Date(Math.round(Number(last.ms)));
    const count = 12;
    const stepMs = Math.min(10 * 60_000, Math.floor((Date.now() - 60_000 - lastAt.getTime()) / (count + 1)));
    expect(stepMs).toBeGreaterThan(1000);
    const line = (i: number) =>
      `${new Date(lastAt.getTime() + (i + 1) * stepMs).toISOString()},${(last.inflow - 0.4 * (i + 1)).toFixed(1)},${(last.outflow + 0.4 * (i + 1)).toFixed(1)},552.0,531.0,517.0,20.${i % 10}`;
    const dir = mkdtempSync(path.join(os.tmpdir(), "seepline-bridge-"));
    const csv = path.join(dir, "readings.csv");
    const stateFile = path.join(dir, "state.json");
    writeFileSync(csv, "Date/Time,Inflow burette (mm),Outflow burette (mm),Cell kPa,Influent kPa,Effluent kPa,Temp °C\n");
    for (let i = 0; i < 4; i++) appendFileSync(csv, `${line(i)}\n`);

    const output: string[] = [];
    const start = () => {
      const child = spawn(process.execPath, [path.join(ROOT, "node_modules", "tsx", "dist", "cli.mjs"), "scripts/logger-bridge.ts", "--run", runNumber, "--file", csv, "--state", stateFile, "--url", `http://127.0.0.1:${relay.port}`, "--poll-ms", "200"], {
        cwd: ROOT, env: { ...process.env, SEEPLINE_API_TOKEN: token }, stdio: ["ignore", "pipe", "pipe"],
      });
      child.stdout!.on("data", (d: Buffer) => output.push(d.toString()));
      child.stderr!.on("data", (d: Buffer) => output.push(d.toString()));
      return child;
    };
    const saved = async () => Number((await db.query<{ n: string }>(`SELECT count(*) AS n FROM "Reading" r JOIN "Run" u ON u.id = r."runId" WHERE u."labNumber" = $1 AND r.source = $2`, [runNumber, `API token “${tokenName}”`])).rows[0]!.n);

    await relay.start();
    bridge = start();
    await until("the first 4 lines", async () => (await saved()) === 4);
    await until("the state file", async () => { try { copyFileSync(stateFile, `${stateFile}.after-4`); return true; } catch { return false; } });

    // --- Three more lines; once saved, the bridge is killed, and its state file set back to before them (a
    // lost write): the restarted bridge posts those three again, and the API must not save them twice.
    for (let i = 4; i < 7; i++) appendFileSync(csv, `${line(i)}\n`);
    await until("7 lines", async () => (await saved()) === 7);
    bridge.kill("SIGKILL");
    await new Promise((r) => bridge!.once("exit", r));
    copyFileSync(`${stateFile}.after-4`, stateFile);

    // --- The app goes away; the logger carries on, the last line still being written.
    await relay.stop();
    for (let i = 7; i < 10; i++) appendFileSync(csv, `${line(i)}\n`);
    const partial = line(10);
    appendFileSync(csv, partial.slice(0, 20));
    bridge = start();
    await new Promise((r) => setTimeout(r, 1500));
    expect(await saved()).toBe(7);
    await relay.start();
    await until("10 lines after the app came back", async () => (await saved()) === 10);
    appendFileSync(csv, `${partial.slice(20)}\n${line(11)}\n`);
    await until("all 12 lines", async () => (await saved()) === 12);
    await new Promise((r) => setTimeout(r, 1000));
    bridge.kill("SIGTERM");
    await new Promise((r) => bridge!.once("exit", r));
    bridge = null;

    // --- Every line exactly once, in order, with its key; the retried lines were recognised, not saved again.
    const rows = (await db.query<{ ms: string; inflow: number; sequence: number }>(
      `SELECT EXTRACT(EPOCH FROM r."takenAt") * 1000 AS ms, r."inflowLevelMm" AS inflow, r.sequence FROM "Reading" r JOIN "Run" u ON u.id = r."runId" WHERE u."labNumber" = $1 AND r.source = $2 ORDER BY r.sequence`,
      [runNumber, `API token “${tokenName}”`],
    )).rows;
    expect(rows.map((r) => Number(r.inflow.toFixed(1)))).toEqual(Array.from({ length: count }, (_, i) => Number((last.inflow - 0.4 * (i + 1)).toFixed(1))));
    expect(rows.map((r) => Math.round(Number(r.ms)))).toEqual(Array.from({ length: count }, (_, i) => lastAt.getTime() + (i + 1) * stepMs));
    const keys = await db.query<{ n: string }>(`SELECT count(*) AS n FROM "ApiReadingKey" k JOIN "Run" u ON u.id = k."runId" JOIN "ApiToken" t ON t.id = k."tokenId" WHERE u."labNumber" = $1 AND t.name = $2`, [runNumber, tokenName]);
    expect(Number(keys.rows[0]!.n)).toBe(count);
    const log = output.join("");
    expect(log).toMatch(/3 line\(s\) posted: 0 saved, 3 already there|posted: \d+ saved, [1-9]\d* already there/);
    expect(log).toMatch(/the app did not answer/);
  }, 180_000);

  it("administrator: sees every person's tokens and revokes the logger's; the API refuses it from then on; the reference is public", async () => {
    expect(made).not.toBeNull();
    const rolls = () => fetch(`${baseUrl()}/api/v1/runs/T26-99999/readings`, { method: "POST", headers: { authorization: `Bearer ${made!.token}`, "content-type": "application/json" }, body: "{}" });
    expect((await rolls()).status).toBe(400);
    const admin = await pageSignedInAs(browser, "admin@quillfen.test");
    await admin.goto(`${baseUrl()}/`);
    await admin.click("a::-p-text(API tokens)");
    await admin.waitForSelector('[data-testid="api-token-list"]');
    expect(await textOf(admin, `[data-token-name="${made!.tokenName}"]`)).toMatch(/Bram Oyelaran[\s\S]*CELL-03[\s\S]*valid until[\s\S]*requests\)/);
    await admin.click(`button[aria-label="Revoke ${made!.tokenName}"]`);
    await admin.waitForFunction((name) => /revoked/.test(document.querySelector(`[data-token-name="${name}"]`)?.textContent ?? ""), { timeout: 30_000 }, made!.tokenName);
    const refused = await rolls();
    expect(refused.status).toBe(401);
    expect(((await refused.json()) as { error: { message: string } }).error.message).toMatch(/revoked/);
    await admin.browserContext().close();

    const docs = await fetch(`${baseUrl()}/api-docs`);
    expect(docs.status).toBe(200);
    // React separates the parts of a text with <!-- --> in server-rendered HTML.
    expect((await docs.text()).replace(/<!-- -->/g, "")).toContain("POST /api/v1/runs/{labNumber}/readings");
    const spec = (await (await fetch(`${baseUrl()}/api/v1/openapi.json`)).json()) as { openapi: string };
    expect(spec.openapi).toBe("3.1.0");
  });
});

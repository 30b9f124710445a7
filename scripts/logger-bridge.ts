// `npm run logger:bridge -- --run T26-00004 --file readings.csv --token slp_...`
//
// Tails a CSV that a data-logger appends to and posts each new complete line to the run through the API
// (POST /api/v1/runs/<run>/readings), with a key derived from the file, the line number and the line's content.
// Its position is kept in a small state file (default: <file>.bridge-state.json) written after each accepted
// post. A restart of the bridge re-posts at most the lines of its last post, which the API recognises by their
// keys and does not save twice; when the app is down or restarting, the bridge waits and tries again.
//
// Options: --url (default http://localhost:3000), --state <file>, --poll-ms (default 5000), --time-zone (the
// IANA zone of the logger's clock when its times carry none; default this computer's), --token or the
// SEEPLINE_API_TOKEN environment variable (keeps the token out of the process list).
import { createHash } from "node:crypto";
import { existsSync, openSync, readFileSync, readSync, renameSync, closeSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { parseArgs } from "node:util";
import { loggerLinesToReadings, loggerMapping } from "../lib/readings/logger-rows";
import { parseReadingsCsv } from "../lib/readings/readings-csv";

type State = { fileId: string; offset: number; nextLine: number; header: string[] | null; separator: string };

const MAX_PER_POST = 200;
const log = (line: string) => console.log(`${new Date().toISOString()} bridge: ${line}`);

const { values } = parseArgs({
  options: {
    run: { type: "string" }, file: { type: "string" }, token: { type: "string" }, url: { type: "string", default: "http://localhost:3000" },
    state: { type: "string" }, "poll-ms": { type: "string", default: "5000" }, "time-zone": { type: "string" },
  },
});
const run = values.run;
const file = values.file ? path.resolve(values.file) : undefined;
const token = values.token ?? process.env.SEEPLINE_API_TOKEN;
if (!run || !file || !token) {
  console.error("usage: npm run logger:bridge -- --run T26-00004 --file readings.csv --token <API token> [--url http://localhost:3000] [--state file] [--poll-ms 5000] [--time-zone Europe/Dublin]");
  process.exit(2);
}
const stateFile = values.state ? path.resolve(values.state) : `${file}.bridge-state.json`;
const pollMs = Math.max(100, Number(values["poll-ms"]) || 5000);
const endpoint = `${values.url!.replace(/\/$/, "")}/api/v1/runs/${encodeURIComponent(run)}/readings`;
const sha256 = (text: string) => createHash("sha256").update(text, "utf8").digest("hex");

/** The file's identity: a logger that starts a new file (same name, new inode) starts new keys. */
function fileIdentity(): string | null {
  if (!existsSync(file!)) return null;
  const s = statSync(file!);
  return sha256(`${s.dev}:${s.ino}:${Math.round(s.birthtimeMs)}`).slice(0, 12);
}

function loadState(): State | null {
  try {
    return JSON.parse(readFileSync(stateFile, "utf8")) as State;
  } catch {
    return null;
  }
}

/** Written to a temporary file and renamed, so a crash leaves the old state or the new, never half of one. */
function saveState(state: State) {
  const temp = `${stateFile}.tmp`;
  writeFileSync(temp, JSON.stringify(state));
  renameSync(temp, stateFile);
}

/** The bytes appended since `offset`, cut after the last complete line. */
function readNewLines(offset: number): { lines: string[]; bytes: number } {
  const size = statSync(file!).size;
  if (size <= offset) return { lines: [], bytes: 0 };
  const fd = openSync(file!, "r");
  try {
    const buffer = Buffer.alloc(size - offset);
    readSync(fd, buffer, 0, buffer.length, offset);
    const end = buffer.lastIndexOf(0x0a);
    if (end < 0) return { lines: [], bytes: 0 };
    const complete = buffer.subarray(0, end + 1);
    return { lines: complete.toString("utf8").replace(/\r/g, "").split("\n").slice(0, -1), bytes: complete.length };
  } finally {
    closeSync(fd);
  }
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function post(readings: unknown[]): Promise<{ ok: true; saved: number; replayed: number } | { ok: false; retry: boolean; message: string }> {
  try {
    const response = await fetch(endpoint, {
      method: "POST",
      headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
      body: JSON.stringify({ pressureUnit: "KPA", readings }),
      signal: AbortSignal.timeout(30_000),
    });
    const body = (await response.json().catch(() => null)) as { saved?: number; replayed?: number; error?: { code: string; message: string } } | null;
    if (response.ok) return { ok: true, saved: body?.saved ?? 0, replayed: body?.replayed ?? 0 };
    const message = body?.error ? `${response.status} ${body.error.code}: ${body.error.message}` : `${response.status} from the app`;
    // Refusals a retry may get past (the app busy or restarting, the rate limit) are retried; the others wait for a person.
    return { ok: false, retry: response.status >= 500 || response.status === 429, message };
  } catch (error) {
    return { ok: false, retry: true, message: `the app did not answer (${error instanceof Error ? error.message : String(error)})` };
  }
}

async function main() {
  log(`posting new lines of ${file} to ${run} at ${endpoint}; state in ${stateFile}`);
  let waitingSince: string | null = null;
  for (;;) {
    const fileId = fileIdentity();
    if (!fileId) {
      if (waitingSince !== "no file") log("waiting for the logger's file to appear");
      waitingSince = "no file";
      await sleep(pollMs);
      continue;
    }
    let state = loadState();
    if (!state || state.fileId !== fileId || statSync(file!).size < state.offset) {
      if (state) log("the logger started a new file; reading it from the top");
      state = { fileId, offset: 0, nextLine: 1, header: null, separator: "," };
    }
    const { lines, bytes } = readNewLines(state.offset);
    if (!lines.length) {
      await sleep(pollMs);
      continue;
    }
    let next = { ...state, offset: state.offset + bytes, nextLine: state.nextLine + lines.length };
    let body = lines.map((text, i) => ({ lineNumber: state.nextLine + i, text }));
    if (!state.header) {
      const headerIndex = body.findIndex((l) => l.text.trim() !== "");
      if (headerIndex < 0) {
        saveState(next);
        continue;
      }
      const parsed = parseReadingsCsv(body[headerIndex]!.text);
      next = { ...next, header: parsed.header, separator: parsed.separator };
      body = body.slice(headerIndex + 1);
    }
    const header = next.header!;
    const mapped = loggerMapping(header, body.find((l) => l.text.trim())?.text ?? null);
    if ("problem" in mapped) {
      log(`${mapped.problem} Waiting.`);
      await sleep(pollMs * 4);
      continue;
    }
    const batch = body.slice(0, MAX_PER_POST);
    const { readings, stoppedAt } = loggerLinesToReadings({ header, separator: next.separator, lines: batch, fileId, mapping: mapped.mapping, timeZone: values["time-zone"], hash: sha256 });
    // Only what was read whole is posted; the state moves to the end of the posted lines.
    const postedUpTo = stoppedAt ? stoppedAt.lineNumber : batch.length < body.length ? batch[batch.length - 1]!.lineNumber + 1 : next.nextLine;
    const consumed = (lineNumber: number) => {
      // Bytes of the lines before `lineNumber`, from the state's offset.
      const upTo = lines.slice(0, lineNumber - state.nextLine);
      return state.offset + Buffer.byteLength(upTo.map((l) => `${l}\n`).join(""), "utf8");
    };
    if (readings.length) {
      const answer = await post(readings.map((r) => r.reading));
      if (!answer.ok) {
        if (waitingSince !== answer.message) log(`${answer.message}${answer.retry ? "; trying again" : "; fix it, and the bridge will try again"}`);
        waitingSince = answer.message;
        await sleep(answer.retry ? pollMs : pollMs * 4);
        continue;
      }
      waitingSince = null;
      log(`${readings.length} line(s) posted: ${answer.saved} saved, ${answer.replayed} already there`);
    }
    saveState({ ...next, offset: consumed(postedUpTo), nextLine: postedUpTo });
    if (stoppedAt) {
      if (waitingSince !== stoppedAt.message) log(`${stoppedAt.message} Waiting for the line to be corrected.`);
      waitingSince = stoppedAt.message;
      await sleep(pollMs * 4);
    }
  }
}

for (const signal of ["SIGINT", "SIGTERM"] as const)
  process.on(signal, () => {
    log("stopped");
    process.exit(0);
  });

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});

/**
 * What posting readings through the API costs beside the grid's own save, in the same run: a throw-away
 * database on the DATABASE_URL server, two permeating runs (invented), BATCHES batches of PER_BATCH readings
 * saved by recordReadings (the baseline) and posted to the route handler with an instrument token and keys
 * (token look-up, rate count, request record, key check and key rows on top), then every batch posted again
 * as retries. Prints milliseconds per reading and the ratios; asserts nothing.
 * Run: DATABASE_URL=postgresql://postgres@127.0.0.1:5432/postgres npm run bench:api
 */
import { createTestDatabase } from "../tests/support/test-database";

const BATCHES = Number(process.env.SEEPLINE_BENCH_BATCHES ?? 10);
// Readings 10 minutes apart from a permeation start 4 days back: at most 570 readings stay in the past.
const PER_BATCH = 50;

async function main() {
  if (!process.env.DATABASE_URL) throw new Error("set DATABASE_URL to a local PostgreSQL server, e.g. postgresql://postgres@127.0.0.1:5432/postgres");
  const database = await createTestDatabase("bench_api");
  try {
    process.env.DATABASE_URL = database.url;
    process.env.NEXTAUTH_SECRET ??= "bench-only-secret-0123456789abcdefghij";
    process.env.SEEPLINE_BCRYPT_COST = "4";
    process.env.SEEPLINE_API_RATE_PER_MINUTE = "100000";
    const { makeRun, at } = await import("../tests/support/make-permeating-run");
    const { recordReadings } = await import("../lib/server/readings/record-readings");
    const { createApiToken } = await import("../lib/server/api-tokens/create-api-token");
    const { getDb } = await import("../lib/server/db/client");
    const route = await import("../app/api/v1/runs/[labNumber]/readings/route");

    const [grid, api] = [await makeRun({ startedDaysAgo: 4 }), await makeRun({ startedDaysAgo: 4 })];
    const cell = await getDb().equipment.findUniqueOrThrow({ where: { id: api.run.cellId }, select: { assetTag: true } });
    const { token } = await createApiToken({ actor: api.technician, input: { name: "bench logger", scope: "READINGS_POST", cells: cell.assetTag } });
    const reading = (start: Date, i: number) => ({
      takenAt: at(start, i / 6), inflowLevelMm: (490 - 0.5 * i).toFixed(1), outflowLevelMm: (10 + 0.5 * i).toFixed(1),
      influentPressure: "530", effluentPressure: "516", cellPressure: "565", temperatureC: "20.1",
    });
    const batch = (start: Date, b: number) => Array.from({ length: PER_BATCH }, (_, k) => reading(start, b * PER_BATCH + k));
    const post = async (b: number) => {
      const body = { pressureUnit: "KPA", readings: batch(api.permeationStartedAt, b).map((r, k) => ({ ...r, idempotencyKey: `bench:${b}:${k}` })) };
      const response = await route.POST(new Request(`http://bench/api/v1/runs/${api.run.labNumber}/readings`, { method: "POST", headers: { authorization: `Bearer ${token}`, "content-type": "application/json" }, body: JSON.stringify(body) }), { params: Promise.resolve({ labNumber: api.run.labNumber }) });
      if (response.status >= 300) throw new Error(`API answered ${response.status}: ${await response.text()}`);
    };
    const time = async (work: () => Promise<void>) => {
      const t0 = performance.now();
      await work();
      return performance.now() - t0;
    };
    // Batch 0 of each warms the connections and the code paths, untimed; then the two alternate batch by batch,
    // so that both see runs of the same length (each save reads the run's readings so far).
    await recordReadings({ actor: grid.technician, input: { runId: grid.run.id, pressureUnit: "KPA", readings: batch(grid.permeationStartedAt, 0) } });
    await post(0);
    let gridMs = 0;
    let apiMs = 0;
    for (let b = 1; b <= BATCHES; b++) {
      gridMs += await time(() => recordReadings({ actor: grid.technician, input: { runId: grid.run.id, pressureUnit: "KPA", readings: batch(grid.permeationStartedAt, b) } }).then(() => undefined));
      apiMs += await time(() => post(b));
    }
    const replayMs = await time(async () => {
      for (let b = 1; b <= BATCHES; b++) await post(b);
    });
    const n = BATCHES * PER_BATCH;
    const saved = await getDb().reading.count({ where: { runId: api.run.id } });
    console.log(`${n} readings timed in ${BATCHES} batches of ${PER_BATCH}, after one untimed batch each (saved through the API: ${saved})`);
    console.log(`grid save (recordReadings, baseline): ${(gridMs / n).toFixed(2)} ms per reading`);
    console.log(`API post with keys:                  ${(apiMs / n).toFixed(2)} ms per reading  (${(apiMs / gridMs).toFixed(2)} x baseline)`);
    console.log(`API retry of the same batches:       ${(replayMs / n).toFixed(2)} ms per reading  (${(replayMs / gridMs).toFixed(2)} x baseline; nothing saved)`);
    await getDb().$disconnect();
  } finally {
    await database.drop();
  }
}

main().then(
  () => process.exit(0),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);

import { bulkSeedSql } from "./bulk-seed";

/** Lab numbers and ids of the runs the scale benchmark measures or writes to. */
export const SCALE = {
  runs: 20_000,
  readings: 1_000_000,
  longRun: { id: "bench-run-long", labNumber: "T25-90001", readings: 100_000 },
  shortRun: { id: "bench-run-short", labNumber: "T25-90002", readings: 100 },
  importRun: { id: "bench-run-import", labNumber: "T25-90003" },
  plainRun: { id: "bench-run-plain", labNumber: "T25-90004" },
} as const;
const RUNS_WITH_READINGS = (SCALE.readings - SCALE.longRun.readings - SCALE.shortRun.readings) / 100;

/**
 * The scale benchmark's data on top of the demo, for the migration owner, dated 2023 to 2025 so its lab
 * numbers never meet the demo's: the list benchmark's 100,000 rolls, 40 cells, 20,000 approved runs (one
 * mounted every 75 minutes), 100 readings on each of the first 8,999 of them, a run of 100,000 readings and
 * one of 100 (each with its permeation stage and calibrated burette panel), and two permeating runs of
 * `technicianId` to import into. The audit triggers are off during the load (a throw-away database) and on
 * again before anything is measured. All invented.
 */
export function scaleSeedSql(technicianId: string): string {
  const measured = (run: { id: string; labNumber: string }, specimen: number, cell: number, state: string, assignedAt: string) => `
INSERT INTO "Run" (id, "labNumber", "specimenId", "cellId", "methodCode", state, "performedById", "assignedAt", "updatedAt")
  SELECT '${run.id}', '${run.labNumber}', id, 'bench-cell-${cell}', 'D5887', '${state}', '${technicianId}', timestamp '${assignedAt}', now()
  FROM (SELECT id, row_number() OVER (ORDER BY id) AS n FROM "Specimen" WHERE id LIKE 'bench-%') x WHERE n = ${specimen};
INSERT INTO "RunEquipment" ("runId", "equipmentId", "calibrationId", role) VALUES ('${run.id}', 'bench-panel', 'bench-cal', 'burette panel');
INSERT INTO "RunStage" (id, "runId", sequence, kind, "cellPressurePa", "influentPressurePa", "effluentPressurePa", "startedAt", "recordedById")
  VALUES ('${run.id}-perm', '${run.id}', 1, 'PERMEATION', 550000, 530000, 516000, timestamp '${assignedAt}' + interval '3 days', '${technicianId}');`;
  const readings = (run: { id: string }, count: number, minutes: number) => `
INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa",
    "influentPressurePa", "effluentPressurePa", "cellPressurePa", "temperatureC", source, "recordedById")
  SELECT '${run.id}-' || s, '${run.id}', s, st."startedAt" + (s - 1) * interval '${minutes} minutes', (s - 1) * ${minutes * 60},
         452 - (s - 1) * 0.001, 18 + (s - 1) * 0.001, (s - 1) * 0.001 * 0.0314, (s - 1) * 0.001 * 0.0312, 14000, 530000, 516000, 550000,
         20 + 0.3 * sin(s / 480.0), 'bench-logger.csv', '${technicianId}'
  FROM generate_series(1, ${count}) s, "RunStage" st WHERE st.id = '${run.id}-perm';`;
  return `
SELECT set_config('seepline.actor_id', 'system:bench', false);
DO $$ DECLARE t record; BEGIN
  FOR t IN SELECT tgrelid::regclass AS tbl FROM pg_trigger WHERE tgname = 'audit_row' LOOP EXECUTE format('ALTER TABLE %s DISABLE TRIGGER audit_row', t.tbl); END LOOP;
END $$;
${bulkSeedSql({ firstDay: "2023-01-01" })}
INSERT INTO "Equipment" (id, "assetTag", kind, name, "ratedMaxPressurePa", "updatedAt")
  SELECT 'bench-cell-' || g, 'BC-' || lpad(g::text, 2, '0'), 'PERMEAMETER_CELL', 'Bench cell ' || g, 1000000, now() FROM generate_series(1, 40) g;
INSERT INTO "Equipment" (id, "assetTag", kind, name, "updatedAt") VALUES ('bench-panel', 'BP-BENCH', 'BURETTE_PANEL', 'Bench burette panel', now());
INSERT INTO "Calibration" (id, "equipmentId", "calibratedAt", "dueAt", reference, "performedBy", "values", "recordedById")
  VALUES ('bench-cal', 'bench-panel', timestamp '2023-01-01', timestamp '2030-01-01', 'CAL-BENCH', 'Bench metrology', '{"inflowBuretteAreaM2": 3.14e-5, "outflowBuretteAreaM2": 3.12e-5}', 'bench-user-1');
INSERT INTO "Run" (id, "labNumber", "specimenId", "cellId", "methodCode", state, "performedById", "assignedAt", "updatedAt")
  SELECT 'bench-run-' || n, 'T' || to_char(ts, 'YY') || '-' || lpad((row_number() OVER (PARTITION BY date_part('year', ts) ORDER BY n))::text, 5, '0'),
         id, 'bench-cell-' || (1 + n % 40), "intendedMethodCode", 'APPROVED', 'bench-user-' || (1 + n % 6), ts, now()
  FROM (SELECT id, "intendedMethodCode", n, timestamp '2023-01-20' + n * interval '75 minutes' AS ts
        FROM (SELECT id, "intendedMethodCode", row_number() OVER (ORDER BY id) AS n FROM "Specimen" WHERE id LIKE 'bench-%') x WHERE n <= ${SCALE.runs - 4}) y;
INSERT INTO "Reading" (id, "runId", sequence, "takenAt", "elapsedS", "inflowLevelMm", "outflowLevelMm", "inflowCumulativeMl", "outflowCumulativeMl", "headPa",
    "influentPressurePa", "effluentPressurePa", "temperatureC", source, "recordedById")
  SELECT r.id || '-' || s, r.id, s, r."assignedAt" + interval '3 days' + s * interval '1 hour', s * 3600, 452 - s * 0.1, 18 + s * 0.1,
         s * 0.1 * 0.0314, s * 0.1 * 0.0312, 14000, 530000, 516000, 20, 'bench-logger.csv', r."performedById"
  FROM (SELECT id, "assignedAt", "performedById" FROM "Run" WHERE id LIKE 'bench-run-%' ORDER BY "assignedAt" LIMIT ${RUNS_WITH_READINGS}) r CROSS JOIN generate_series(1, 100) s;
${measured(SCALE.longRun, SCALE.runs - 3, 1, "APPROVED", "2025-01-01")}
${measured(SCALE.shortRun, SCALE.runs - 2, 2, "APPROVED", "2025-01-01")}
${readings(SCALE.longRun, SCALE.longRun.readings, 3)}
${readings(SCALE.shortRun, SCALE.shortRun.readings, 3)}
${measured(SCALE.importRun, SCALE.runs - 1, 3, "PERMEATING", "2025-06-01")}
${measured(SCALE.plainRun, SCALE.runs, 4, "PERMEATING", "2025-06-01")}
DO $$ DECLARE t record; BEGIN
  FOR t IN SELECT tgrelid::regclass AS tbl FROM pg_trigger WHERE tgname = 'audit_row' LOOP EXECUTE format('ALTER TABLE %s ENABLE TRIGGER audit_row', t.tbl); END LOOP;
END $$;
ANALYZE;
`;
}

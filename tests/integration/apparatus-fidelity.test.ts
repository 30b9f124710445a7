import { describe, expect, it } from "vitest";
import { evaluateRun, type Reading } from "@/lib/hydraulics";
import { buildCertificateSnapshot } from "@/lib/server/certificates/build-certificate-snapshot";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { withActor } from "@/lib/server/db/transaction";
import { recordCalibration } from "@/lib/server/equipment/record-calibration";
import { createMethodSettingsVersion } from "@/lib/server/methods/create-method-settings-version";
import { importReadingsFile } from "@/lib/server/readings/import-readings-file";
import { recordReadings } from "@/lib/server/readings/record-readings";
import { approveRun } from "@/lib/server/review/approve-run";
import { chooseRunSettings } from "@/lib/server/review/choose-run-settings";
import { evaluateRunRecords } from "@/lib/server/runs/evaluate-run-records";
import { readResultRecord } from "@/lib/results/result-record";
import { db, makeUser, unique } from "../support/factories";
import { withOwner } from "../support/owner";
import { failure } from "../support/refusals";
import { makePermeatingRun, makeSettingsVersion, readingsOf } from "../support/run-fixtures";

const HOUR = 3_600_000;
const SYSTEM = { id: "system:test" };
const at = (start: Date, hours: number) => new Date(start.getTime() + hours * HOUR).toISOString();
const gridRow = (takenAt: string, inflow: string, outflow: string, extra: Record<string, unknown> = {}) => ({
  takenAt, inflowLevelMm: inflow, outflowLevelMm: outflow, influentPressure: "531", effluentPressure: "517", cellPressure: "551", temperatureC: "20", ...extra,
});

// Invented scale readings: the inflow burette falls and the outflow one rises about 12 mm per 6 h; at 24 h
// the technician refills and drains (the reading 5 minutes later is marked "after refill").
const GRID = [[0, "452.0", "18.0"], [6, "439.8", "30.1"], [12, "427.7", "42.1"], [18, "415.7", "54.0"], [24, "403.8", "65.8"], [24.1, "480.0", "10.0", true]] as const;
const CSV = ["Elapsed (h),Inflow burette (mm),Outflow burette (mm),Influent kPa,Effluent kPa,Cell kPa,Temp °C,Refill", "30,468.2,21.7,531,517,551,20.1,", "36,456.5,33.3,531,517,551,20.0,", "42,444.9,44.8,531,517,551,19.9,", "48,433.4,56.2,531,517,551,20.0,"].join("\n");

async function recordTheReadings(technician: Awaited<ReturnType<typeof makeUser>>, runId: string, start: Date) {
  await recordReadings({ actor: technician, input: { runId, pressureUnit: "KPA", readings: GRID.map(([h, i, o, refill]) => gridRow(at(start, h), i, o, refill ? { afterRefill: true } : {})) } });
  const labNumber = (await db().run.findUniqueOrThrow({ where: { id: runId } })).labNumber;
  await importReadingsFile({ actor: technician, input: { labNumber, fileName: "logger-after-refill.csv", mode: "save" }, body: [new TextEncoder().encode(CSV)] });
}

/** The same run done by hand: levels above the datum (outflow zero 40 mm up), volumes across the refill, 14 kPa, 20 °C except where logged. */
function byHand(): Reading[] {
  const rows = [...GRID.map(([h, i, o, r]) => ({ h, i: Number(i), o: Number(o), r: Boolean(r), t: 20 })), ...CSV.split("\n").slice(1).map((line) => { const c = line.split(","); return { h: Number(c[0]), i: Number(c[1]), o: Number(c[2]), r: false, t: Number(c[6]) }; })];
  let vin = 0;
  let vout = 0;
  return rows.map((row, n) => {
    if (n > 0 && !row.r) {
      vin += ((rows[n - 1]!.i - row.i) * 31.4) / 1000;
      vout += ((row.o - rows[n - 1]!.o) * 31.2) / 1000;
    }
    return { elapsedS: Math.round(row.h * 3600), inflowMl: vin, outflowMl: vout, headKPa: 14, temperatureC: row.t, inflowLevelMm: row.i, outflowLevelMm: row.o + 40, ...(row.r && { afterRefill: true as const }) };
  });
}

describe("readings with burette levels and a refill, saved through the operations", () => {
  it("give the same k as evaluateRun on the same numbers done by hand, by falling head with rising tail", async () => {
    const technician = await makeUser("TECHNICIAN");
    const { run, permeationStartedAt } = await makePermeatingRun(technician.id, { outflowZeroMm: 40 });
    await recordTheReadings(technician, run.id, permeationStartedAt);
    const saved = await readingsOf(run.id);
    expect(saved.map((r) => r.afterRefill)).toEqual([false, false, false, false, false, true, false, false, false, false]);

    const verdict = await evaluateRunRecords(db(), run.id);
    expect(verdict.calculation.key).toBe("falling-head-rising-tail");
    expect(verdict.refillsAtS).toEqual([24.1 * 3600]);
    const expected = evaluateRun({ method: "D5887", specimen: { diameterMm: 100, thicknessMm: 6 }, readings: byHand(), burettes: { inflowAreaMm2: 31.4, outflowAreaMm2: 31.2 } }, { termination: { trendMinRelativeChange: 0.1 } });
    const got = verdict.evaluation!;
    expect(got.intervals).toHaveLength(8); // ten readings, one refill: no interval spans it
    expect(got.intervals.map((iv) => [iv.fromS, iv.toS])).toEqual(expected.intervals.map((iv) => [iv.fromS, iv.toS]));
    got.intervals.forEach((iv, i) => expect(iv.k / expected.intervals[i]!.k - 1).toBeCloseTo(0, 9));
    expect(got.termination.met).toBe(expected.termination.met);
  });

  it("refuses a refill that lowered the inflow burette and a level off the calibrated scale, naming the field; nothing is saved", async () => {
    const technician = await makeUser("TECHNICIAN");
    const { run, permeationStartedAt } = await makePermeatingRun(technician.id);
    const refill = await failure(recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "452", "18"), gridRow(at(permeationStartedAt, 6), "440", "30"), gridRow(at(permeationStartedAt, 6.1), "430", "10", { afterRefill: true })] } }));
    expect(refill.fieldErrors["readings.2.inflowLevelMm"]).toBe("Row 3, inflow burette level after the refill: 430 mm is below the 440 mm just before it (Row 2); a refill raises the inflow burette. Check the two levels.");
    const off = await failure(recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "512", "18")] } }));
    expect(off.fieldErrors["readings.0.inflowLevelMm"]).toMatch(/512 mm is outside the scale's calibrated range, 0 to 500 mm/);
    expect(await db().reading.count({ where: { runId: run.id } })).toBe(0);
  });
});

describe("the lab's own criteria, versioned", () => {
  it("a lab administrator saves a new version with its reason (audited); bad values, a stale version and other roles are refused; old versions never change", async () => {
    const [admin, technician] = await Promise.all([makeUser("LAB_ADMIN"), makeUser("TECHNICIAN")]);
    const latest = await db().methodSettingsVersion.findFirstOrThrow({ where: { methodCode: "D5084" }, orderBy: { version: "desc" } });
    const values = { ...(latest.settings as Record<string, unknown>), ratioMin: 0.8, ratioMax: 1.2, permeationCellKPa: null, permeationInfluentKPa: null, permeationEffluentKPa: null };
    const input = { methodCode: "D5084", basedOnVersion: latest.version, reason: "Tighter ratio band per procedure LP-7 rev. 3", values };

    expect((await failure(createMethodSettingsVersion({ actor: technician, input }))).code).toBe("FORBIDDEN");
    const empty = await failure(createMethodSettingsVersion({ actor: admin, input: { ...input, values: { ...values, ratioMin: 1.3 } } }));
    expect(empty.fieldErrors["values.ratioMax"]).toBe("The outflow/inflow band is empty: its upper end (1.2) must be above its lower end (1.3).");
    const alpha = await failure(createMethodSettingsVersion({ actor: admin, input: { ...input, values: { ...values, trendAlpha: 1.5 } } }));
    expect(alpha.fieldErrors["values.trendAlpha"]).toMatch(/between 0 and 1/);
    const negative = await failure(createMethodSettingsVersion({ actor: admin, input: { ...input, values: { ...values, uDieDiameterMm: -0.1 } } }));
    expect(negative.fieldErrors["values.uDieDiameterMm"]).toBe("The standard uncertainty of the die diameter (mm) must be at least 0.");
    expect(await db().methodSettingsVersion.count({ where: { methodCode: "D5084", version: { gt: latest.version } } })).toBe(0);

    const created = await createMethodSettingsVersion({ actor: admin, input });
    expect(created.version).toBe(latest.version + 1);
    const audit = await db().auditLog.findFirstOrThrow({ where: { tableName: "MethodSettingsVersion", rowId: created.id } });
    expect(audit).toMatchObject({ operation: "INSERT", actorId: admin.id });
    expect((await failure(createMethodSettingsVersion({ actor: admin, input: { ...input, values: { ...values, ratioMin: 0.7 } } }))).code).toBe("CONFLICT");
    // The app's role has no right to rewrite a version; the owner is stopped by the trigger.
    await expect(withActor(admin, (tx) => tx.methodSettingsVersion.update({ where: { id: created.id }, data: { reason: "rewritten" } }))).rejects.toThrow(/permission denied/);
    await expect(withOwner(admin, (tx) => tx.methodSettingsVersion.update({ where: { id: created.id }, data: { reason: "rewritten" } }))).rejects.toThrow(/append-only/);
    await expect(withOwner(admin, (tx) => tx.methodSettingsVersion.delete({ where: { id: created.id } }))).rejects.toThrow(/append-only/);
    await expect(withOwner(admin, (tx) => tx.$executeRawUnsafe(`TRUNCATE "MethodSettingsVersion" CASCADE`))).rejects.toThrow(/append-only/);
    expect(await db().methodSettingsVersion.findUniqueOrThrow({ where: { id: created.id } })).toMatchObject({ reason: input.reason, version: created.version });
  });

  it("a run is judged by its own version; QA may choose another with a reason, and approval records it with the criteria, the uncertainty budget and the leakage check", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    const { run, permeationStartedAt, settings, project } = await makePermeatingRun(technician.id, { outflowZeroMm: 40, leakageRateM3PerS: 1e-13 });
    await recordTheReadings(technician, run.id, permeationStartedAt);
    const later = await makeSettingsVersion("D5887", { uDieDiameterMm: 0.06, trendMinChangePct: 15 });
    expect((await evaluateRunRecords(db(), run.id)).settings).toMatchObject({ versionId: settings.id, version: settings.version });

    await withActor(SYSTEM, (tx) => tx.run.update({ where: { id: run.id }, data: { state: "SUBMITTED", terminatedAt: new Date(), terminationKind: "CRITERIA_MET", postTestThicknessMm: 5.9, submittedAt: new Date() } }));
    expect((await failure(chooseRunSettings({ actor: qa, input: { runId: run.id, version: 1, settingsVersionId: later.id, reason: "" } }))).fieldErrors).toHaveProperty("reason");
    expect((await failure(chooseRunSettings({ actor: technician, input: { runId: run.id, version: 1, settingsVersionId: later.id, reason: "Revised trend threshold" } }))).code).toBe("FORBIDDEN");
    await chooseRunSettings({ actor: qa, input: { runId: run.id, version: 1, settingsVersionId: later.id, reason: "Revised trend threshold applies to runs under review" } });

    await approveRun({ actor: qa, input: { runId: run.id, version: 2 } });
    const results = await db().result.findMany({ where: { runId: run.id }, orderBy: { property: "asc" } });
    expect(results.map((r) => r.property).sort()).toEqual(["HYDRAULIC_CONDUCTIVITY", "INDEX_FLUX"]);
    for (const result of results) {
      expect(result.methodSettingsVersionId).toBe(later.id);
      const record = readResultRecord(result.evaluation)!;
      expect(record.calculation.key).toBe("falling-head-rising-tail");
      expect(record.settings).toMatchObject({ version: later.version, chosen: { by: qa.name, reason: "Revised trend threshold applies to runs under review" } });
      expect(record.criteria.find((c) => c.key === "trend")!.limit).toMatch(/below 15 % of the mean/);
      if (!record.uncertainty.stated) throw new Error("expected the uncertainty to be stated");
      expect(record.uncertainty.contributors[0]!.source).toMatch(/calibration|lab value/);
      expect(result.expandedUncertainty).toBeCloseTo(record.uncertainty.expandedRelative * result.value, 20);
      expect(record.leakage).toMatchObject({ flagged: false, cell: expect.any(String) });
      expect(record.refills).toBe(1);
    }

    // The certificate names the version, states the criteria, the calculation, the leakage check and the largest contributors.
    const draft = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: results.map((r) => r.id) } });
    const revision = await db().certificateRevision.findFirstOrThrow({ where: { certificateId: draft.id } });
    const snapshot = await withActor(qa, (tx) => buildCertificateSnapshot(tx, { revisionId: revision.id, signer: qa, meaning: "Approved for issue", now: new Date(), baseUrl: "http://localhost" }));
    const test = snapshot.tests[0]!;
    expect(test.calculation).toMatch(/^Falling head with rising tail \(ASTM D5084 method C\)/);
    expect(test.criteria).toMatchObject({ settings: `ASTM D5887 settings, version ${later.version}`, chosen: `chosen by ${qa.name}: Revised trend threshold applies to runs under review` });
    expect(test.leakage).toMatch(/^Apparatus leakage of cell .*ASTM D5887 asks for less than 10 %\.$/);
    expect(test.refills).toBe(1);
    expect(test.refillHours).toEqual([24.1]);
    for (const line of test.results) expect(line.uncertaintyContributors).toHaveLength(3);
    expect(test.deviations).toEqual([]);
  });

  it("a leakage of 10 % of the flow or more is flagged: approval needs QA's acknowledgement and the certificate states it as a deviation", async () => {
    const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
    // The measured flow is about 0.40 mL per 6 h = 1.9e-11 m³/s; a leakage of 5e-12 m³/s is about a quarter of it.
    const { run, permeationStartedAt, project } = await makePermeatingRun(technician.id, { leakageRateM3PerS: 5e-12 });
    await recordTheReadings(technician, run.id, permeationStartedAt);
    await withActor(SYSTEM, (tx) => tx.run.update({ where: { id: run.id }, data: { state: "SUBMITTED", terminatedAt: new Date(), terminationKind: "EARLY_END", terminationReason: "Client asked for an early result", postTestThicknessMm: 5.9, submittedAt: new Date() } }));
    const refused = await failure(approveRun({ actor: qa, input: { runId: run.id, version: 1 } }));
    expect(refused.fieldErrors).toHaveProperty("acknowledgeLeakage");
    expect(refused.message).toMatch(/of the measured flow; ASTM D5887 asks for less than 10 %, which this check does not meet\. Tick the acknowledgement/);
    await approveRun({ actor: qa, input: { runId: run.id, version: 1, acknowledgeLeakage: true } });
    const result = await db().result.findFirstOrThrow({ where: { runId: run.id, property: "INDEX_FLUX" } });
    // An early end carries its uncertainty too.
    expect(result.expandedUncertainty).toBeGreaterThan(0);
    expect(readResultRecord(result.evaluation)!.leakage).toMatchObject({ flagged: true, acknowledgedBy: qa.name });
    const draft = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds: [result.id] } });
    const revision = await db().certificateRevision.findFirstOrThrow({ where: { certificateId: draft.id } });
    const snapshot = await withActor(qa, (tx) => buildCertificateSnapshot(tx, { revisionId: revision.id, signer: qa, meaning: "Approved for issue", now: new Date(), baseUrl: "http://localhost" }));
    expect(snapshot.tests[0]!.deviations).toEqual([
      "Permeation ended before the termination criteria were met: Client asked for an early result.",
      expect.stringMatching(new RegExp(`^Apparatus leakage of cell .*which this check does not meet\\. Acknowledged by ${qa.name} at approval\\.$`)),
    ]);
  });
});

describe("calibration records carry uncertainty and leakage", () => {
  it("a negative standard uncertainty is refused naming the field; a cell's leakage check is stored with it", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await withActor(admin, (tx) => tx.equipment.create({ data: { assetTag: unique("CELL").toUpperCase(), kind: "PERMEAMETER_CELL", name: "Cell", ratedMaxPressurePa: 1_000_000 } }));
    const base = { equipmentId: cell.id, calibratedAt: "2026-11-01", dueAt: "2027-11-01", reference: unique("CAL"), performedBy: "Test metrology", passed: true };
    const negative = await failure(recordCalibration({ actor: admin, input: { ...base, standardUncertainty: "-0.1" } }));
    expect(negative.fieldErrors.standardUncertainty).toBe("The standard uncertainty must be at least 0.");
    const half = await failure(recordCalibration({ actor: admin, input: { ...base, leakageRate: "2e-13" } }));
    expect(half.fieldErrors).toMatchObject({ leakageCheckedAt: "Enter the date of the leakage check.", leakageMethod: expect.stringMatching(/^Say how the leakage was checked/) });
    const saved = await recordCalibration({ actor: admin, input: { ...base, leakageCheckedAt: "2026-11-01", leakageMethod: "dummy specimen, 24 h", leakageRate: "2e-13", leakageUnit: "M3_PER_S" } });
    expect(saved.values).toEqual({ leakageCheckedAt: "2026-11-01T00:00:00.000Z", leakageMethod: "dummy specimen, 24 h", leakageRateM3PerS: 2e-13 });
  });
});

import ExcelJS from "exceljs";
import { describe, expect, it } from "vitest";
import { withActor } from "@/lib/server/db/transaction";
import { exportAuditWorkbook } from "@/lib/server/exports/export-audit-workbook";
import { exportProjectResultsWorkbook } from "@/lib/server/exports/export-project-results-workbook";
import { exportRunWorkbook } from "@/lib/server/exports/export-run-workbook";
import { recordReadings } from "@/lib/server/readings/record-readings";
import { evaluateRunRecords } from "@/lib/server/runs/evaluate-run-records";
import { db, makeUser } from "../support/factories";
import { at, gridRow, makeRun } from "../support/make-permeating-run";
import { codeOf } from "../support/refusals";

const SYSTEM = { id: "system:test" };

async function read(buffer: Buffer) {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(buffer as unknown as ArrayBuffer);
  const sheet = (name: string) => {
    const ws = workbook.getWorksheet(name);
    if (!ws) throw new Error(`no sheet ${name}`);
    const header = (ws.getRow(1).values as unknown[]).slice(1).map(String);
    const rows: Array<Record<string, unknown>> = [];
    ws.eachRow((row, n) => {
      if (n > 1) rows.push(Object.fromEntries(header.map((h, i) => [h, row.getCell(i + 1).value])));
    });
    return { header, rows };
  };
  return { names: workbook.worksheets.map((w) => w.name), sheet };
}

describe("spreadsheet exports (read back with exceljs)", () => {
  it("a run's readings and intervals: units in the headers, numbers as numbers equal to the database's", async () => {
    const { technician, qa, run, permeationStartedAt } = await makeRun();
    const rows = [["452", "18"], ["441.2", "28.9"], ["430.4", "39.8"], ["419.7", "50.5"], ["409", "61.3"], ["398.3", "72"]];
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: rows.map(([i, o], n) => gridRow(at(permeationStartedAt, n * 6), i!, o!)) } });
    const { buffer, fileName } = await exportRunWorkbook({ actor: qa, labNumber: run.labNumber });
    expect(fileName).toBe(`${run.labNumber}-readings.xlsx`);
    const book = await read(buffer);
    expect(book.names).toEqual(["Readings", "Intervals", "Criteria"]);

    const readings = book.sheet("Readings");
    expect(readings.header).toEqual(expect.arrayContaining(["Elapsed (h)", "Inflow volume, cumulative (mL)", "Line-pressure difference (kPa)", "Temperature (°C)", "Taken at (UTC)"]));
    const saved = await db().reading.findMany({ where: { runId: run.id }, orderBy: { sequence: "asc" } });
    expect(readings.rows).toHaveLength(saved.length);
    readings.rows.forEach((row, i) => {
      const r = saved[i]!;
      expect(row["Reading"]).toBe(r.sequence);
      expect(row["Elapsed (h)"]).toBe(r.elapsedS / 3600);
      expect(row["Inflow volume, cumulative (mL)"]).toBe(r.inflowCumulativeMl);
      expect(row["Outflow volume, cumulative (mL)"]).toBe(r.outflowCumulativeMl);
      expect(row["Line-pressure difference (kPa)"]).toBe(r.headPa / 1000);
      expect(row["Temperature (°C)"]).toBe(r.temperatureC);
      expect((row["Taken at (UTC)"] as Date).toISOString()).toBe(r.takenAt.toISOString());
    });

    const intervals = book.sheet("Intervals");
    const verdict = await evaluateRunRecords(db(), run.id);
    expect(intervals.rows).toHaveLength(verdict.evaluation!.intervals.length);
    expect(intervals.rows.length).toBeGreaterThan(0);
    intervals.rows.forEach((row, i) => {
      const iv = verdict.evaluation!.intervals[i]!;
      expect(typeof row["k20 (m/s)"]).toBe("number");
      expect(row["k20 (m/s)"]).toBe(iv.k20);
      expect(row["Flux (m³/m²/s)"]).toBe(iv.flux);
      expect(row["To (h)"]).toBe(iv.toS / 3600);
    });
  });

  it("a project's results with their conformance and a conformance matrix, from the project's specification", async () => {
    const { qa, run } = await makeRun();
    const projectId = (await db().run.findUniqueOrThrow({ where: { id: run.id }, select: { specimen: { select: { coupon: { select: { roll: { select: { projectId: true, labNumber: true } } } } } } } })).specimen.coupon.roll;
    const project = await db().project.findUniqueOrThrow({ where: { id: projectId.projectId } });
    await withActor(SYSTEM, async (tx) => {
      await tx.result.create({ data: { runId: run.id, property: "INDEX_FLUX", value: 2.345e-9, unit: "m3/m2/s", expandedUncertainty: 1.2e-10, temperatureC: 20.1 } });
      // GRI-GCL3 index flux limit as cited in public specifications (DOMAIN.md): at most 1e-8 m³/m²/s.
      await tx.specification.create({ data: { name: "Test spec", projectId: project.id, limits: { create: [{ property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM", significantDigits: 1, conformanceMethod: "ROUNDING" }] } } });
    });
    const book = await read((await exportProjectResultsWorkbook({ actor: qa, projectCode: project.code })).buffer);
    expect(book.names).toEqual(["Results", "Conformance matrix"]);
    const [result] = book.sheet("Results").rows;
    expect(result).toMatchObject({ Run: run.labNumber, "Value (in Unit)": 2.345e-9, Unit: "m3/m2/s", "Expanded uncertainty, k = 2 (in Unit)": 1.2e-10, "Temperature (°C)": 20.1, "Limit (in Limit unit)": 1e-8, Conforms: "yes" });
    const matrix = book.sheet("Conformance matrix");
    expect(matrix.rows).toHaveLength(1);
    expect(matrix.rows[0]!["Roll"]).toBe(projectId.labNumber);
    expect(Object.values(matrix.rows[0]!)).toEqual([projectId.labNumber, 2.345e-9, "conforms"]);
  });

  it("the audit trail filter as XLSX: the same rows as the filter, entry numbers as numbers; refused without audit.view", async () => {
    const { technician, qa, run, permeationStartedAt } = await makeRun();
    await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 1), "452", "18")] } });
    const { buffer } = await exportAuditWorkbook({ actor: qa, filter: { record: run.labNumber } });
    const rows = (await read(buffer)).sheet("Audit trail").rows;
    const logged = await db().auditLog.findMany({ where: { tableName: "Reading", after: { path: ["runId"], equals: run.id } } });
    expect(logged).toHaveLength(1);
    const readingRows = rows.filter((r) => r["Kind of record"] === "Reading");
    expect(new Set(readingRows.map((r) => r["Entry"]))).toEqual(new Set([Number(logged[0]!.id)]));
    expect(readingRows.find((r) => r["Field"] === "Temperature")?.["New value (with its unit)"]).toMatch(/^20\.1/);
    expect(await codeOf(exportAuditWorkbook({ actor: technician, filter: {} }))).toBe("FORBIDDEN");
    expect(await codeOf(exportRunWorkbook({ actor: await makeUser("CLIENT_USER"), labNumber: run.labNumber }))).toBe("FORBIDDEN");
  });
});

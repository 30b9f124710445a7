import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { explainConformance } from "@/lib/results/conformance-summary";
import { TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { findProjectLimits } from "../specifications/find-project-limits";
import { addSheet, DATE_TIME_FORMAT, newWorkbook, SCIENTIFIC_FORMAT, workbookBuffer } from "./workbook";

/**
 * A project's results as an XLSX workbook: one row per result with its unit in the header, its expanded
 * uncertainty and, when the project has a specification, its conformance (ASTM E29, the certificate's own
 * decision); and a conformance matrix, roll by property, when there is a specification.
 */
export async function exportProjectResultsWorkbook(options: { actor: CurrentUser; projectCode: string }): Promise<{ fileName: string; buffer: Buffer }> {
  requirePermission(options.actor, "run.view");
  const db = getDb();
  const project = await db.project.findUnique({ where: { code: options.projectCode }, select: { id: true, code: true, name: true } });
  if (!project) throw new AppError("NOT_FOUND", `No project ${options.projectCode}.`);
  const [results, limits] = await Promise.all([
    db.result.findMany({
      where: { run: { specimen: { coupon: { roll: { projectId: project.id } } } } },
      orderBy: [{ run: { labNumber: "asc" } }, { property: "asc" }, { computedAt: "asc" }],
      select: {
        property: true, value: true, unit: true, expandedUncertainty: true, temperatureC: true, computedAt: true, approvedAt: true,
        run: { select: { labNumber: true, methodCode: true, specimen: { select: { labNumber: true, coupon: { select: { roll: { select: { labNumber: true, rollNumber: true } } } } } } } },
      },
    }),
    findProjectLimits({ projectId: project.id }),
  ]);
  const rows = results.map((r) => {
    const limit = limits?.get(r.property) ?? null;
    const explained = limit ? explainConformance({ value: r.value, unit: r.unit }, limit) : null;
    return { ...r, roll: r.run.specimen.coupon.roll, limit, conformance: explained?.summary ?? null, valueInLimitUnit: explained ? Number(explained.valueInLimitUnit) : null };
  });
  type Row = (typeof rows)[number];
  const workbook = newWorkbook();
  // Units differ by property, so the unit has its own column beside a value whose header says so.
  addSheet<Row>(workbook, "Results", [
    { header: "Roll", value: (r) => r.roll.labNumber },
    { header: "Roll number", value: (r) => r.roll.rollNumber },
    { header: "Specimen", value: (r) => r.run.specimen.labNumber },
    { header: "Run", value: (r) => r.run.labNumber },
    { header: "Method", value: (r) => r.run.methodCode },
    { header: "Property", value: (r) => TEST_PROPERTY_LABELS[r.property as TestProperty] ?? r.property, width: 24 },
    { header: "Value (in Unit)", value: (r) => r.value, numFmt: SCIENTIFIC_FORMAT },
    { header: "Unit", value: (r) => r.unit },
    { header: "Expanded uncertainty, k = 2 (in Unit)", value: (r) => r.expandedUncertainty, numFmt: SCIENTIFIC_FORMAT },
    { header: "Temperature (°C)", value: (r) => r.temperatureC },
    { header: "Computed at (UTC)", value: (r) => r.computedAt, numFmt: DATE_TIME_FORMAT, width: 20 },
    { header: "Approved at (UTC)", value: (r) => r.approvedAt, numFmt: DATE_TIME_FORMAT, width: 20 },
    { header: "Limit (in Limit unit)", value: (r) => (r.limit ? Number(r.limit.limitText) : null) },
    { header: "Limit unit", value: (r) => r.limit?.unit ?? null },
    { header: "Limit is a", value: (r) => (r.limit ? (r.limit.direction === "MAXIMUM" ? "maximum" : "minimum") : null) },
    { header: "Compared value (ASTM E29)", value: (r) => r.conformance?.comparedValue ?? null },
    { header: "Conforms", value: (r) => (r.conformance ? (r.conformance.conforms ? "yes" : "no") : null) },
  ], rows);

  if (limits && limits.limits.length) {
    const byRoll = new Map<string, Row[]>();
    for (const r of rows) byRoll.set(r.roll.labNumber, [...(byRoll.get(r.roll.labNumber) ?? []), r]);
    const properties = limits.limits.map((l) => l.property as TestProperty);
    // The latest result per property decides the roll's cell; several results of one property are listed in Results.
    const latest = (list: Row[], p: TestProperty) => list.filter((r) => r.property === p).at(-1) ?? null;
    addSheet<[string, Row[]]>(workbook, "Conformance matrix", [
      { header: "Roll", value: ([roll]) => roll },
      ...properties.flatMap((p) => {
        const limit = limits.get(p)!;
        const label = TEST_PROPERTY_LABELS[p] ?? p;
        return [
          { header: `${label} (${limit.unit})`, value: ([, list]: [string, Row[]]) => latest(list, p)?.valueInLimitUnit ?? null, numFmt: SCIENTIFIC_FORMAT },
          { header: `${label}: ${limit.direction === "MAXIMUM" ? "at most" : "at least"} ${limit.limitText}`, value: ([, list]: [string, Row[]]) => { const r = latest(list, p); return r?.conformance ? (r.conformance.conforms ? "conforms" : "does not conform") : "not tested"; }, width: 26 },
        ];
      }),
    ], [...byRoll.entries()]);
  }
  return { fileName: `${project.code}-results.xlsx`, buffer: await workbookBuffer(workbook) };
}

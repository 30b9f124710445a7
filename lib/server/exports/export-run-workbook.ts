import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { evaluateRunRecords } from "../runs/evaluate-run-records";
import { addSheet, DATE_TIME_FORMAT, newWorkbook, SCIENTIFIC_FORMAT, workbookBuffer } from "./workbook";

const kPa = (pa: number | null) => (pa === null ? null : pa / 1000);

/**
 * A run's readings (every version, corrections and the readings they replace marked) and the intervals and
 * criteria lib/hydraulics computes from the readings in force, as an XLSX workbook with units in the headers.
 */
export async function exportRunWorkbook(options: { actor: CurrentUser; labNumber: string }): Promise<{ fileName: string; buffer: Buffer }> {
  requirePermission(options.actor, "run.view");
  const db = getDb();
  const run = await db.run.findUnique({ where: { labNumber: options.labNumber }, select: { id: true, labNumber: true, methodCode: true } });
  if (!run) throw new AppError("NOT_FOUND", `No run ${options.labNumber}.`);
  const [readings, verdict] = await Promise.all([
    db.reading.findMany({
      where: { runId: run.id },
      orderBy: [{ sequence: "asc" }, { createdAt: "asc" }],
      select: {
        sequence: true, takenAt: true, elapsedS: true, inflowLevelMm: true, outflowLevelMm: true, inflowCumulativeMl: true, outflowCumulativeMl: true, headPa: true,
        influentPressurePa: true, effluentPressurePa: true, cellPressurePa: true, temperatureC: true, influentEcMsPerM: true, effluentEcMsPerM: true, influentPh: true,
        effluentPh: true, afterRefill: true, source: true, correctionReason: true, correctedBy: { select: { id: true } }, recordedBy: { select: { name: true } },
      },
    }),
    evaluateRunRecords(db, run.id),
  ]);
  type R = (typeof readings)[number];
  const workbook = newWorkbook();
  addSheet<R>(workbook, "Readings", [
    { header: "Reading", value: (r) => r.sequence },
    { header: "Taken at (UTC)", value: (r) => r.takenAt, numFmt: DATE_TIME_FORMAT, width: 20 },
    { header: "Elapsed (h)", value: (r) => r.elapsedS / 3600, numFmt: "0.000" },
    { header: "Inflow burette level (mm)", value: (r) => r.inflowLevelMm },
    { header: "Outflow burette level (mm)", value: (r) => r.outflowLevelMm },
    { header: "Inflow volume, cumulative (mL)", value: (r) => r.inflowCumulativeMl, numFmt: "0.0000" },
    { header: "Outflow volume, cumulative (mL)", value: (r) => r.outflowCumulativeMl, numFmt: "0.0000" },
    { header: "Line-pressure difference (kPa)", value: (r) => kPa(r.headPa), numFmt: "0.000" },
    { header: "Influent pressure (kPa)", value: (r) => kPa(r.influentPressurePa) },
    { header: "Effluent pressure (kPa)", value: (r) => kPa(r.effluentPressurePa) },
    { header: "Cell pressure (kPa)", value: (r) => kPa(r.cellPressurePa) },
    { header: "Temperature (°C)", value: (r) => r.temperatureC },
    { header: "Influent EC (mS/m)", value: (r) => r.influentEcMsPerM },
    { header: "Effluent EC (mS/m)", value: (r) => r.effluentEcMsPerM },
    { header: "Influent pH (–)", value: (r) => r.influentPh },
    { header: "Effluent pH (–)", value: (r) => r.effluentPh },
    { header: "After a refill", value: (r) => (r.afterRefill ? "yes" : "no") },
    { header: "In force", value: (r) => (r.correctedBy ? "no, corrected" : "yes") },
    { header: "Correction reason", value: (r) => r.correctionReason, width: 30 },
    { header: "Source", value: (r) => r.source, width: 24 },
    { header: "Recorded by", value: (r) => r.recordedBy.name, width: 20 },
  ], readings);

  const intervals = verdict.evaluation?.intervals ?? [];
  type I = (typeof intervals)[number];
  addSheet<I>(workbook, "Intervals", [
    { header: "From (h)", value: (i) => i.fromS / 3600, numFmt: "0.000" },
    { header: "To (h)", value: (i) => i.toS / 3600, numFmt: "0.000" },
    { header: "Inflow volume (mL)", value: (i) => i.inflowVolumeMl, numFmt: "0.0000" },
    { header: "Outflow volume (mL)", value: (i) => i.outflowVolumeMl, numFmt: "0.0000" },
    { header: "Inflow flux (m³/m²/s)", value: (i) => i.inflowFlux, numFmt: SCIENTIFIC_FORMAT },
    { header: "Outflow flux (m³/m²/s)", value: (i) => i.outflowFlux, numFmt: SCIENTIFIC_FORMAT },
    { header: "Flux (m³/m²/s)", value: (i) => i.flux, numFmt: SCIENTIFIC_FORMAT },
    { header: "Outflow/inflow (–)", value: (i) => (Number.isFinite(i.ratio) ? i.ratio : null), numFmt: "0.000" },
    { header: "Head (m of water)", value: (i) => i.headM, numFmt: "0.000" },
    { header: "Gradient (–)", value: (i) => i.gradient, numFmt: "0.0" },
    { header: "k at test temperature (m/s)", value: (i) => i.k, numFmt: SCIENTIFIC_FORMAT },
    { header: "k20 (m/s)", value: (i) => i.k20, numFmt: SCIENTIFIC_FORMAT },
  ], intervals);

  const criteria = verdict.evaluation?.termination.criteria ?? [];
  addSheet<(typeof criteria)[number]>(workbook, "Criteria", [
    { header: "Criterion", value: (c) => c.name, width: 36 },
    { header: "Met", value: (c) => (c.met ? "yes" : "no") },
    { header: "Value", value: (c) => (c.value !== null && Number.isFinite(c.value) ? c.value : null) },
    { header: "Limit", value: (c) => c.limit, width: 24 },
    { header: "Says", value: (c) => c.message, width: 60 },
  ], criteria);
  return { fileName: `${run.labNumber}-readings.xlsx`, buffer: await workbookBuffer(workbook) };
}

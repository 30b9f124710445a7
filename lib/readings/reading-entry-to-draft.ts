/** A grid row, parsed by readingEntrySchema, as a ReadingDraft: pressures from the person's unit to Pa. Pure. */
import { enteredPressureToPa, type PressureUnit } from "@/lib/units/pressure-entry";
import type { ReadingEntry } from "@/lib/validation/readings";
import type { ReadingDraft } from "./reading-draft";

export function readingEntryToDraft(entry: ReadingEntry, unit: PressureUnit): ReadingDraft {
  const toPa = (v: number) => enteredPressureToPa(v, unit);
  return {
    takenAt: entry.takenAt,
    inflowLevelMm: entry.inflowLevelMm,
    outflowLevelMm: entry.outflowLevelMm,
    influentPressurePa: toPa(entry.influentPressure),
    effluentPressurePa: toPa(entry.effluentPressure),
    cellPressurePa: entry.cellPressure === undefined ? null : toPa(entry.cellPressure),
    temperatureC: entry.temperatureC,
    influentEcMsPerM: entry.influentEcMsPerM ?? null,
    effluentEcMsPerM: entry.effluentEcMsPerM ?? null,
    influentPh: entry.influentPh ?? null,
    effluentPh: entry.effluentPh ?? null,
    afterRefill: entry.afterRefill,
  };
}

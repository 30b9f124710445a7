/**
 * Checks across readings that no single cell can show: time order (also against the run's saved
 * readings), burette levels moving the wrong way (a negative volume) unless the reading is marked as
 * taken right after a refill or drain, a refill that lowered the inflow burette or a drain that raised
 * the outflow one, temperatures a water permeation test cannot have, and a head that is not positive.
 * Pure; one message per problem, each naming the row (by the caller's label) and the field.
 */
import { formatPressure, type PressureUnit } from "@/lib/units/pressure-entry";
import { LEVEL_TOLERANCE_MM, TEMPERATURE_RANGE_C } from "./reading-draft";

export type SequenceRow = { label: string; elapsedS: number; inflowLevelMm: number; outflowLevelMm: number; headPa: number; temperatureC: number; afterRefill?: boolean };
export type NeighbourReading = { label: string; elapsedS: number; inflowLevelMm: number | null; outflowLevelMm: number | null; afterRefill?: boolean };
export type SequenceField = "time" | "inflowLevelMm" | "outflowLevelMm" | "head" | "temperatureC";
/** `index` is the position in `rows`; for a problem with `next`, it is the last row's index. */
export type SequenceProblem = { index: number; field: SequenceField; message: string };

const hours = (s: number) => `${+(s / 3600).toFixed(2)} h`;
const mm = (v: number) => `${+v.toFixed(2)} mm`;

/**
 * `rows` in the order entered; `previous` is the run's latest saved reading before them (or null),
 * `next` the saved reading after them (when a correction is slotted between two readings).
 * `levelToleranceMm` lets reading noise pass (default LEVEL_TOLERANCE_MM).
 */
export function checkReadingSequence(input: {
  rows: readonly SequenceRow[];
  previous?: NeighbourReading | null;
  next?: NeighbourReading | null;
  levelToleranceMm?: number;
  pressureUnit?: PressureUnit;
}): SequenceProblem[] {
  const tolerance = input.levelToleranceMm ?? LEVEL_TOLERANCE_MM;
  const problems: SequenceProblem[] = [];
  const headText = (pa: number) => formatPressure(pa, input.pressureUnit ?? "KPA", { decimals: input.pressureUnit === "PSI" ? 2 : 1 });

  const compare = (index: number, before: NeighbourReading, after: NeighbourReading, afterIsRow: boolean) => {
    const subject = afterIsRow ? after.label : `${after.label} (saved)`;
    if (!(after.elapsedS > before.elapsedS))
      problems.push({ index, field: "time", message: `${subject}, time: ${hours(after.elapsedS)} after permeation began is not later than ${before.label} (${hours(before.elapsedS)}); readings must be in time order.` });
    if (after.afterRefill) return compareRefill(index, before, after, subject);
    if (before.inflowLevelMm !== null && after.inflowLevelMm !== null && after.inflowLevelMm - before.inflowLevelMm > tolerance)
      problems.push({
        index, field: "inflowLevelMm",
        message: `${subject}, inflow burette level: it rose from ${mm(before.inflowLevelMm)} (${before.label}) to ${mm(after.inflowLevelMm)}. Inflow is the fall of the inflow burette, so this would be a negative inflow volume. If the burette was refilled, mark this reading "after refill" (the reading before it is the one just before the refill).`,
      });
    if (before.outflowLevelMm !== null && after.outflowLevelMm !== null && before.outflowLevelMm - after.outflowLevelMm > tolerance)
      problems.push({
        index, field: "outflowLevelMm",
        message: `${subject}, outflow burette level: it fell from ${mm(before.outflowLevelMm)} (${before.label}) to ${mm(after.outflowLevelMm)}. Outflow is the rise of the outflow burette, so this would be a negative outflow volume. If the burette was drained, mark this reading "after refill" (the reading before it is the one just before the drain).`,
      });
  };

  // Just after a refill the inflow burette can only have been filled and the outflow one only emptied.
  const compareRefill = (index: number, before: NeighbourReading, after: NeighbourReading, subject: string) => {
    if (before.inflowLevelMm !== null && after.inflowLevelMm !== null && before.inflowLevelMm - after.inflowLevelMm > tolerance)
      problems.push({ index, field: "inflowLevelMm", message: `${subject}, inflow burette level after the refill: ${mm(after.inflowLevelMm)} is below the ${mm(before.inflowLevelMm)} just before it (${before.label}); a refill raises the inflow burette. Check the two levels.` });
    if (before.outflowLevelMm !== null && after.outflowLevelMm !== null && after.outflowLevelMm - before.outflowLevelMm > tolerance)
      problems.push({ index, field: "outflowLevelMm", message: `${subject}, outflow burette level after the drain: ${mm(after.outflowLevelMm)} is above the ${mm(before.outflowLevelMm)} just before it (${before.label}); a drain lowers the outflow burette. Check the two levels.` });
  };

  input.rows.forEach((row, index) => {
    if (row.elapsedS < 0) problems.push({ index, field: "time", message: `${row.label}, time: it is ${hours(-row.elapsedS)} before permeation began; readings start when permeation does.` });
    const before = index === 0 ? input.previous : input.rows[index - 1];
    if (before) compare(index, before, row, true);
    else if (row.afterRefill) problems.push({ index, field: "time", message: `${row.label}: it is marked "after refill", but no reading comes before it; record the levels just before the refill first.` });
    if (!(row.temperatureC >= TEMPERATURE_RANGE_C.min && row.temperatureC <= TEMPERATURE_RANGE_C.max))
      problems.push({ index, field: "temperatureC", message: `${row.label}, temperature: ${row.temperatureC} °C is outside ${TEMPERATURE_RANGE_C.min}–${TEMPERATURE_RANGE_C.max} °C, which a water permeation test cannot have; check the thermometer reading or the column mapped to temperature.` });
    if (!(row.headPa > 0))
      problems.push({ index, field: "head", message: `${row.label}, pressures: the influent pressure must be above the effluent pressure so that water is driven through the specimen; the head is ${headText(row.headPa)}.` });
  });
  const last = input.rows[input.rows.length - 1];
  if (last && input.next) compare(input.rows.length - 1, last, input.next, false);
  return problems;
}

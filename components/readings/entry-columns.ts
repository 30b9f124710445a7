/** The cells of one reading as typed into the grid or the correction form, in keyboard order. */
import { PRESSURE_UNIT_SYMBOLS, type PressureUnit } from "@/lib/units/pressure-entry";

export type EntryKey =
  | "takenAt" | "inflowLevelMm" | "outflowLevelMm" | "influentPressure" | "effluentPressure" | "cellPressure" | "temperatureC"
  | "influentEcMsPerM" | "effluentEcMsPerM" | "influentPh" | "effluentPh" | "afterRefill";

export type EntryColumn = { key: EntryKey; title: string; kind: "time" | "number" | "check" };

/** The text values of a grid row, and the refill mark as a checkbox's boolean. */
export type EntryRow = Record<Exclude<EntryKey, "afterRefill">, string> & { afterRefill: boolean };

export function entryColumns(unit: PressureUnit, withChemistry: boolean): EntryColumn[] {
  const p = PRESSURE_UNIT_SYMBOLS[unit];
  const columns: EntryColumn[] = [
    { key: "takenAt", title: "Time", kind: "time" },
    { key: "inflowLevelMm", title: "Inflow level (mm)", kind: "number" },
    { key: "outflowLevelMm", title: "Outflow level (mm)", kind: "number" },
    { key: "influentPressure", title: `Influent (${p})`, kind: "number" },
    { key: "effluentPressure", title: `Effluent (${p})`, kind: "number" },
    { key: "cellPressure", title: `Cell (${p})`, kind: "number" },
    { key: "temperatureC", title: "Temp. (°C)", kind: "number" },
  ];
  if (withChemistry)
    columns.push(
      { key: "influentEcMsPerM", title: "EC in (mS/m)", kind: "number" },
      { key: "effluentEcMsPerM", title: "EC out (mS/m)", kind: "number" },
      { key: "influentPh", title: "pH in", kind: "number" },
      { key: "effluentPh", title: "pH out", kind: "number" },
    );
  // Last, so that Enter runs through the numbers first; ticked on the reading taken just after a refill or drain.
  columns.push({ key: "afterRefill", title: "After refill", kind: "check" });
  return columns;
}

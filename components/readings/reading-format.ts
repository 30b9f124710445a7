/** Display of reading values in the readings panel (pure; shared by its server and client parts). */
import { formatPressureNumber, paToEnteredPressure, type PressureUnit } from "@/lib/units/pressure-entry";

export const fixed = (value: number | null | undefined, decimals: number): string => (value === null || value === undefined ? "—" : value.toFixed(decimals));

/** Hours since permeation began, to a hundredth. */
export const elapsedHours = (s: number): string => (s / 3600).toFixed(2);

/** A pressure in the person's unit to a tenth of a kPa or a hundredth of a psi, finer than the stage tables need. */
export const pressureCell = (pa: number | null | undefined, unit: PressureUnit): string =>
  pa === null || pa === undefined ? "—" : formatPressureNumber(pa, unit, { decimals: unit === "PSI" ? 2 : 1 });

/** A pressure as the value of an input, with enough digits that sending it back changes nothing. */
export const pressureInput = (pa: number | null | undefined, unit: PressureUnit): string =>
  pa === null || pa === undefined ? "" : String(+paToEnteredPressure(pa, unit).toFixed(6));

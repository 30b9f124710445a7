/**
 * A pressure stored in pascals, shown in the unit a person chose (kPa or psi). Kept for existing imports;
 * the one implementation, with the exact psi factor from lib/hydraulics, is lib/units/pressure-entry.ts.
 */
export { formatPressure } from "../units/pressure-entry";

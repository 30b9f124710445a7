/**
 * ASTM D5084 hydraulic conductivity: steadiness judged on k at 20 °C with the k band; the pressures follow
 * the effective stress and gradient a project asks for, so none is prescribed by default.
 */
import { hydraulicMethodSettings } from "../hydraulic/hydraulic-method";

const NOT_PRESCRIBED = { source: "standard" as const, note: "ASTM D5084 takes the effective stress and gradient the project asks for; blank: only the cell-above-influent minimum is checked." };
export const D5084_SETTINGS = hydraulicMethodSettings(
  "D5084",
  { trendQuantity: "k20", permeationCellKPa: null, permeationInfluentKPa: null, permeationEffluentKPa: null },
  { permeationCellKPa: NOT_PRESCRIBED, permeationInfluentKPa: NOT_PRESCRIBED, permeationEffluentKPa: NOT_PRESCRIBED, trendQuantity: { source: "common practice", note: "k at 20 °C, so that temperature drift does not look like a trend." } },
);

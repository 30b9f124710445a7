/**
 * The lab-adjustable settings every hydraulic method (ASTM D5887, D6766, D5084) shares: termination
 * criteria, stage pressures, the apparatus leakage limit, the specimen's specific gravity, and standard
 * uncertainties for what no instrument covers. Stored in the units shown (kPa, %, hours); the mappers in
 * ./hydraulic-settings-use.ts turn them into what lib/hydraulics and the pressure checks take. Pure.
 */
import { z } from "zod";
import { measured, optionalMeasured } from "../../validation/common";
import type { SettingField, SettingSource } from "../settings-definition";

const nullable = (schema: ReturnType<typeof optionalMeasured>) => schema.transform((v) => (v === undefined ? null : v));

export const hydraulicSettingsSchema = z
  .object({
    consecutiveIntervals: measured("the number of consecutive intervals", { min: 3, max: 50 }).refine(Number.isInteger, "The number of consecutive intervals must be a whole number."),
    ratioMin: measured("the lower end of the outflow/inflow band", { positive: true, max: 10 }),
    ratioMax: measured("the upper end of the outflow/inflow band", { positive: true, max: 10 }),
    trendQuantity: z.enum(["flux", "k20"], { message: "Choose flux or k20 for the trend test." }),
    trendAlpha: measured("the trend significance level").refine((v) => v > 0 && v < 1, "The trend significance level must be between 0 and 1 (exclusive), e.g. 0.05."),
    trendMinChangePct: measured("the smallest fitted change that counts as a trend (%)", { min: 0, max: 100 }),
    kBandPct: measured("the k band (%)", { min: 0, max: 100 }),
    kBandBelowThresholdPct: measured("the k band below the threshold (%)", { min: 0, max: 100 }),
    kBandThresholdMPerS: measured("the k threshold (m/s)", { positive: true, max: 1 }),
    ecTolerancePct: measured("the EC tolerance (%)", { min: 0, max: 100 }),
    phToleranceUnits: measured("the pH tolerance (pH units)", { min: 0, max: 14 }),
    minPoreVolumes: measured("the minimum pore volumes of flow", { min: 0, max: 1000 }),
    confiningMarginKPa: measured("the confining margin (kPa)", { min: 0, max: 1000 }),
    minEquilibrationHours: measured("the minimum equilibration (h)", { min: 0, max: 1000 }),
    permeationCellKPa: nullable(optionalMeasured("the prescribed cell pressure in permeation (kPa)", { positive: true, max: 5000 })),
    permeationInfluentKPa: nullable(optionalMeasured("the prescribed influent pressure in permeation (kPa)", { positive: true, max: 5000 })),
    permeationEffluentKPa: nullable(optionalMeasured("the prescribed effluent pressure in permeation (kPa)", { positive: true, max: 5000 })),
    permeationToleranceKPa: measured("the tolerance on the permeation pressures (kPa)", { min: 0, max: 500 }),
    minCellAboveInfluentKPa: measured("the minimum cell pressure above the influent line (kPa)", { min: 0, max: 1000 }),
    maxLeakagePct: measured("the largest apparatus leakage (% of the measured flow)", { min: 0, max: 100 }),
    specificGravity: measured("the specific gravity of the bentonite solids", { min: 1, max: 5 }),
    uDieDiameterMm: nullable(optionalMeasured("the standard uncertainty of the die diameter (mm)", { min: 0, max: 10 })),
    uThicknessMm: nullable(optionalMeasured("the standard uncertainty of the post-test thickness (mm)", { min: 0, max: 10 })),
    uTimeS: nullable(optionalMeasured("the standard uncertainty of one time stamp (s)", { min: 0, max: 3600 })),
  })
  .superRefine((v, ctx) => {
    if (typeof v.ratioMin === "number" && typeof v.ratioMax === "number" && !(v.ratioMin < v.ratioMax))
      ctx.addIssue({ code: "custom", path: ["ratioMax"], message: `The outflow/inflow band is empty: its upper end (${v.ratioMax}) must be above its lower end (${v.ratioMin}).` });
    const p = [v.permeationCellKPa, v.permeationInfluentKPa, v.permeationEffluentKPa];
    const given = p.filter((x) => x !== null && x !== undefined).length;
    if (given > 0 && given < 3)
      ctx.addIssue({ code: "custom", path: ["permeationCellKPa"], message: "Give all three permeation pressures (cell, influent, effluent), or none when the method does not prescribe them." });
    if (given === 3) {
      const [cell, inf, eff] = p as [number, number, number];
      if (!(inf > eff)) ctx.addIssue({ code: "custom", path: ["permeationEffluentKPa"], message: "The prescribed effluent pressure must be below the influent pressure, or no water flows." });
      if (!(cell > inf)) ctx.addIssue({ code: "custom", path: ["permeationCellKPa"], message: "The prescribed cell pressure must be above the influent pressure, or the membrane can burst." });
    }
  });

export type HydraulicSettings = z.output<typeof hydraulicSettingsSchema>;

type Sources = Partial<Record<keyof HydraulicSettings, { source: SettingSource; note: string }>>;

const G = { termination: "Termination criteria", pressures: "Stage pressures", apparatus: "Apparatus and specimen", uncertainty: "Standard uncertainties where no instrument applies" };

/** The field list every hydraulic method shows; a method passes its own sources where they differ. */
export function hydraulicSettingFields(overrides: Sources = {}): SettingField[] {
  const f = (key: keyof HydraulicSettings, label: string, unit: string, group: string, source: SettingSource, note: string, extra: Partial<SettingField> = {}): SettingField => ({
    key, label, unit, group, ...(overrides[key] ?? { source, note }), ...extra,
  });
  return [
    f("consecutiveIntervals", "Consecutive intervals judged", "intervals", G.termination, "from memory", "ASTM D5084 judges steadiness on at least four consecutive values."),
    f("ratioMin", "Outflow/inflow ratio, lower end", "", G.termination, "standard", "ASTM D5084 and common practice: 0.75 to 1.25."),
    f("ratioMax", "Outflow/inflow ratio, upper end", "", G.termination, "standard", "ASTM D5084 and common practice: 0.75 to 1.25."),
    f("trendQuantity", "Quantity the trend test looks at", "", G.termination, "common practice", "Index flux for D5887 and D6766; k at 20 °C for D5084.", { choices: [{ value: "flux", label: "flux" }, { value: "k20", label: "k at 20 °C" }] }),
    f("trendAlpha", "Trend significance level (two-sided)", "", G.termination, "common practice", "A least-squares slope with p below this is statistically significant (0.05 is the usual statistical level)."),
    f("trendMinChangePct", "Smallest fitted change that counts as a trend", "% of the mean", G.termination, "from memory", "Smooth logger data make any slope significant; a trend counts only when the fitted change across the window is at least this too. 0 leaves the slope test alone."),
    f("kBandPct", "Consecutive k within ± of their mean", "%", G.termination, "from memory", "ASTM D5084: ±25 % when k ≥ the threshold below."),
    f("kBandBelowThresholdPct", "… below the threshold", "%", G.termination, "from memory", "ASTM D5084: ±50 % when k is below the threshold."),
    f("kBandThresholdMPerS", "k threshold for the wider band", "m/s", G.termination, "from memory", "ASTM D5084: 1e-10 m/s."),
    f("ecTolerancePct", "Effluent EC within ± of the influent's", "%", G.termination, "from memory", "ASTM D6766 chemical equilibrium: about 10 %."),
    f("phToleranceUnits", "Effluent pH within ± of the influent's", "pH units", G.termination, "from memory", "Low confidence: check against the lab's copy of ASTM D6766."),
    f("minPoreVolumes", "Minimum pore volumes of flow", "", G.termination, "from memory", "ASTM D6766: at least about two pore volumes."),
    f("confiningMarginKPa", "Confining margin in saturation and back-pressure", "kPa", G.pressures, "common practice", "The cell about 35 kPa (5 psi) above both lines, or the membrane can burst."),
    f("minEquilibrationHours", "Minimum equilibration before permeation", "h", G.pressures, "common practice", "A hold of about two days for equilibrium is common."),
    f("permeationCellKPa", "Prescribed cell pressure in permeation", "kPa", G.pressures, "common practice", "ASTM D5887 index flux: about 550 kPa (80 psi).", { optional: true }),
    f("permeationInfluentKPa", "Prescribed influent pressure in permeation", "kPa", G.pressures, "common practice", "ASTM D5887 index flux: about 530 kPa (77 psi).", { optional: true }),
    f("permeationEffluentKPa", "Prescribed effluent pressure in permeation", "kPa", G.pressures, "common practice", "ASTM D5887 index flux: about 515 kPa (75 psi).", { optional: true }),
    f("permeationToleranceKPa", "Tolerance on the permeation pressures", "± kPa", G.pressures, "from memory", "A pressure further than this from the prescribed one is a departure from the method."),
    f("minCellAboveInfluentKPa", "Cell above the influent line in permeation, at least", "kPa", G.pressures, "from memory", "In D5887 permeation the cell is only about 20 kPa above the influent line; that is the method. Below this minimum it is a departure."),
    f("maxLeakagePct", "Largest apparatus leakage", "% of the measured flow", G.apparatus, "standard", "ASTM D5887 (significance section): the apparatus leakage rate must be under 10 % of the measured flux."),
    f("specificGravity", "Specific gravity of the bentonite solids (G_s)", "", G.apparatus, "from memory", "About 2.7 to 2.8 for sodium montmorillonite-rich bentonite; used when the specimen has no value of its own."),
    f("uDieDiameterMm", "Standard uncertainty of the die diameter", "mm", G.uncertainty, "lab's own", "No instrument measures the die on each run: the lab states it (e.g. a tolerance ±a read as a / √3). Blank: no uncertainty is stated.", { optional: true }),
    f("uThicknessMm", "Standard uncertainty of the post-test thickness", "mm", G.uncertainty, "lab's own", "Used when the run records no calibrated thickness gauge. Blank: only a gauge's calibration can give it.", { optional: true }),
    f("uTimeS", "Standard uncertainty of one time stamp", "s", G.uncertainty, "lab's own", "Used when the run records no calibrated timer or logger clock (times typed to the minute: ±30 s, about 17 s). Blank: only a timer's calibration can give it.", { optional: true }),
  ];
}

/** The defaults all three hydraulic methods share (each method overrides what differs). */
export const HYDRAULIC_DEFAULTS: HydraulicSettings = {
  consecutiveIntervals: 4,
  ratioMin: 0.75,
  ratioMax: 1.25,
  trendQuantity: "flux",
  trendAlpha: 0.05,
  trendMinChangePct: 10,
  kBandPct: 25,
  kBandBelowThresholdPct: 50,
  kBandThresholdMPerS: 1e-10,
  ecTolerancePct: 10,
  phToleranceUnits: 0.5,
  minPoreVolumes: 2,
  confiningMarginKPa: 35,
  minEquilibrationHours: 48,
  permeationCellKPa: 550,
  permeationInfluentKPa: 530,
  permeationEffluentKPa: 515,
  permeationToleranceKPa: 10,
  minCellAboveInfluentKPa: 10,
  maxLeakagePct: 10,
  specificGravity: 2.75,
  uDieDiameterMm: null,
  uThicknessMm: null,
  uTimeS: null,
};

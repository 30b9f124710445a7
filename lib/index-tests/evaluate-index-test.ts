/**
 * One index test's observations (already validated) and its method settings turned into the results it
 * gives and a record of how: per-specimen values, departures from the method, the moisture used. The
 * operation that records a test, the review page and the demo seed all call this, so they agree. Pure.
 */
import type { TestProperty } from "../results/property-units";
import { fluidLossD5891 } from "./fluid-loss-d5891";
import type { IndexMethodCode } from "./index-test-methods";
import { massPerAreaD5993, type MassPerAreaSpecimen } from "./mass-per-area-d5993";
import { moistureContentD2216, type MoistureObservations } from "./moisture-content-d2216";
import { peelStrengthD6496, type PeelSpecimen } from "./peel-strength-d6496";
import { swellIndexD5890 } from "./swell-index-d5890";
import { tensileStrengthD6768, type StripSpecimen } from "./tensile-strength-d6768";

export type IndexResult = {
  property: TestProperty;
  value: number;
  /** The unit results are stored in. */
  unit: string;
  standardDeviation: number | null;
  specimenCount: number;
  expandedUncertainty: number | null;
  coverageFactor: number | null;
};

export type IndexEvaluation = {
  results: IndexResult[];
  /** Per specimen, in the stored unit of the main result. */
  specimenValues: number[];
  departures: string[];
  notes: string[];
};

type Settings = Record<string, unknown> & { expandedUncertainty: number | null; coverageFactor: number };

/** What each method's observations hold once the form's schema has parsed them. */
export type IndexObservations =
  | { methodCode: "D5890"; dryClayMassG: number; settledVolumeMl: number; hydrationHours: number; waterTemperatureC: number }
  | { methodCode: "D5891"; clayMassG: number; waterVolumeMl: number; pressureKPa: number; filtrationMinutes: number; filtrateVolumeMl: number }
  | ({ methodCode: "D5993"; specimens: MassPerAreaSpecimen[] } & MoistureObservations)
  | ({ methodCode: "D2216"; dryingHours: number; ovenTemperatureC: number } & MoistureObservations)
  | { methodCode: "D6768"; direction: "MD" | "XD"; specimens: StripSpecimen[] }
  | { methodCode: "D6496"; specimens: PeelSpecimen[] };

const num = (s: Settings, key: string) => s[key] as number;

/** The results and the record of one index test. */
export function evaluateIndexTest(o: IndexObservations, settings: Settings): IndexEvaluation {
  const declared = { expandedUncertainty: settings.expandedUncertainty, coverageFactor: settings.expandedUncertainty === null ? null : settings.coverageFactor };
  const one = (property: TestProperty, value: number, unit: string, count = 1, sd: number | null = null): IndexResult => ({ property, value, unit, standardDeviation: sd, specimenCount: count, ...declared });
  switch (o.methodCode as IndexMethodCode) {
    case "D5890": {
      const x = o as Extract<IndexObservations, { methodCode: "D5890" }>;
      const r = swellIndexD5890(x, { nominalClayMassG: num(settings, "nominalClayMassG"), clayMassToleranceG: num(settings, "clayMassToleranceG"), minHydrationHours: num(settings, "minHydrationHours"), cylinderCapacityMl: num(settings, "cylinderCapacityMl") });
      return { results: [one("SWELL_INDEX", r.swellIndexMlPer2g, "mL/2 g")], specimenValues: [r.swellIndexMlPer2g], departures: r.departures, notes: [`Water at ${x.waterTemperatureC} °C; read after ${x.hydrationHours} h.`] };
    }
    case "D5891": {
      const x = o as Extract<IndexObservations, { methodCode: "D5891" }>;
      const r = fluidLossD5891(x, { pressureKPa: num(settings, "pressureKPa"), pressureToleranceKPa: num(settings, "pressureToleranceKPa"), filtrationMinutes: num(settings, "filtrationMinutes") });
      return { results: [one("FLUID_LOSS", r.fluidLossMl, "mL")], specimenValues: [r.fluidLossMl], departures: r.departures, notes: [`Slurry of ${r.slurrySolidsPct.toFixed(2)} % solids.`] };
    }
    case "D5993": {
      const x = o as Extract<IndexObservations, { methodCode: "D5993" }>;
      const r = massPerAreaD5993(x.specimens, x);
      const n = x.specimens.length;
      // The declared uncertainty is the lab's for the clay result (the one specifications limit).
      return {
        results: [
          one("BENTONITE_MASS_PER_AREA", r.clayDry.mean, "kg/m2", n, r.clayDry.standardDeviation),
          { ...one("GCL_MASS_PER_AREA", r.gcl.mean, "kg/m2", n, r.gcl.standardDeviation), expandedUncertainty: null, coverageFactor: null },
        ],
        specimenValues: r.specimens.map((s) => s.clayDryKgPerM2),
        departures: [],
        notes: [`Clay moisture ${r.moisture.moisturePct.toFixed(1)} % (oven drying); GCL as weighed ${r.specimens.map((s) => s.gclKgPerM2.toFixed(3)).join(", ")} kg/m².`],
      };
    }
    case "D2216": {
      const x = o as Extract<IndexObservations, { methodCode: "D2216" }>;
      const r = moistureContentD2216(x);
      const departures = x.dryingHours < num(settings, "minDryingHours") ? [`Dried for ${x.dryingHours} h, less than the ${num(settings, "minDryingHours")} h the lab asks.`] : [];
      return { results: [one("MOISTURE_CONTENT", r.moisturePct, "%")], specimenValues: [r.moisturePct], departures, notes: [`Water ${r.waterMassG.toFixed(2)} g over dry solids ${r.drySolidsMassG.toFixed(2)} g; oven at ${x.ovenTemperatureC} °C.`] };
    }
    case "D6768": {
      const x = o as Extract<IndexObservations, { methodCode: "D6768" }>;
      const r = tensileStrengthD6768(x.specimens);
      return { results: [one("TENSILE_STRENGTH", r.mean, "kN/m", r.count, r.standardDeviation)], specimenValues: r.specimensKnPerM, departures: [], notes: [`Direction ${x.direction === "MD" ? "machine" : "cross-machine"}.`] };
    }
    case "D6496": {
      const x = o as Extract<IndexObservations, { methodCode: "D6496" }>;
      const r = peelStrengthD6496(x.specimens);
      return { results: [one("PEEL_STRENGTH", r.mean, "N/m", r.count, r.standardDeviation)], specimenValues: r.specimensNPerM, departures: [], notes: [] };
    }
  }
}

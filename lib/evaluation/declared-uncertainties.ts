/**
 * The standard uncertainties (k = 1) a run's result is propagated from, taken from the lab's records: each
 * instrument the run used states its own in its calibration (burette panel, pressure transducer, thermometer,
 * thickness gauge, timer); the method settings give the lab's values for what no instrument covers (the die
 * diameter; the thickness or time stamps when no gauge or timer was recorded). Pure.
 */
import type { DeclaredUncertainties } from "../hydraulics/types";
import { readCalibrationValues, UNCERTAINTY_BY_KIND, type UncertaintyQuantity } from "../equipment/calibration-values";
import type { HydraulicSettings } from "../methods/hydraulic/hydraulic-settings";

export type RunInstrument = { role: string; assetTag: string; kind: string; calibrationReference: string | null; values: unknown };

export type UncertaintyQuantityKey = keyof DeclaredUncertainties;

/** Where each standard uncertainty came from, for the budget a reviewer and the certificate read. */
export type UncertaintySource = { quantity: UncertaintyQuantityKey; label: string; standardUncertainty: number; unit: string; source: string };

export const QUANTITY_LABELS: Record<UncertaintyQuantityKey, { label: string; unit: string }> = {
  diameterMm: { label: "die diameter", unit: "mm" },
  thicknessMm: { label: "post-test bentonite thickness", unit: "mm" },
  volumeMl: { label: "burette readings", unit: "mL" },
  timeS: { label: "time stamps", unit: "s" },
  pressureKPa: { label: "differential pressure", unit: "kPa" },
  temperatureC: { label: "permeant temperature", unit: "°C" },
};

export type DeclaredFromRecords =
  | { ok: true; declared: DeclaredUncertainties; sources: UncertaintySource[] }
  | { ok: false; missing: string[] };

export function declareUncertainties(instruments: readonly RunInstrument[], settings: Pick<HydraulicSettings, "uDieDiameterMm" | "uThicknessMm" | "uTimeS">, settingsLabel: string): DeclaredFromRecords {
  const found = new Map<UncertaintyQuantity, UncertaintySource>();
  for (const i of instruments) {
    const measures = UNCERTAINTY_BY_KIND[i.kind];
    const u = readCalibrationValues(i.values).standardUncertainty;
    // A run's budget takes the hydraulic quantities; masses and forces belong to index tests.
    if (!measures || !(measures.quantity in QUANTITY_LABELS) || u === undefined) continue;
    const quantity = measures.quantity as UncertaintyQuantity;
    if (found.has(quantity)) continue;
    found.set(quantity, { quantity, label: QUANTITY_LABELS[quantity].label, standardUncertainty: u, unit: measures.unit, source: `${i.assetTag} calibration${i.calibrationReference ? ` ${i.calibrationReference}` : ""}` });
  }
  const labDefault = (quantity: UncertaintyQuantityKey, value: number | null) => {
    if (found.has(quantity as UncertaintyQuantity) || value === null) return;
    found.set(quantity as UncertaintyQuantity, { quantity, label: QUANTITY_LABELS[quantity].label, standardUncertainty: value, unit: QUANTITY_LABELS[quantity].unit, source: `lab value, ${settingsLabel}` });
  };
  labDefault("diameterMm", settings.uDieDiameterMm);
  labDefault("thicknessMm", settings.uThicknessMm);
  labDefault("timeS", settings.uTimeS);

  const order: UncertaintyQuantityKey[] = ["diameterMm", "thicknessMm", "volumeMl", "timeS", "pressureKPa", "temperatureC"];
  const missing = order.filter((q) => !found.has(q as UncertaintyQuantity)).map((q) => MISSING[q]);
  if (missing.length) return { ok: false, missing };
  const sources = order.map((q) => found.get(q as UncertaintyQuantity)!);
  const declared = Object.fromEntries(sources.map((s) => [s.quantity, s.standardUncertainty])) as unknown as DeclaredUncertainties;
  return { ok: true, declared, sources };
}

const MISSING: Record<UncertaintyQuantityKey, string> = {
  diameterMm: "the die diameter (set it in the method settings)",
  thicknessMm: "the post-test thickness (a thickness gauge's calibration, or the method settings)",
  volumeMl: "the burette readings (the burette panel's calibration)",
  timeS: "the time stamps (a timer's calibration, or the method settings)",
  pressureKPa: "the differential pressure (the pressure transducer's calibration)",
  temperatureC: "the permeant temperature (a thermometer's calibration)",
};

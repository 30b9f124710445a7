import { describe, expect, it } from "vitest";
import { evaluateRun } from "@/lib/hydraulics";
import { assessLeakage } from "@/lib/evaluation/leakage-assessment";
import { evaluateRunContext, type RunEvaluationContext, type StoredReading } from "@/lib/evaluation/run-evaluation-context";
import { METHOD_SETTINGS } from "@/lib/methods/registry";
import type { HydraulicSettings } from "@/lib/methods/hydraulic/hydraulic-settings";
import { resultRecord } from "@/lib/results/result-record";
import { resultsOfVerdict } from "@/lib/results/results-of-verdict";

// A run's records as lib/server/runs/evaluate-run-records.ts loads them (invented): scale readings of a
// burette panel whose outflow zero is 40 mm above the common datum, one refill, instruments with their
// calibrated standard uncertainties.
const AREAS = { inflow: 31.4, outflow: 31.2 };
const scale = [[450, 20], [437.2, 32.8], [424.9, 45.1], [412.8, 57.0], [480, 10, true], [468.0, 21.8], [456.1, 33.5], [444.3, 45.1]] as const;
const stored = (i: number): StoredReading => {
  const [inflow, outflow, afterRefill] = scale[i]!;
  const at = i < 4 ? i * 21_600 : 3 * 21_600 + 300 + (i - 4) * 21_600;
  return {
    elapsedS: at, inflowLevelMm: inflow, outflowLevelMm: outflow, afterRefill: afterRefill ?? false, headPa: 14_000, temperatureC: 20,
    // What was stored at entry is not used when the levels are there: give nonsense to prove it.
    inflowCumulativeMl: 999, outflowCumulativeMl: -999,
    influentEcMsPerM: null, effluentEcMsPerM: null, influentPh: null, effluentPh: null,
  };
};
const settings = (over: Partial<HydraulicSettings> = {}) => ({
  versionId: "v2", methodCode: "D5887", version: 2, label: "ASTM D5887 settings, version 2", chosen: null,
  values: { ...(METHOD_SETTINGS.D5887!.defaults as HydraulicSettings), uDieDiameterMm: 0.06, ...over },
});
const instrument = (kind: string, assetTag: string, u: number) => ({ role: kind.toLowerCase(), assetTag, kind, calibrationReference: `CAL-${assetTag}`, values: { standardUncertainty: u } });
const context = (over: Partial<RunEvaluationContext> = {}): RunEvaluationContext => ({
  methodCode: "D5887",
  specimen: { dieDiameterMm: 100, initialThicknessMm: 6.8, moistureContentPct: 12, bentoniteDryMassG: null, bentoniteMassPerAreaKgPerM2: null, specificGravity: null },
  postTestThicknessMm: 5.9,
  readings: scale.map((_, i) => stored(i)),
  burettePanel: { inflowAreaMm2: AREAS.inflow, outflowAreaMm2: AREAS.outflow, inflowZeroAboveDatumMm: 0, outflowZeroAboveDatumMm: 40, scaleRangeMm: { min: 0, max: 500 } },
  settings: settings(),
  instruments: [instrument("BURETTE_PANEL", "BP-7", 0.03), instrument("PRESSURE_TRANSDUCER", "PT-7", 0.1), instrument("THERMOMETER", "TH-7", 0.1), instrument("THICKNESS_GAUGE", "TG-7", 0.05), instrument("TIMER", "CLK-7", 0.6)],
  cellLeakage: { cell: "CELL-7", check: { checkedAt: "2026-11-01T00:00:00.000Z", method: "dummy specimen, 24 h", rateM3PerS: 1e-13 } },
  ...over,
});

describe("the evaluation input built from a run's records", () => {
  it("adds each burette's zero height to its scale reading, recomputes the volumes from the levels across the refill, and gives what evaluateRun gives on the same numbers by hand", () => {
    const verdict = evaluateRunContext(context());
    expect(verdict.calculation.key).toBe("falling-head-rising-tail");
    expect(verdict.calculation.text).toMatch(/zeros 0 mm and 40 mm above it/);
    expect(verdict.refillsAtS).toEqual([3 * 21_600 + 300]);
    // By hand: levels above the datum = scale + zero; inflow = fall × 31.4 / 1000, outflow = rise × 31.2 / 1000, nothing across the refill.
    let vin = 0;
    let vout = 0;
    const byHand = scale.map(([inflow, outflow, refill], i) => {
      if (i > 0 && !refill) {
        vin += ((scale[i - 1]![0] - inflow) * 31.4) / 1000;
        vout += ((outflow - scale[i - 1]![1]) * 31.2) / 1000;
      }
      return { elapsedS: stored(i).elapsedS, inflowMl: vin, outflowMl: vout, headKPa: 14, temperatureC: 20, inflowLevelMm: inflow, outflowLevelMm: outflow + 40, ...(refill && { afterRefill: true as const }) };
    });
    const expected = evaluateRun({ method: "D5887", specimen: { diameterMm: 100, thicknessMm: 5.9 }, readings: byHand, burettes: { inflowAreaMm2: 31.4, outflowAreaMm2: 31.2 } }, { termination: { trendMinRelativeChange: 0.1 } });
    expect(verdict.inputReadings.map((r) => [r.inflowMl, r.outflowMl, r.inflowLevelMm, r.outflowLevelMm])).toEqual(byHand.map((r) => [expect.closeTo(r.inflowMl, 12), expect.closeTo(r.outflowMl, 12), r.inflowLevelMm, r.outflowLevelMm]));
    expect(verdict.evaluation!.intervals.map((iv) => iv.k)).toEqual(expected.intervals.map((iv) => expect.closeTo(iv.k, 24)));
    expect(verdict.thicknessBasis).toBe("post-test");
  });

  it("without burette levels (a file of volumes only) stays constant head, on the stored volumes", () => {
    const volumesOnly = scale.slice(0, 4).map((_, i) => ({ ...stored(i), inflowLevelMm: null, outflowLevelMm: null, inflowCumulativeMl: i * 0.4, outflowCumulativeMl: i * 0.39 }));
    const verdict = evaluateRunContext(context({ readings: volumesOnly }));
    expect(verdict.calculation.key).toBe("constant-head");
    expect(verdict.inputReadings[3]).toMatchObject({ inflowMl: expect.closeTo(1.2, 12), outflowMl: expect.closeTo(1.17, 12) });
    expect(verdict.inputReadings[3]).not.toHaveProperty("inflowLevelMm");
  });

  it("takes each standard uncertainty from the calibration of the instrument the run used, the die diameter from the method settings", () => {
    const verdict = evaluateRunContext(context());
    expect(verdict.uncertaintySources).toEqual({
      ok: true,
      declared: { diameterMm: 0.06, thicknessMm: 0.05, volumeMl: 0.03, timeS: 0.6, pressureKPa: 0.1, temperatureC: 0.1 },
      sources: expect.arrayContaining([
        expect.objectContaining({ quantity: "volumeMl", source: "BP-7 calibration CAL-BP-7" }),
        expect.objectContaining({ quantity: "diameterMm", source: "lab value, ASTM D5887 settings, version 2" }),
      ]),
    });
    // Without a thickness gauge the method settings' value is used; without that either, no uncertainty is stated.
    const noGauge = evaluateRunContext(context({ instruments: context().instruments.filter((i) => i.kind !== "THICKNESS_GAUGE"), settings: settings({ uThicknessMm: 0.07 }) }));
    expect(noGauge.uncertaintySources.ok && noGauge.uncertaintySources.declared.thicknessMm).toBe(0.07);
    const missing = evaluateRunContext(context({ instruments: [], settings: settings({ uDieDiameterMm: null }) }));
    expect(missing.uncertaintySources).toMatchObject({ ok: false, missing: expect.arrayContaining(["the die diameter (set it in the method settings)", "the burette readings (the burette panel's calibration)"]) });
  });

  it("states the uncertainty of each result with its three largest contributors; a run ended early carries it too", () => {
    const verdict = evaluateRunContext(context());
    const results = resultsOfVerdict(verdict, "D5887", { earlyEnd: !verdict.evaluation!.termination.met });
    for (const r of results) {
      expect(r.expandedUncertainty).toBeGreaterThan(0);
      const record = resultRecord(r.property, verdict, r.uncertaintyBudget, null);
      if (!record.uncertainty.stated) throw new Error("expected a stated uncertainty");
      const contributors = record.uncertainty.contributors;
      // Flux depends on the diameter, the volumes and the times only; k20 on all six inputs.
      expect(contributors).toHaveLength(r.property === "INDEX_FLUX" ? 3 : 6);
      expect(contributors.map((c) => c.relative)).toEqual([...contributors.map((c) => c.relative)].sort((a, b) => b - a));
      expect(record.uncertainty.expandedRelative * r.value).toBeCloseTo(r.expandedUncertainty!, 20);
      expect(record.settings).toMatchObject({ label: "ASTM D5887 settings, version 2", version: 2 });
      expect(record.refills).toBe(1);
    }
  });

  it("pore volumes from the specimen's dry bentonite mass, or from its mass per area made dry with the moisture content", () => {
    // Dry mass 37.7 g over a 100 mm die: 0.0377 / 0.00785398 = 4.800 kg/m²; n = 1 - (4.8 / 0.0059) / 2750 = 0.704160;
    // V_p = 0.704160 × 0.00785398 × 0.0059 m³ = 32.630 mL.
    const dry = evaluateRunContext(context({ specimen: { ...context().specimen, bentoniteDryMassG: 37.7 } }));
    expect(dry.poreVolume.ml).toBeCloseTo(32.63, 1);
    // 5.376 kg/m² at 12 % moisture is 4.8 kg/m² dry.
    const wet = evaluateRunContext(context({ specimen: { ...context().specimen, bentoniteMassPerAreaKgPerM2: 5.376 } }));
    expect(wet.poreVolume.ml).toBeCloseTo(dry.poreVolume.ml!, 1);
    expect(evaluateRunContext(context()).poreVolume).toMatchObject({ ml: null });
  });
});

describe("apparatus leakage against ASTM D5887's 10 % of the measured flux", () => {
  // Measured flux 2.0e-9 m³/m²/s over a 100 mm specimen is a flow of 2.0e-9 × 0.00785398 = 1.5708e-11 m³/s.
  const measured = { measuredFluxM3PerM2PerS: 2e-9, specimenAreaM2: (Math.PI * 0.1 ** 2) / 4, limitPct: 10, cell: "CELL-7" };
  it("a rate under 10 % of the flow passes; at 10 % or more it is flagged for QA", () => {
    const low = assessLeakage({ ...measured, check: { checkedAt: "2026-11-01T00:00:00Z", method: "dummy", rateM3PerS: 1.5e-12 } });
    expect(low.fraction).toBeCloseTo(1.5e-12 / 1.5707963e-11, 6);
    expect(low.flagged).toBe(false);
    expect(low.statement).toBe("Apparatus leakage of cell CELL-7, checked 2026-11-01 (dummy): 1.5 × 10⁻¹² m³/s, 9.5 % of the measured flow; ASTM D5887 asks for less than 10 %.");
    const atLimit = assessLeakage({ ...measured, check: { checkedAt: "2026-11-01T00:00:00Z", method: "dummy", fluxM3PerM2PerS: 2e-10 } });
    expect(atLimit).toMatchObject({ fraction: expect.closeTo(0.1, 12), flagged: true });
    expect(atLimit.statement).toMatch(/10 % of the measured flow; ASTM D5887 asks for less than 10 %, which this check does not meet\.$/);
  });
});

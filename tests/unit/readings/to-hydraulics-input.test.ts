import { describe, expect, it } from "vitest";
import { toHydraulicsReadings } from "@/lib/server/readings/to-hydraulics-input";

const stored = (elapsedS: number, inflow: number, outflow: number, extra: Record<string, number | null> = {}) => ({
  elapsedS, inflowCumulativeMl: inflow, outflowCumulativeMl: outflow, headPa: 14_000, temperatureC: 20,
  influentEcMsPerM: null, effluentEcMsPerM: null, influentPh: null, effluentPh: null, ...extra,
});

describe("current readings as lib/hydraulics readings", () => {
  it("sorts by time, gives head in kPa and leaves out EC and pH that were not recorded", () => {
    const out = toHydraulicsReadings([stored(3600, 0.3, 0.29), stored(0, 0, 0, { influentEcMsPerM: 120, effluentPh: 7.1 })]);
    expect(out).toEqual([
      { elapsedS: 0, inflowMl: 0, outflowMl: 0, headKPa: 14, temperatureC: 20, influentEcMsPerM: 120, effluentPh: 7.1 },
      { elapsedS: 3600, inflowMl: 0.3, outflowMl: 0.29, headKPa: 14, temperatureC: 20 },
    ]);
    expect(Object.keys(out[1]!)).not.toContain("influentPh");
  });

  it("counts volumes from the first current reading when a correction moved it off zero", () => {
    const out = toHydraulicsReadings([stored(0, 0.0314, -0.0312), stored(3600, 0.3454, 0.3120)]);
    expect(out[0]).toMatchObject({ inflowMl: 0, outflowMl: 0 });
    expect(out[1]!.inflowMl).toBeCloseTo(0.314, 12);
    expect(out[1]!.outflowMl).toBeCloseTo(0.3432, 12);
  });

  it("gives a volume a hair below zero (burette noise) as 0, since the library refuses negatives", () => {
    expect(toHydraulicsReadings([stored(0, 0, 0), stored(3600, -0.005, 0.01)])[1]).toMatchObject({ inflowMl: 0, outflowMl: 0.01 });
  });
});

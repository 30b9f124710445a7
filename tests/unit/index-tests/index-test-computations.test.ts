import fc from "fast-check";
import { sampleStandardDeviation, mean as ssMean } from "simple-statistics";
import { describe, expect, it } from "vitest";
import { fluidLossD5891 } from "@/lib/index-tests/fluid-loss-d5891";
import { massPerAreaD5993 } from "@/lib/index-tests/mass-per-area-d5993";
import { moistureContentD2216 } from "@/lib/index-tests/moisture-content-d2216";
import { peelStrengthD6496 } from "@/lib/index-tests/peel-strength-d6496";
import { swellIndexD5890 } from "@/lib/index-tests/swell-index-d5890";
import { tensileStrengthD6768 } from "@/lib/index-tests/tensile-strength-d6768";

// Worked examples: the observations are invented; the arithmetic is written out beside each check.

describe("moisture content by oven drying (ASTM D2216: w = (wet - dry) / (dry - tare))", () => {
  it("worked example: 45.30 g wet, 40.10 g dry, 15.10 g tare", () => {
    // water = 45.30 - 40.10 = 5.20 g; solids = 40.10 - 15.10 = 25.00 g; w = 5.20 / 25.00 = 0.208 = 20.8 %
    const w = moistureContentD2216({ wetWithTareG: 45.3, dryWithTareG: 40.1, tareG: 15.1 });
    expect(w.waterMassG).toBeCloseTo(5.2, 10);
    expect(w.drySolidsMassG).toBeCloseTo(25.0, 10);
    expect(w.moisturePct).toBeCloseTo(20.8, 10);
  });

  it("refuses a dry mass above the wet mass and a tare not below the dry mass", () => {
    expect(() => moistureContentD2216({ wetWithTareG: 40, dryWithTareG: 41, tareG: 10 })).toThrow(/dry mass is above the wet mass/);
    expect(() => moistureContentD2216({ wetWithTareG: 40, dryWithTareG: 30, tareG: 30 })).toThrow(/tare is not below the dry mass/);
  });

  it("property: a specimen that loses nothing in the oven has 0 % moisture", () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 500, noNaN: true }), fc.double({ min: 0.01, max: 500, noNaN: true }), (tare, solids) => {
      expect(moistureContentD2216({ wetWithTareG: tare + solids, dryWithTareG: tare + solids, tareG: tare }).moisturePct).toBe(0);
    }));
  });

  it("property: more water on the same solids never lowers the moisture content", () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 100, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), (solids, water, extra) => {
      const a = moistureContentD2216({ wetWithTareG: 10 + solids + water, dryWithTareG: 10 + solids, tareG: 10 }).moisturePct;
      const b = moistureContentD2216({ wetWithTareG: 10 + solids + water + extra, dryWithTareG: 10 + solids, tareG: 10 }).moisturePct;
      expect(b).toBeGreaterThanOrEqual(a - 1e-9);
    }));
  });
});

describe("mass per unit area of the GCL and of its clay at 0 % moisture (ASTM D5993)", () => {
  it("worked example: a 200 mm × 200 mm square of 210.0 g with 40.0 g of geotextile, clay at 12.0 % moisture", () => {
    // area = 0.200 m × 0.200 m = 0.0400 m²; GCL = 0.2100 kg / 0.0400 m² = 5.25 kg/m²
    // clay as weighed = 210.0 - 40.0 = 170.0 g; moisture 12.0 % from 38.40 g wet, 36.00 g dry, 16.00 g tare
    //   (water 2.40 g over solids 20.00 g = 0.120); clay at 0 % = 170.0 / 1.120 = 151.786 g;
    //   per area = 0.151786 kg / 0.0400 m² = 3.7946 kg/m²
    const r = massPerAreaD5993([{ lengthMm: 200, widthMm: 200, totalMassG: 210, geotextileMassG: 40 }], { wetWithTareG: 38.4, dryWithTareG: 36, tareG: 16 });
    expect(r.specimens[0]!.areaM2).toBeCloseTo(0.04, 12);
    expect(r.gcl.mean).toBeCloseTo(5.25, 10);
    expect(r.moisture.moisturePct).toBeCloseTo(12.0, 10);
    expect(r.clayDry.mean).toBeCloseTo(3.794642857, 8);
  });

  it("means over three specimens, sample standard deviation checked against simple-statistics (npm reference library)", () => {
    const specimens = [
      { lengthMm: 200, widthMm: 200, totalMassG: 210, geotextileMassG: 40 },
      { lengthMm: 200, widthMm: 200, totalMassG: 214, geotextileMassG: 41 },
      { lengthMm: 200, widthMm: 200, totalMassG: 205, geotextileMassG: 39 },
    ];
    const r = massPerAreaD5993(specimens, { wetWithTareG: 38.4, dryWithTareG: 36, tareG: 16 });
    // GCL: 5.25, 5.35, 5.125 kg/m² -> mean 15.725 / 3 = 5.241666...
    expect(r.gcl.mean).toBeCloseTo(15.725 / 3, 10);
    const clay = specimens.map((s) => (s.totalMassG - s.geotextileMassG) / 1.12 / 1000 / 0.04);
    expect(r.clayDry.mean).toBeCloseTo(ssMean(clay), 12);
    expect(r.clayDry.standardDeviation!).toBeCloseTo(sampleStandardDeviation(clay), 12);
  });

  it("property: scaling every mass by k scales both results by k (mass per area is proportional to mass)", () => {
    fc.assert(fc.property(
      fc.double({ min: 50, max: 400, noNaN: true }), fc.double({ min: 0.05, max: 0.5, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true }),
      (total, geoShare, k) => {
        const moisture = { wetWithTareG: 38.4, dryWithTareG: 36, tareG: 16 };
        const a = massPerAreaD5993([{ lengthMm: 150, widthMm: 250, totalMassG: total, geotextileMassG: total * geoShare }], moisture);
        const b = massPerAreaD5993([{ lengthMm: 150, widthMm: 250, totalMassG: total * k, geotextileMassG: total * geoShare * k }], moisture);
        expect(b.gcl.mean / a.gcl.mean).toBeCloseTo(k, 9);
        expect(b.clayDry.mean / a.clayDry.mean).toBeCloseTo(k, 9);
      },
    ));
  });

  it("property: a larger specimen of the same material gives the same mass per area", () => {
    fc.assert(fc.property(fc.double({ min: 0.2, max: 5, noNaN: true }), (scale) => {
      const moisture = { wetWithTareG: 38.4, dryWithTareG: 36, tareG: 16 };
      const a = massPerAreaD5993([{ lengthMm: 100, widthMm: 100, totalMassG: 52.5, geotextileMassG: 10 }], moisture);
      const b = massPerAreaD5993([{ lengthMm: 100 * scale, widthMm: 100, totalMassG: 52.5 * scale, geotextileMassG: 10 * scale }], moisture);
      expect(b.gcl.mean).toBeCloseTo(a.gcl.mean, 9);
      expect(b.clayDry.mean).toBeCloseTo(a.clayDry.mean, 9);
    }));
  });
});

describe("swell index (ASTM D5890)", () => {
  const rules = { nominalClayMassG: 2, clayMassToleranceG: 0.01, minHydrationHours: 16, cylinderCapacityMl: 100 };
  it("worked example: 2.00 g read at 27.5 mL after 18 h is 27.5 mL/2 g, no departure", () => {
    expect(swellIndexD5890({ dryClayMassG: 2, settledVolumeMl: 27.5, hydrationHours: 18, waterTemperatureC: 21 }, rules)).toEqual({ swellIndexMlPer2g: 27.5, departures: [] });
  });
  it("names a clay mass outside 2.00 ± 0.01 g and a reading before 16 h (from memory) as departures", () => {
    const r = swellIndexD5890({ dryClayMassG: 2.05, settledVolumeMl: 26, hydrationHours: 12, waterTemperatureC: 21 }, rules);
    expect(r.departures).toHaveLength(2);
  });
  it("refuses a volume above the cylinder's capacity", () => {
    expect(() => swellIndexD5890({ dryClayMassG: 2, settledVolumeMl: 101, hydrationHours: 18, waterTemperatureC: 21 }, rules)).toThrow(/capacity of 100 mL/);
  });
});

describe("fluid loss (ASTM D5891)", () => {
  const rules = { pressureKPa: 690, pressureToleranceKPa: 35, filtrationMinutes: 30 };
  it("worked example: 22.5 g in 350 mL at 690 kPa for 30 min, 16.4 mL of filtrate", () => {
    // solids = 22.5 / (22.5 + 350 × 1 g/mL) = 22.5 / 372.5 = 0.0604 = 6.04 % (about 6 %, as the method asks)
    const r = fluidLossD5891({ clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 690, filtrationMinutes: 30, filtrateVolumeMl: 16.4 }, rules);
    expect(r.fluidLossMl).toBe(16.4);
    expect(r.slurrySolidsPct).toBeCloseTo(6.0403, 4);
    expect(r.departures).toEqual([]);
  });
  it("names a pressure outside the tolerance and a different filtration time as departures", () => {
    expect(fluidLossD5891({ clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 600, filtrationMinutes: 25, filtrateVolumeMl: 15 }, rules).departures).toHaveLength(2);
  });
});

describe("tensile strength (ASTM D6768)", () => {
  it("worked example: five 100 mm strips at 912, 887, 945, 901 and 865 N", () => {
    // per width: 912 / 100 = 9.12, 8.87, 9.45, 9.01, 8.65 kN/m (N / mm = kN/m); sum 45.10, mean 9.02 kN/m
    // deviations 0.10, -0.15, 0.43, -0.01, -0.37; squares 0.0100 + 0.0225 + 0.1849 + 0.0001 + 0.1369 = 0.3544
    // sample sd = sqrt(0.3544 / 4) = sqrt(0.0886) = 0.29766 kN/m
    const r = tensileStrengthD6768([912, 887, 945, 901, 865].map((peakForceN) => ({ widthMm: 100, peakForceN })));
    expect(r.count).toBe(5);
    expect(r.mean).toBeCloseTo(9.02, 10);
    expect(r.standardDeviation!).toBeCloseTo(0.297657, 5);
    expect(r.standardDeviation!).toBeCloseTo(sampleStandardDeviation(r.specimensKnPerM), 12);
  });
  it("refuses a negative force", () => {
    expect(() => tensileStrengthD6768([{ widthMm: 100, peakForceN: -1 }])).toThrow(/cannot be negative/);
  });
  it("property: doubling every strip's width at the same force halves the strength", () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 1, max: 20000, noNaN: true }), { minLength: 2, maxLength: 8 }), (forces) => {
      const a = tensileStrengthD6768(forces.map((peakForceN) => ({ widthMm: 100, peakForceN })));
      const b = tensileStrengthD6768(forces.map((peakForceN) => ({ widthMm: 200, peakForceN })));
      expect(b.mean).toBeCloseTo(a.mean / 2, 9);
    }));
  });
});

describe("peel strength (ASTM D6496)", () => {
  it("worked example: five 100 mm specimens at 61.0, 55.5, 58.3, 64.2 and 57.0 N", () => {
    // per width: 610, 555, 583, 642, 570 N/m (N / 0.100 m); sum 2960, mean 592 N/m
    // deviations 18, -37, -9, 50, -22; squares 324 + 1369 + 81 + 2500 + 484 = 4758; sd = sqrt(4758 / 4) = 34.489 N/m
    const r = peelStrengthD6496([61.0, 55.5, 58.3, 64.2, 57.0].map((peelForceN) => ({ widthMm: 100, peelForceN })));
    expect(r.mean).toBeCloseTo(592, 9);
    expect(r.standardDeviation!).toBeCloseTo(34.4891, 4);
    expect(r.standardDeviation!).toBeCloseTo(sampleStandardDeviation(r.specimensNPerM), 12);
  });
  it("a single specimen has no standard deviation", () => {
    expect(peelStrengthD6496([{ widthMm: 100, peelForceN: 40 }]).standardDeviation).toBeNull();
  });
});

describe("reported values (lab settings: reporting unit and decimal places, rounded half to even)", () => {
  it("rounds once in the reporting unit", async () => {
    const { reportIndexValue } = await import("@/lib/index-tests/reported-value");
    // 9.02 kN/m to one decimal: 9.0; 0.592 kN/m reported in N/m to whole units: 592; 3.665 kg/m² to 0.01, half to even: 3.66 (decimal.js, ROUND_HALF_EVEN)
    expect(reportIndexValue(9.02, "kN/m", { reportingUnit: "kN/m", reportingDecimals: 1 })).toBe("9.0 kN/m");
    expect(reportIndexValue(0.592, "kN/m", { reportingUnit: "N/m", reportingDecimals: 0 })).toBe("592 N/m");
    expect(reportIndexValue(3.665, "kg/m2", { reportingUnit: "kg/m2", reportingDecimals: 2 })).toBe("3.66 kg/m²");
    expect(reportIndexValue(3.675, "kg/m2", { reportingUnit: "kg/m2", reportingDecimals: 2 })).toBe("3.68 kg/m²");
  });
});

describe("evaluateIndexTest: the results a test gives, with the lab's declared uncertainty", () => {
  it("D5993 gives the clay's and the GCL's mass per area; the declared expanded uncertainty goes with the clay result only", async () => {
    const { evaluateIndexTest } = await import("@/lib/index-tests/evaluate-index-test");
    const { METHOD_SETTINGS } = await import("@/lib/methods/registry");
    const settings = { ...(METHOD_SETTINGS.D5993!.defaults as Record<string, unknown>), expandedUncertainty: 0.05, coverageFactor: 2 } as never;
    const r = evaluateIndexTest({ methodCode: "D5993", wetWithTareG: 38.4, dryWithTareG: 36, tareG: 16, specimens: [{ lengthMm: 200, widthMm: 200, totalMassG: 210, geotextileMassG: 40 }] }, settings);
    expect(r.results.map((x) => [x.property, Number(x.value.toFixed(4)), x.expandedUncertainty, x.coverageFactor])).toEqual([
      ["BENTONITE_MASS_PER_AREA", 3.7946, 0.05, 2],
      ["GCL_MASS_PER_AREA", 5.25, null, null],
    ]);
  });
  it("no uncertainty declared (the shipped default): none stated", async () => {
    const { evaluateIndexTest } = await import("@/lib/index-tests/evaluate-index-test");
    const { METHOD_SETTINGS } = await import("@/lib/methods/registry");
    const r = evaluateIndexTest({ methodCode: "D5891", clayMassG: 22.5, waterVolumeMl: 350, pressureKPa: 690, filtrationMinutes: 30, filtrateVolumeMl: 16.4 }, METHOD_SETTINGS.D5891!.defaults as never);
    expect(r.results[0]).toMatchObject({ property: "FLUID_LOSS", value: 16.4, unit: "mL", expandedUncertainty: null, coverageFactor: null, specimenCount: 1 });
  });
});

import { describe, expect, it } from "vitest";
import { estimatePorosity, poreVolumeMl, poreVolumesOfFlow, resolvePorosity } from "../../../lib/hydraulics";

describe("porosity and pore volumes", () => {
  it("worked example: 3.66 kg/m^2 in a 5 mm layer, G_s 2.75", () => {
    // dry density = 3.66 / 0.005 = 732 kg/m^3; n = 1 - 732 / (2.75 × 1000) = 1 - 0.266182 = 0.733818
    const n = estimatePorosity({ bentoniteMassPerAreaKgPerM2: 3.66, thicknessMm: 5 });
    expect(n).toBeCloseTo(0.7338181818, 9);
    // PV = 0.733818 × (pi × 0.1^2 / 4 × 0.005 m^3 = 39.26991 mL) = 28.81697 mL
    expect(poreVolumeMl({ diameterMm: 100, thicknessMm: 5, porosity: n })).toBeCloseTo(28.81697, 4);
    expect(poreVolumesOfFlow(57.63394, 28.81697)).toBeCloseTo(2, 12);
  });

  it("specific gravity can be given", () => {
    // n = 1 - 732 / 2700 = 0.728889
    expect(estimatePorosity({ bentoniteMassPerAreaKgPerM2: 3.66, thicknessMm: 5, specificGravity: 2.7 })).toBeCloseTo(0.728889, 6);
  });

  it("resolves measured, estimated, missing and impossible porosity", () => {
    expect(resolvePorosity({ thicknessMm: 5, porosity: 0.8 })).toEqual({ porosity: 0.8, source: "measured porosity" });
    expect(resolvePorosity({ thicknessMm: 5, bentoniteMassPerAreaKgPerM2: 3.66 }).porosity).toBeCloseTo(0.733818, 6);
    const missing = resolvePorosity({ thicknessMm: 5 });
    expect(missing.porosity).toBeNull();
    // 20 kg/m^2 in 5 mm is 4000 kg/m^3, denser than the solids: n < 0.
    const impossible = resolvePorosity({ thicknessMm: 5, bentoniteMassPerAreaKgPerM2: 20 });
    expect(impossible.porosity).toBeNull();
    expect("reason" in impossible ? impossible.reason : "").toMatch(/not between 0 and 1/);
  });
});

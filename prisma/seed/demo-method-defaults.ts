// The test methods themselves are reference data installed by a migration (20261201224000_test_methods).

// Commonly cited GCL limits (GRI-GCL3, as quoted in public project specifications; see shared/DOMAIN.md).
// Tensile and peel limits and every testing frequency are from memory (low confidence); swell index and fluid
// loss are specified per mass of clay (about 50 t), which the demo approximates as one test per lot.
export const DEMO_SPEC_LIMITS = [
  { property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM", significantDigits: 1, testMethodCode: "D5887", testingFrequencyAreaM2: 25_000 },
  { property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", significantDigits: 1, testMethodCode: "D5084", testingFrequencyAreaM2: 25_000 },
  { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM", significantDigits: 2, testMethodCode: "D5890", testingFrequencyPerLot: true },
  { property: "FLUID_LOSS", limitText: "18", unit: "mL", direction: "MAXIMUM", significantDigits: 2, testMethodCode: "D5891", testingFrequencyPerLot: true },
  { property: "BENTONITE_MASS_PER_AREA", limitText: "3.66", unit: "kg/m2", direction: "MINIMUM", significantDigits: 3, testMethodCode: "D5993", testingFrequencyAreaM2: 4_000 },
  { property: "TENSILE_STRENGTH", limitText: "4", unit: "kN/m", direction: "MINIMUM", significantDigits: 1, testMethodCode: "D6768", testingFrequencyAreaM2: 20_000 },
  { property: "PEEL_STRENGTH", limitText: "360", unit: "N/m", direction: "MINIMUM", significantDigits: 3, testMethodCode: "D6496", testingFrequencyAreaM2: 4_000 },
] as const;

/**
 * A project's own specification: the common limits, with the project's own testing frequencies where its
 * quality plan is stricter. The tailings pond asks for a mass per unit area test every 500 m² delivered.
 */
export function demoSpecLimits(projectCode: string) {
  return DEMO_SPEC_LIMITS.map((l) => (projectCode === "OMC-TPB" && l.property === "BENTONITE_MASS_PER_AREA" ? { ...l, testingFrequencyAreaM2: 500 } : { ...l }));
}

// The test methods themselves are reference data installed by a migration (20261201224000_test_methods).

// Commonly cited GCL limits (GRI-GCL3, as quoted in public project specifications; see shared/DOMAIN.md).
export const DEMO_SPEC_LIMITS = [
  { property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM", significantDigits: 1, testMethodCode: "D5887" },
  { property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", significantDigits: 1, testMethodCode: "D5084" },
  { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM", significantDigits: 2, testMethodCode: null },
  { property: "FLUID_LOSS", limitText: "18", unit: "mL", direction: "MAXIMUM", significantDigits: 2, testMethodCode: null },
  { property: "BENTONITE_MASS_PER_AREA", limitText: "3.66", unit: "kg/m2", direction: "MINIMUM", significantDigits: 3, testMethodCode: null },
] as const;

// Lab-adjustable defaults stored with each method. The numbers follow shared/DOMAIN.md: the confining margin
// of about 35 kPa and the 0.75-1.25 ratio band are common practice; the D6766 chemistry bands are from memory.
export const DEMO_METHODS = [
  {
    code: "D5887",
    title: "ASTM D5887 index flux of a saturated GCL specimen (flexible-wall permeameter)",
    defaults: { confiningMarginPa: 35_000, ratioBand: [0.75, 1.25], trendIntervals: 4 },
  },
  {
    code: "D5084",
    title: "ASTM D5084 hydraulic conductivity of saturated porous materials (flexible-wall permeameter)",
    defaults: { confiningMarginPa: 35_000, ratioBand: [0.75, 1.25], trendIntervals: 4, kBandConsecutive: 4 },
  },
  {
    code: "D6766",
    title: "ASTM D6766 hydraulic properties of a GCL permeated with a potentially incompatible liquid",
    defaults: { confiningMarginPa: 35_000, ratioBand: [0.75, 1.25], trendIntervals: 4, ecWithinFraction: 0.1, minPoreVolumes: 2 },
  },
] as const;

// Commonly cited GCL limits (GRI-GCL3, as quoted in public project specifications; see shared/DOMAIN.md).
export const DEMO_SPEC_LIMITS = [
  { property: "INDEX_FLUX", limitText: "1e-8", unit: "m3/m2/s", direction: "MAXIMUM", significantDigits: 1, testMethodCode: "D5887" },
  { property: "HYDRAULIC_CONDUCTIVITY", limitText: "5e-11", unit: "m/s", direction: "MAXIMUM", significantDigits: 1, testMethodCode: "D5084" },
  { property: "SWELL_INDEX", limitText: "24", unit: "mL/2 g", direction: "MINIMUM", significantDigits: 2, testMethodCode: null },
  { property: "FLUID_LOSS", limitText: "18", unit: "mL", direction: "MAXIMUM", significantDigits: 2, testMethodCode: null },
  { property: "BENTONITE_MASS_PER_AREA", limitText: "3.66", unit: "kg/m2", direction: "MINIMUM", significantDigits: 3, testMethodCode: null },
] as const;

/**
 * The bases a hydraulic result was computed on, in words a reader understands, never the library's internal
 * codes ("conventional-9.81"). Pure.
 */
import type { UnitWeightBasis, ViscosityRatioBasis } from "../hydraulics";

const UNIT_WEIGHT_WORDS: Record<UnitWeightBasis, string> = {
  "conventional-9.81": "the conventional 9.81 kN/m³, whatever the temperature",
  "density-at-temperature": "the density of water at the measured temperature times standard gravity (9.80665 m/s²)",
};

const VISCOSITY_WORDS: Record<ViscosityRatioBasis, string> = {
  "D5084-in-range": "ASTM D5084's empirical equation from 15 to 30 °C, and the ratio of IAPWS 2008 water viscosities outside that range",
  "D5084-equation": "ASTM D5084's empirical equation at every temperature",
  "IAPWS-2008": "the ratio of IAPWS 2008 water viscosities at the test temperature and at 20 °C",
};

/** How the head was turned from pressure into metres of water. */
export function unitWeightWords(basis: UnitWeightBasis | string): string {
  return UNIT_WEIGHT_WORDS[basis as UnitWeightBasis] ?? "not recorded";
}

/** How the correction of k to 20 °C was obtained. */
export function viscosityWords(basis: ViscosityRatioBasis | string): string {
  return VISCOSITY_WORDS[basis as ViscosityRatioBasis] ?? "not recorded";
}

/** Which thickness the gradient used. */
export function thicknessBasisWords(basis: "post-test" | "initial", thicknessMm: number | null): string {
  const value = thicknessMm === null ? "" : ` (${+thicknessMm.toFixed(2)} mm)`;
  return basis === "post-test"
    ? `the bentonite layer after the test, geotextiles excluded${value}`
    : `the specimen's initial thickness${value}, until the post-test thickness is recorded`;
}

/**
 * The index-test methods the lab runs on rolls: which properties each gives, which instruments it uses (and
 * so which calibrations gate it), and whether it is done on a coupon cut for it (a tensile strip, a
 * mass-per-area square) or on clay taken from the roll sample. Pure.
 */
import type { TestProperty } from "../results/property-units";

export const INDEX_METHOD_CODES = ["D5890", "D5891", "D5993", "D2216", "D6768", "D6496"] as const;
export type IndexMethodCode = (typeof INDEX_METHOD_CODES)[number];

export type InstrumentRole = { key: string; kind: string; label: string };

export type IndexMethod = {
  code: IndexMethodCode;
  title: string;
  /** The properties a test of this method gives, the first being its main result. */
  properties: readonly TestProperty[];
  instruments: readonly InstrumentRole[];
  /** Done on a coupon cut for it (true), or on clay from the roll sample, which may name a coupon (false). */
  needsCoupon: boolean;
  /** What the coupon is, for the cut form ("tensile strips"). */
  couponWhat: string;
};

const balance: InstrumentRole = { key: "balanceId", kind: "BALANCE", label: "Balance" };
const oven: InstrumentRole = { key: "ovenId", kind: "OVEN", label: "Drying oven" };
const cylinder: InstrumentRole = { key: "cylinderId", kind: "GRADUATED_CYLINDER", label: "Graduated cylinder" };
const press: InstrumentRole = { key: "filterPressId", kind: "FILTER_PRESS", label: "Filter press" };
const frame: InstrumentRole = { key: "tensileFrameId", kind: "TENSILE_FRAME", label: "Tensile frame" };
const loadCell: InstrumentRole = { key: "loadCellId", kind: "LOAD_CELL", label: "Load cell" };

export const INDEX_METHODS: Readonly<Record<IndexMethodCode, IndexMethod>> = {
  D5890: { code: "D5890", title: "Swell index (ASTM D5890)", properties: ["SWELL_INDEX"], instruments: [balance, cylinder], needsCoupon: false, couponWhat: "clay for the swell index" },
  D5891: { code: "D5891", title: "Fluid loss (ASTM D5891)", properties: ["FLUID_LOSS"], instruments: [balance, press, cylinder], needsCoupon: false, couponWhat: "clay for the fluid loss" },
  D5993: { code: "D5993", title: "Mass per unit area (ASTM D5993)", properties: ["BENTONITE_MASS_PER_AREA", "GCL_MASS_PER_AREA"], instruments: [balance, oven], needsCoupon: true, couponWhat: "mass-per-area squares" },
  D2216: { code: "D2216", title: "Moisture content (ASTM D2216)", properties: ["MOISTURE_CONTENT"], instruments: [balance, oven], needsCoupon: false, couponWhat: "clay for the moisture content" },
  D6768: { code: "D6768", title: "Tensile strength (ASTM D6768)", properties: ["TENSILE_STRENGTH"], instruments: [frame, loadCell], needsCoupon: true, couponWhat: "tensile strips" },
  D6496: { code: "D6496", title: "Peel strength (ASTM D6496)", properties: ["PEEL_STRENGTH"], instruments: [frame, loadCell], needsCoupon: true, couponWhat: "peel specimens" },
};

export function isIndexMethodCode(code: string): code is IndexMethodCode {
  return (INDEX_METHOD_CODES as readonly string[]).includes(code);
}

/** The index method that gives a property, or null for the hydraulic properties. */
export function indexMethodFor(property: TestProperty): IndexMethod | null {
  return Object.values(INDEX_METHODS).find((m) => m.properties.includes(property)) ?? null;
}

/** The hydraulic properties (results of runs, not of index tests). */
export const HYDRAULIC_PROPERTIES: readonly TestProperty[] = ["INDEX_FLUX", "HYDRAULIC_CONDUCTIVITY"];

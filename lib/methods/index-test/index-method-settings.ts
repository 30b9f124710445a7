/**
 * What every index-test method's settings share: how many specimens a test needs at least, how the result
 * is rounded and in which unit it is reported, and the expanded uncertainty the lab declares (none is
 * shipped). Each method adds its own keys (clay mass, hydration time, press pressure). Pure.
 */
import { z } from "zod";
import { measured, optionalMeasured } from "../../validation/common";
import type { MethodSettingsDefinition, SettingField, SettingSource } from "../settings-definition";

const nullable = (schema: ReturnType<typeof optionalMeasured>) => schema.transform((v) => (v === undefined ? null : v));

const whole = (label: string, min: number, max: number) => measured(label, { min, max }).refine(Number.isInteger, `${label.charAt(0).toUpperCase()}${label.slice(1)} must be a whole number.`);

/** The shared keys' schema, for a method whose result is reported in one of `units`. */
function commonShape(units: readonly [string, ...string[]]) {
  return {
    minSpecimens: whole("the smallest number of specimens", 1, 50),
    reportingUnit: z.enum(units, { message: `Choose the reporting unit: ${units.join(" or ")}.` }),
    reportingDecimals: whole("the decimal places reported", 0, 6),
    expandedUncertainty: nullable(optionalMeasured("the expanded uncertainty", { min: 0, max: 1e6 })),
    coverageFactor: measured("the coverage factor k", { min: 1, max: 4 }),
  };
}

export type IndexCommonSettings = {
  minSpecimens: number;
  reportingUnit: string;
  reportingDecimals: number;
  /** In the unit the result is stored in (the first of the method's units); null: none declared. */
  expandedUncertainty: number | null;
  coverageFactor: number;
};

type FieldSpec = { source: SettingSource; note: string };

/**
 * An index method's definition: its own keys (shape, fields, defaults) beside the shared ones. `units[0]`
 * is the unit results are stored in; `specimens`, `decimals` say where the method's defaults come from.
 */
export function indexMethodSettings<S extends Record<string, unknown>>(args: {
  methodCode: string;
  units: readonly [string, ...string[]];
  ownShape: z.ZodRawShape;
  ownFields: SettingField[];
  defaults: S & IndexCommonSettings;
  specimens: FieldSpec;
  decimals: FieldSpec;
  refine?: (v: S & IndexCommonSettings, ctx: z.RefinementCtx) => void;
}): MethodSettingsDefinition<S & IndexCommonSettings> {
  const base = z.object({ ...commonShape(args.units), ...args.ownShape });
  const schema = (args.refine ? base.superRefine((v, ctx) => args.refine!(v as S & IndexCommonSettings, ctx)) : base) as unknown as z.ZodType<S & IndexCommonSettings, unknown>;
  const G = "Specimens and reporting";
  const fields: SettingField[] = [
    { key: "minSpecimens", label: "Specimens per test, at least", unit: "specimens", group: G, ...args.specimens },
    { key: "reportingUnit", label: "Reporting unit", unit: "", group: G, source: "standard", note: `Results are stored in ${args.units[0]} and shown in this unit.`, choices: args.units.map((u) => ({ value: u, label: u })) },
    { key: "reportingDecimals", label: "Decimal places reported", unit: "", group: G, ...args.decimals },
    { key: "expandedUncertainty", label: "Expanded uncertainty of a result", unit: args.units[0], group: "Uncertainty", source: "lab's own", note: "The lab's own estimate for this method (from its validation); blank: no uncertainty is stated on results.", optional: true },
    { key: "coverageFactor", label: "Coverage factor k of that uncertainty", unit: "", group: "Uncertainty", source: "common practice", note: "k = 2 gives a coverage probability of about 95 % (GUM, common practice)." },
    ...args.ownFields,
  ];
  return { methodCode: args.methodCode, family: "index", schema, defaults: Object.freeze({ ...args.defaults }), fields };
}

export { measured, whole };

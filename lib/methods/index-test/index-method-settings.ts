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

/** Where a shared key's default comes from, with the default itself. */
type SharedDefault = { default: number; source: SettingSource; note: string };

/**
 * One of a method's own settings, declared once: its schema, its default and how the settings screen shows
 * it (under "The method" unless it names another group).
 */
export type OwnSetting = Pick<SettingField, "label" | "unit" | "source" | "note"> & { schema: z.ZodType; default: number; group?: string };

const ownField = (key: string, o: OwnSetting): SettingField => ({ key, label: o.label, unit: o.unit, group: o.group ?? "The method", source: o.source, note: o.note });

type OwnValues<O extends Record<string, OwnSetting>> = { [K in keyof O]: number };

/**
 * An index method's definition: its own settings beside the shared ones. `units[0]` is the unit results are
 * stored in and reported in by default; `specimens`, `decimals` give the method's defaults for those keys
 * and where they come from. No expanded uncertainty is shipped (k = 2 stands ready for the lab's own).
 */
export function indexMethodSettings<O extends Record<string, OwnSetting>>(args: {
  methodCode: string;
  units: readonly [string, ...string[]];
  specimens: SharedDefault;
  decimals: SharedDefault;
  own: O;
  refine?: (v: OwnValues<O> & IndexCommonSettings, ctx: z.RefinementCtx) => void;
}): MethodSettingsDefinition<OwnValues<O> & IndexCommonSettings> {
  type S = OwnValues<O> & IndexCommonSettings;
  const own = Object.entries(args.own);
  const base = z.object({ ...commonShape(args.units), ...Object.fromEntries(own.map(([key, o]) => [key, o.schema])) });
  const schema = (args.refine ? base.superRefine((v, ctx) => args.refine!(v as S, ctx)) : base) as unknown as z.ZodType<S, unknown>;
  const G = "Specimens and reporting";
  const fields: SettingField[] = [
    { key: "minSpecimens", label: "Specimens per test, at least", unit: "specimens", group: G, source: args.specimens.source, note: args.specimens.note },
    { key: "reportingUnit", label: "Reporting unit", unit: "", group: G, source: "standard", note: `Results are stored in ${args.units[0]} and shown in this unit.`, choices: args.units.map((u) => ({ value: u, label: u })) },
    { key: "reportingDecimals", label: "Decimal places reported", unit: "", group: G, source: args.decimals.source, note: args.decimals.note },
    { key: "expandedUncertainty", label: "Expanded uncertainty of a result", unit: args.units[0], group: "Uncertainty", source: "lab's own", note: "The lab's own estimate for this method (from its validation); blank: no uncertainty is stated on results.", optional: true },
    { key: "coverageFactor", label: "Coverage factor k of that uncertainty", unit: "", group: "Uncertainty", source: "common practice", note: "k = 2 gives a coverage probability of about 95 % (GUM, common practice)." },
    ...own.map(([key, o]) => ownField(key, o)),
  ];
  const common: IndexCommonSettings = { minSpecimens: args.specimens.default, reportingUnit: args.units[0], reportingDecimals: args.decimals.default, expandedUncertainty: null, coverageFactor: 2 };
  const defaults = { ...common, ...Object.fromEntries(own.map(([key, o]) => [key, o.default])) } as S;
  return { methodCode: args.methodCode, family: "index", schema, defaults: Object.freeze(defaults), fields };
}

export { measured, whole };

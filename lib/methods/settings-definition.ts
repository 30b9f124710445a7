/**
 * What every test method's lab-adjustable settings look like to the rest of the app: a zod schema (shared by
 * the settings screen's form and the server), the defaults the app ships with, and for each field its
 * label, unit and the source of its default. A method registers one of these in lib/methods/registry.ts;
 * the settings screen and the versioned MethodSettingsVersion records read nothing else. Pure.
 */
import type { z } from "zod";

/** Where a default comes from, as the settings screen states it. */
export type SettingSource = "standard" | "common practice" | "from memory" | "lab's own";

export const SETTING_SOURCE_LABELS: Record<SettingSource, string> = {
  standard: "Standard",
  "common practice": "Common practice",
  "from memory": "From memory (check it)",
  "lab's own": "The lab's own value",
};

export type SettingField = {
  /** Key in the settings object. */
  key: string;
  label: string;
  /** Unit as shown beside the value ("kPa", "%", "h"); empty for a pure number. */
  unit: string;
  /** Heading the field is shown under. */
  group: string;
  source: SettingSource;
  /** One sentence: where the default comes from, or what the value means. */
  note: string;
  /** A choice among fixed values instead of a number. */
  choices?: ReadonlyArray<{ value: string; label: string }>;
  /** May be left blank: the value is then "not set" (null) and the note says what follows. */
  optional?: boolean;
};

export type MethodSettingsDefinition<S extends Record<string, unknown> = Record<string, unknown>> = {
  methodCode: string;
  /** What kind of test: the settings screen groups by it. */
  family: "hydraulic" | "index";
  /** The settings as the form sends them (strings) in, the stored settings out. */
  schema: z.ZodType<S, unknown>;
  defaults: Readonly<S>;
  fields: readonly SettingField[];
};

/**
 * A stored settings object read back with the current schema: keys a later version of the app added take
 * their defaults, so an old version record stays readable. Throws a zod error if a stored value is invalid.
 */
export function readStoredSettings<S extends Record<string, unknown>>(definition: MethodSettingsDefinition<S>, stored: unknown): S {
  const values = stored !== null && typeof stored === "object" ? (stored as Record<string, unknown>) : {};
  return definition.schema.parse({ ...definition.defaults, ...values });
}

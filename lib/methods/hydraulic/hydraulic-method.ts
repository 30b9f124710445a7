import type { MethodSettingsDefinition, SettingField, SettingSource } from "../settings-definition";
import { HYDRAULIC_DEFAULTS, hydraulicSettingFields, hydraulicSettingsSchema, type HydraulicSettings } from "./hydraulic-settings";

/** A hydraulic method's settings definition: the shared schema and fields with this method's defaults and sources. */
export function hydraulicMethodSettings(
  methodCode: "D5887" | "D6766" | "D5084",
  defaults: Partial<HydraulicSettings>,
  sources: Partial<Record<keyof HydraulicSettings, { source: SettingSource; note: string }>> = {},
): MethodSettingsDefinition<HydraulicSettings> {
  const fields: SettingField[] = hydraulicSettingFields(sources);
  return { methodCode, family: "hydraulic", schema: hydraulicSettingsSchema, defaults: Object.freeze({ ...HYDRAULIC_DEFAULTS, ...defaults }), fields };
}

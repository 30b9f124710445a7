/**
 * The lab's repertoire of test methods with lab-adjustable settings: one entry per method folder. The
 * settings screen lists these, and MethodSettingsVersion records are validated by them. A new method
 * (an index test, say) adds its folder, its entry here and a migration with its TestMethod row and first
 * settings version.
 */
import { D5084_SETTINGS } from "./d5084/settings";
import { D5887_SETTINGS } from "./d5887/settings";
import { D6766_SETTINGS } from "./d6766/settings";
import type { MethodSettingsDefinition } from "./settings-definition";

export const METHOD_SETTINGS: Readonly<Record<string, MethodSettingsDefinition>> = Object.freeze({
  D5887: D5887_SETTINGS as unknown as MethodSettingsDefinition,
  D5084: D5084_SETTINGS as unknown as MethodSettingsDefinition,
  D6766: D6766_SETTINGS as unknown as MethodSettingsDefinition,
});

/** The settings definition of a method, or null when the method has no adjustable settings. */
export function methodSettingsDefinition(methodCode: string): MethodSettingsDefinition | null {
  return METHOD_SETTINGS[methodCode] ?? null;
}

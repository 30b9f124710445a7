/**
 * The lab's repertoire of test methods with lab-adjustable settings: one entry per method folder. The
 * settings screen lists these, and MethodSettingsVersion records are validated by them. A new method
 * (an index test, say) adds its folder, its entry here and a migration with its TestMethod row and first
 * settings version.
 */
import { D2216_SETTINGS } from "./d2216/settings";
import { D5084_SETTINGS } from "./d5084/settings";
import { D5887_SETTINGS } from "./d5887/settings";
import { D5890_SETTINGS } from "./d5890/settings";
import { D5891_SETTINGS } from "./d5891/settings";
import { D5993_SETTINGS } from "./d5993/settings";
import { D6496_SETTINGS } from "./d6496/settings";
import { D6766_SETTINGS } from "./d6766/settings";
import { D6768_SETTINGS } from "./d6768/settings";
import type { MethodSettingsDefinition } from "./settings-definition";

export const METHOD_SETTINGS: Readonly<Record<string, MethodSettingsDefinition>> = Object.freeze({
  D5887: D5887_SETTINGS as unknown as MethodSettingsDefinition,
  D5084: D5084_SETTINGS as unknown as MethodSettingsDefinition,
  D6766: D6766_SETTINGS as unknown as MethodSettingsDefinition,
  // Index tests on the same rolls (lib/index-tests holds their computations).
  D5890: D5890_SETTINGS as unknown as MethodSettingsDefinition,
  D5891: D5891_SETTINGS as unknown as MethodSettingsDefinition,
  D5993: D5993_SETTINGS as unknown as MethodSettingsDefinition,
  D2216: D2216_SETTINGS as unknown as MethodSettingsDefinition,
  D6768: D6768_SETTINGS as unknown as MethodSettingsDefinition,
  D6496: D6496_SETTINGS as unknown as MethodSettingsDefinition,
});

/** The settings definition of a method, or null when the method has no adjustable settings. */
export function methodSettingsDefinition(methodCode: string): MethodSettingsDefinition | null {
  return METHOD_SETTINGS[methodCode] ?? null;
}

import { z } from "zod";
import type { MethodSettingsDefinition } from "../methods/settings-definition";
import { reasonSchema, versionSchema } from "./common";

/**
 * A change of a method's settings: the values as the form sends them, checked by the method's own schema
 * (lib/methods), the version the person started from (a change made meanwhile is refused), and the reason.
 */
export function methodSettingsChangeSchema(definition: MethodSettingsDefinition) {
  return z.object({
    methodCode: z.literal(definition.methodCode),
    basedOnVersion: versionSchema,
    reason: reasonSchema,
    values: definition.schema,
  });
}

/** Before the method is known: the code and the rest as sent. */
export const methodSettingsChangeEnvelope = z.object({ methodCode: z.string().min(1), values: z.record(z.string(), z.unknown()) }).passthrough();

import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import { methodSettingsChangeEnvelope, methodSettingsChangeSchema } from "@/lib/validation/methods";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * The lab administrator changes a method's settings: a new version with the reason, never an edit of the
 * old one (a database trigger refuses that), so every result keeps naming the version it was judged by.
 * Runs already assigned keep their version; new runs take the new one.
 */
export async function createMethodSettingsVersion(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "method.manage");
  const envelope = parseOrThrow(methodSettingsChangeEnvelope, options.input);
  const definition = methodSettingsDefinition(envelope.methodCode);
  if (!definition) throw new AppError("NOT_FOUND", `ASTM ${envelope.methodCode} has no adjustable settings.`);
  const input = parseOrThrow(methodSettingsChangeSchema(definition), options.input);
  return withActor(options.actor, async (tx) => {
    await tx.$queryRaw`SELECT code FROM "TestMethod" WHERE code = ${definition.methodCode} FOR UPDATE`;
    const latest = await tx.methodSettingsVersion.findFirst({ where: { methodCode: definition.methodCode }, orderBy: { version: "desc" } });
    const latestVersion = latest?.version ?? 0;
    if (latestVersion !== input.basedOnVersion)
      throw new AppError("CONFLICT", `Version ${latestVersion} of the ASTM ${definition.methodCode} settings was saved since you opened version ${input.basedOnVersion}; reload and make your change again.`);
    if (latest && JSON.stringify(readStoredSettings(definition, latest.settings)) === JSON.stringify(input.values))
      throw new AppError("INVALID_INPUT", "These are the settings of the current version; change a value, or leave the settings as they are.", { fieldErrors: { form: "Nothing changed." } });
    return tx.methodSettingsVersion.create({
      data: { methodCode: definition.methodCode, version: latestVersion + 1, settings: input.values as object, reason: input.reason, createdById: options.actor.id },
      select: { id: true, methodCode: true, version: true },
    });
  });
}

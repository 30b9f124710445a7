import "server-only";
import { METHOD_SETTINGS } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/**
 * Every method with adjustable settings: its title, its versions newest first (settings as read by the
 * current definition, who made each and why), and the definition with each default's source. A method of
 * the registry without a TestMethod row yet is left out.
 */
export async function listMethodSettings(options: { actor: CurrentUser; methodCode?: string }) {
  requirePermission(options.actor, "run.view");
  const codes = Object.keys(METHOD_SETTINGS).filter((c) => !options.methodCode || c === options.methodCode);
  const methods = await getDb().testMethod.findMany({
    where: { code: { in: codes } },
    orderBy: { code: "asc" },
    select: {
      code: true, title: true,
      settingsVersions: { orderBy: { version: "desc" }, select: { id: true, version: true, settings: true, reason: true, createdAt: true, createdBy: { select: { name: true } } } },
    },
  });
  return methods.map((m) => {
    const definition = METHOD_SETTINGS[m.code]!;
    return {
      code: m.code,
      title: m.title,
      definition,
      versions: m.settingsVersions.map((v) => ({ ...v, settings: readStoredSettings(definition, v.settings) })),
    };
  });
}
export type MethodSettingsListing = Awaited<ReturnType<typeof listMethodSettings>>[number];

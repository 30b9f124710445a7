import "server-only";
import type { SettingsInUse } from "@/lib/evaluation/run-evaluation-context";
import type { HydraulicSettings } from "@/lib/methods/hydraulic/hydraulic-settings";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import type { Db } from "../db/client";
import type { Tx } from "../db/transaction";

type Source = Pick<Db, "methodSettingsVersion"> | Tx;

/** "ASTM D5887 settings, version 2" */
export const settingsLabel = (methodCode: string, version: number | null) => (version === null ? `ASTM ${methodCode} default settings` : `ASTM ${methodCode} settings, version ${version}`);

/** The version of a method's settings in force at a moment: the latest created by then, else the first. */
export async function findSettingsVersionInForce(db: Source, methodCode: string, at: Date) {
  return (
    (await db.methodSettingsVersion.findFirst({ where: { methodCode, createdAt: { lte: at } }, orderBy: { version: "desc" } })) ??
    (await db.methodSettingsVersion.findFirst({ where: { methodCode }, orderBy: { version: "asc" } }))
  );
}

/**
 * The settings a run is judged by: the version recorded on the run (in force when it was assigned, or
 * chosen by QA with a reason), else the version in force at its assignment; the method's defaults only
 * when no version exists at all.
 */
export async function loadSettingsInUse(
  db: Source,
  run: { methodCode: string; assignedAt: Date; methodSettingsVersionId: string | null; settingsChoiceReason: string | null; settingsChosenBy: { name: string } | null },
): Promise<SettingsInUse> {
  const definition = methodSettingsDefinition(run.methodCode);
  if (!definition) throw new Error(`ASTM ${run.methodCode} has no settings definition in lib/methods.`);
  const version = run.methodSettingsVersionId
    ? await db.methodSettingsVersion.findUnique({ where: { id: run.methodSettingsVersionId } })
    : await findSettingsVersionInForce(db, run.methodCode, run.assignedAt);
  const values = readStoredSettings(definition, version?.settings ?? {}) as HydraulicSettings;
  return {
    versionId: version?.id ?? null,
    methodCode: run.methodCode,
    version: version?.version ?? null,
    label: settingsLabel(run.methodCode, version?.version ?? null),
    chosen: run.settingsChosenBy && run.settingsChoiceReason ? { by: run.settingsChosenBy.name, reason: run.settingsChoiceReason } : null,
    values,
  };
}

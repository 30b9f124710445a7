// The demo lab's own method settings: version 2 of each method adds its uncertainty values for what no
// instrument covers (demo data; a real lab states its own on the method settings screen).
import { METHOD_SETTINGS } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import type { Tx } from "@/lib/server/db/transaction";
import { DEMO_LAB_DECLARED_UNCERTAINTIES as U } from "./demo-uncertainties";

/** `createdAt`: when the lab set these versions (the demo dates them before its first shipment). */
export async function seedDemoMethodSettings(tx: Tx, adminId: string, createdAt: Date): Promise<Record<string, string>> {
  const ids: Record<string, string> = {};
  for (const [code, definition] of Object.entries(METHOD_SETTINGS)) {
    if (definition.family !== "hydraulic") continue;
    const first = await tx.methodSettingsVersion.findFirst({ where: { methodCode: code }, orderBy: { version: "desc" } });
    const settings = { ...readStoredSettings(definition, first?.settings ?? {}), uDieDiameterMm: U.diameterMm, uThicknessMm: U.thicknessMm, uTimeS: U.timeS };
    const created = await tx.methodSettingsVersion.create({
      data: { methodCode: code, version: (first?.version ?? 0) + 1, settings, reason: "The lab's standard uncertainties for the die diameter, the post-test thickness and time stamps (±0.1 mm and ±1 s, read as rectangular)", createdById: adminId, createdAt },
    });
    ids[code] = created.id;
  }
  return ids;
}

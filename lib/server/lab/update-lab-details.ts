import "server-only";
import { labDetailsSchema } from "@/lib/validation/lab-details";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { withActor } from "../db/transaction";
import { parseOrThrow } from "../validation/parse";

/**
 * The administrator sets the lab's name, address, accreditation number and time zone, as its documents
 * print them. Issued certificates keep what they said (their snapshot); new documents use the new details.
 */
export async function updateLabDetails(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "lab.configure");
  const input = parseOrThrow(labDetailsSchema, options.input);
  const data = { name: input.name, address: input.address, accreditation: input.accreditation ?? null, timeZone: input.timeZone };
  return withActor(options.actor, (tx) =>
    tx.laboratory.upsert({ where: { id: "lab" }, create: { id: "lab", ...data }, update: data, select: { name: true, timeZone: true } }),
  );
}

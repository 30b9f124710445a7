import "server-only";
import { AppError, type FieldErrors } from "@/lib/errors/app-error";
import { Prisma } from "@/lib/generated/prisma/client";
import { logShipmentSchema } from "@/lib/validation/intake";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { allocateLabNumber } from "../db/allocate-lab-number";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";
import { recordNewItemEvent } from "../custody/record-new-item-event";
import { parseOrThrow } from "../validation/parse";

/**
 * The clerk logs a shipment and all its rolls in one transaction: every roll is saved, or none is.
 * A roll number already logged for the same project (or twice in the batch) is refused per row, with
 * the existing roll's lab number so the form can link to it.
 */
export async function logShipment(options: { actor: CurrentUser; input: unknown }) {
  requirePermission(options.actor, "shipment.create");
  const input = parseOrThrow(logShipmentSchema, options.input);
  const db = getDb();

  const [project, location] = await Promise.all([
    db.project.findUnique({ where: { id: input.projectId }, select: { id: true, clientOrganizationId: true, active: true, clientOrganization: { select: { active: true } } } }),
    db.storageLocation.findUnique({ where: { id: input.storageLocationId }, select: { id: true, active: true } }),
  ]);
  const fieldErrors: FieldErrors = {};
  if (!project || project.clientOrganizationId !== input.clientOrganizationId) fieldErrors.projectId = "Choose a project of this client.";
  else if (!project.active || !project.clientOrganization.active) fieldErrors.projectId = "This project (or its client) is deactivated; choose an active one, or ask the lab administrator.";
  if (!location?.active) fieldErrors.storageLocationId = "Choose a storage location in use.";
  const existing = await db.roll.findMany({
    where: { projectId: input.projectId, rollNumber: { in: input.rolls.map((r) => r.rollNumber) } },
    select: { rollNumber: true, labNumber: true },
  });
  const existingByNumber = new Map(existing.map((r) => [r.rollNumber, r.labNumber]));
  const duplicates: Array<{ row: number; rollNumber: string; labNumber: string }> = [];
  const seen = new Map<string, number>();
  input.rolls.forEach((roll, index) => {
    const already = existingByNumber.get(roll.rollNumber);
    if (already) {
      fieldErrors[`rolls.${index}.rollNumber`] = `Roll ${roll.rollNumber} is already logged for this project as ${already}.`;
      duplicates.push({ row: index, rollNumber: roll.rollNumber, labNumber: already });
    } else if (seen.has(roll.rollNumber)) {
      fieldErrors[`rolls.${index}.rollNumber`] = `Roll ${roll.rollNumber} appears twice in this shipment (also row ${seen.get(roll.rollNumber)! + 1}).`;
    }
    seen.set(roll.rollNumber, index);
  });
  if (Object.keys(fieldErrors).length > 0)
    throw new AppError("INVALID_INPUT", duplicates.length ? "Some rolls are already logged; nothing was saved." : undefined, { fieldErrors, details: { duplicates } });

  try {
    return await withActor(options.actor, async (tx) => {
      const shipment = await tx.shipment.create({
        data: {
          labNumber: await allocateLabNumber(tx, "shipment", input.receivedAt),
          clientOrganizationId: input.clientOrganizationId,
          projectId: input.projectId,
          deliveredBy: input.deliveredBy,
          receivedAt: input.receivedAt,
          receivedById: options.actor.id,
          conditionNotes: input.conditionNotes,
        },
        select: { id: true, labNumber: true },
      });
      const rolls: Array<{ id: string; labNumber: string; rollNumber: string }> = [];
      for (const entry of input.rolls) {
        const roll = await tx.roll.create({
          data: { ...entry, labNumber: await allocateLabNumber(tx, "roll", input.receivedAt), shipmentId: shipment.id, projectId: input.projectId, state: "STORED", storageLocationId: input.storageLocationId },
          select: { id: true, labNumber: true, rollNumber: true },
        });
        await recordNewItemEvent(tx, { actor: options.actor, kind: "roll", id: roll.id, action: "RECEIVED", state: "RECEIVED", locationId: null, at: input.receivedAt, note: `Shipment ${shipment.labNumber}` });
        await tx.custodyEvent.create({
          data: { action: "STORED", rollId: roll.id, fromState: "RECEIVED", toState: "STORED", toLocationId: input.storageLocationId, actorId: options.actor.id, occurredAt: input.receivedAt },
        });
        rolls.push(roll);
      }
      return { ...shipment, rolls };
    }, { timeoutMs: 60_000 });
  } catch (error) {
    // Another clerk logged the same roll number between our check and our insert.
    if (error instanceof Prisma.PrismaClientKnownRequestError && error.code === "P2002")
      throw new AppError("CONFLICT", "A roll number in this shipment was logged by someone else a moment ago; nothing was saved. Reload and check.");
    throw error;
  }
}

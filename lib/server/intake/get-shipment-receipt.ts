import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/**
 * What arrived in one shipment and in what condition, for the receipt acknowledgement, with every
 * correction made to it since (the receipt then reads "amended"). Staff need shipment.view; a client user
 * sees only their own organisation's shipments (others are not found).
 */
export async function getShipmentReceipt(options: { actor: CurrentUser; labNumber: string }) {
  const { actor } = options;
  const isClient = actor.role === "CLIENT_USER";
  requirePermission(actor, isClient ? "portal.view" : "shipment.view");
  const shipment = await getDb().shipment.findFirst({
    where: {
      labNumber: options.labNumber.trim().toUpperCase(),
      // A client user without an organisation matches nothing (the database forbids such a user anyway).
      ...(isClient ? { clientOrganizationId: actor.clientOrganizationId ?? "no organisation" } : {}),
    },
    select: {
      id: true,
      labNumber: true,
      receivedAt: true,
      deliveredBy: true,
      conditionNotes: true,
      acknowledgedAt: true,
      receivedBy: { select: { name: true } },
      acknowledgedBy: { select: { name: true } },
      clientOrganization: { select: { code: true, name: true } },
      project: { select: { code: true, name: true, siteName: true, siteLocation: true } },
      rolls: {
        orderBy: { labNumber: "asc" },
        select: {
          id: true, labNumber: true, rollNumber: true, lotNumber: true, product: true, manufacturer: true,
          sampleLengthMm: true, sampleWidthMm: true, machineDirectionMarked: true, conditionNotes: true,
        },
      },
    },
  });
  if (!shipment) throw new AppError("NOT_FOUND", `No shipment ${options.labNumber} that you may see.`);
  const rollNumbers = new Map(shipment.rolls.map((r) => [r.id, r.labNumber]));
  const corrections = await getDb().correction.findMany({
    where: { OR: [{ entity: "Shipment", entityId: shipment.id }, { entity: "Roll", entityId: { in: [...rollNumbers.keys()] } }] },
    orderBy: { createdAt: "asc" },
    select: { entity: true, entityId: true, field: true, oldValue: true, newValue: true, reason: true, createdAt: true, actor: { select: { name: true } } },
  });
  return {
    ...shipment,
    corrections: corrections.map(({ entity, entityId, ...c }) => ({ ...c, item: entity === "Roll" ? `roll ${rollNumbers.get(entityId) ?? ""}` : "shipment" })),
  };
}

export type ShipmentReceipt = Awaited<ReturnType<typeof getShipmentReceipt>>;

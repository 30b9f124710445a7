import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/**
 * What arrived in one shipment and in what condition, for the receipt acknowledgement. Staff need
 * shipment.view; a client user sees only their own organisation's shipments (others are not found).
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
          labNumber: true, rollNumber: true, lotNumber: true, product: true, manufacturer: true,
          sampleLengthMm: true, sampleWidthMm: true, machineDirectionMarked: true,
        },
      },
    },
  });
  if (!shipment) throw new AppError("NOT_FOUND", `No shipment ${options.labNumber} that you may see.`);
  return shipment;
}

export type ShipmentReceipt = Awaited<ReturnType<typeof getShipmentReceipt>>;

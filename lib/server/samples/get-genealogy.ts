import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

const place = { select: { code: true } } as const;

/** A shipment and everything cut from it: rolls, their coupons, and the coupons' specimens, with state and place. */
export async function getGenealogy(options: { actor: CurrentUser; shipmentLabNumber: string }) {
  requirePermission(options.actor, "sample.view");
  const shipment = await getDb().shipment.findUnique({
    where: { labNumber: options.shipmentLabNumber },
    select: {
      labNumber: true, receivedAt: true, acknowledgedAt: true,
      clientOrganization: { select: { name: true } }, project: { select: { name: true } },
      rolls: {
        orderBy: { labNumber: "asc" },
        select: {
          id: true, labNumber: true, rollNumber: true, state: true, storageLocation: place,
          coupons: {
            orderBy: { labNumber: "asc" },
            select: {
              id: true, labNumber: true, positionInSample: true, state: true, storageLocation: place,
              specimens: { orderBy: { labNumber: "asc" }, select: { id: true, labNumber: true, intendedMethodCode: true, state: true, storageLocation: place } },
            },
          },
        },
      },
    },
  });
  if (!shipment) throw new AppError("NOT_FOUND");
  return shipment;
}

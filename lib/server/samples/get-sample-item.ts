import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

const place = { select: { id: true, code: true, name: true } } as const;

/** A roll with its shipment, project and coupons, by lab number. */
export async function getRoll(options: { actor: CurrentUser; labNumber: string }) {
  requirePermission(options.actor, "sample.view");
  const roll = await getDb().roll.findUnique({
    where: { labNumber: options.labNumber },
    include: {
      shipment: { select: { labNumber: true, receivedAt: true, acknowledgedAt: true, conditionNotes: true } },
      project: { select: { name: true, code: true, clientOrganization: { select: { name: true } } } },
      storageLocation: place,
      coupons: { orderBy: { labNumber: "asc" }, select: { id: true, labNumber: true, positionInSample: true, state: true, cutAt: true, intendedMethodCode: true, _count: { select: { specimens: true } } } },
    },
  });
  if (!roll) throw new AppError("NOT_FOUND");
  return roll;
}

/** A coupon with its roll and specimens, by lab number. */
export async function getCoupon(options: { actor: CurrentUser; labNumber: string }) {
  requirePermission(options.actor, "sample.view");
  const coupon = await getDb().coupon.findUnique({
    where: { labNumber: options.labNumber },
    include: {
      roll: { select: { labNumber: true, rollNumber: true, project: { select: { name: true } } } },
      cutBy: { select: { name: true } },
      storageLocation: place,
      specimens: { orderBy: { labNumber: "asc" }, select: { id: true, labNumber: true, intendedMethodCode: true, state: true, preparedAt: true } },
      indexTests: { orderBy: { testedAt: "asc" }, select: { id: true, methodCode: true, state: true, testedAt: true } },
    },
  });
  if (!coupon) throw new AppError("NOT_FOUND");
  return coupon;
}

/** A specimen with its coupon, roll and preparation checklist, by lab number. */
export async function getSpecimen(options: { actor: CurrentUser; labNumber: string }) {
  requirePermission(options.actor, "sample.view");
  const specimen = await getDb().specimen.findUnique({
    where: { labNumber: options.labNumber },
    include: {
      coupon: { select: { labNumber: true, roll: { select: { labNumber: true, rollNumber: true, project: { select: { name: true } } } } } },
      preparedBy: { select: { name: true } },
      storageLocation: place,
      checklist: { orderBy: { itemKey: "asc" } },
      runs: { select: { labNumber: true, state: true, methodCode: true } },
    },
  });
  if (!specimen) throw new AppError("NOT_FOUND");
  return specimen;
}

/** A shipment with its rolls, by lab number. */
export async function getShipment(options: { actor: CurrentUser; labNumber: string }) {
  requirePermission(options.actor, "shipment.view");
  const shipment = await getDb().shipment.findUnique({
    where: { labNumber: options.labNumber },
    include: {
      clientOrganization: { select: { name: true } },
      project: { select: { name: true, siteName: true } },
      receivedBy: { select: { name: true } },
      acknowledgedBy: { select: { name: true } },
      rolls: { orderBy: { labNumber: "asc" }, select: { id: true, labNumber: true, rollNumber: true, lotNumber: true, product: true, manufacturer: true, sampleLengthMm: true, sampleWidthMm: true, machineDirectionMarked: true, conditionNotes: true, state: true, version: true } },
    },
  });
  if (!shipment) throw new AppError("NOT_FOUND");
  const corrections = await getDb().correction.findMany({
    where: { OR: [{ entity: "Shipment", entityId: shipment.id }, { entity: "Roll", entityId: { in: shipment.rolls.map((r) => r.id) } }] },
    orderBy: { createdAt: "asc" },
    select: { id: true, entity: true, entityId: true, field: true, oldValue: true, newValue: true, reason: true, createdAt: true, actor: { select: { name: true } } },
  });
  return { ...shipment, corrections };
}

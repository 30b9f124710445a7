import "server-only";
import { calibrationStatus } from "@/lib/equipment/calibration-status";
import { AppError } from "@/lib/errors/app-error";
import { INDEX_METHODS, type IndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";
import { findSettingsVersionInForce } from "../methods/settings-in-use";

/**
 * What the entry form of an index test on a roll offers: the roll, its coupons that can take the test (and
 * the one cut for it, chosen beforehand), the instruments of each kind the method uses that are usable now
 * (in calibration, or allowed by a QA override), and the method's settings in force with their version.
 */
export async function getIndexTestEntry(options: { actor: CurrentUser; rollLabNumber: string; methodCode: IndexMethodCode; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const now = options.now ?? new Date();
  const db = getDb();
  const method = INDEX_METHODS[options.methodCode];
  const roll = await db.roll.findUnique({
    where: { labNumber: options.rollLabNumber.trim() },
    select: {
      id: true, labNumber: true, rollNumber: true, lotNumber: true, project: { select: { name: true } },
      coupons: { where: { state: { in: ["CUT", "TESTED"] } }, orderBy: { labNumber: "asc" }, select: { id: true, labNumber: true, intendedMethodCode: true, positionInSample: true, state: true } },
      indexTests: { where: { methodCode: options.methodCode, state: "RETURNED", correctedBy: null }, orderBy: { testedAt: "desc" }, take: 1, select: { id: true } },
    },
  });
  if (!roll) throw new AppError("NOT_FOUND", "That roll does not exist.");
  const equipment = await db.equipment.findMany({
    where: { kind: { in: method.instruments.map((i) => i.kind) as never }, status: "IN_SERVICE" },
    orderBy: { assetTag: "asc" },
    select: {
      id: true, assetTag: true, name: true, kind: true, status: true,
      calibrations: { orderBy: { calibratedAt: "desc" }, take: 3, select: { calibratedAt: true, dueAt: true, passed: true } },
      calibrationOverrides: { where: { validUntil: { gt: now } }, take: 1, select: { id: true } },
    },
  });
  const usable = equipment.filter((e) => calibrationStatus({ assetTag: e.assetTag, inService: true, calibrations: e.calibrations, now }).usable || e.calibrationOverrides.length > 0);
  const instruments = Object.fromEntries(method.instruments.map((i) => [i.key, usable.filter((e) => e.kind === i.kind).map((e) => ({ id: e.id, label: `${e.assetTag} · ${e.name}` }))]));
  const coupons = roll.coupons
    .filter((c) => !method.needsCoupon || c.intendedMethodCode === options.methodCode)
    .map((c) => ({ id: c.id, label: `${c.labNumber} · ${c.positionInSample}` }));
  // Only a coupon cut for this very test is chosen for the person; one cut for something else (hydraulic
  // specimens, another index test) is offered but left for them to choose.
  const cutForIt = roll.coupons.filter((c) => c.intendedMethodCode === options.methodCode);
  const defaultCouponId = (cutForIt.find((c) => c.state === "CUT") ?? cutForIt[0])?.id ?? "";
  const definition = methodSettingsDefinition(options.methodCode)!;
  const version = await findSettingsVersionInForce(db, options.methodCode, now);
  return { roll, method, coupons, defaultCouponId, instruments, settings: readStoredSettings(definition, version?.settings ?? {}), settingsVersion: version?.version ?? null, returnedId: roll.indexTests[0]?.id ?? null };
}

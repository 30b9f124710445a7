import "server-only";
import { AppError } from "@/lib/errors/app-error";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

/** One index test with its observations, results, instruments (and their calibrations), reviews and roll. */
export async function getIndexTest(options: { actor: CurrentUser; id: string }) {
  requirePermission(options.actor, "run.view");
  const test = await getDb().indexTest.findUnique({
    where: { id: options.id },
    select: {
      id: true, methodCode: true, property: true, value: true, unit: true, testedAt: true, state: true, version: true, observations: true, evaluation: true,
      performedById: true, performedBy: { select: { name: true } }, approvedBy: { select: { name: true } }, approvedAt: true, correctsId: true,
      correctedBy: { select: { id: true } },
      methodSettingsVersion: { select: { version: true, settings: true } },
      roll: { select: { id: true, labNumber: true, rollNumber: true, lotNumber: true, project: { select: { code: true, name: true } } } },
      coupon: { select: { labNumber: true } },
      results: { select: { property: true, value: true, unit: true, standardDeviation: true, specimenCount: true, expandedUncertainty: true, coverageFactor: true } },
      equipment: { select: { role: true, equipment: { select: { assetTag: true, name: true } }, calibration: { select: { reference: true, dueAt: true } } } },
      reviews: { orderBy: { createdAt: "asc" }, select: { decision: true, comments: true, createdAt: true, reviewer: { select: { name: true } } } },
    },
  });
  if (!test) throw new AppError("NOT_FOUND", "That index test does not exist.");
  return test;
}
export type IndexTestRecord = Awaited<ReturnType<typeof getIndexTest>>;

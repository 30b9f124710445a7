import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { evaluateIndexTest, type IndexObservations } from "@/lib/index-tests/evaluate-index-test";
import { INDEX_METHODS, type IndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { methodSettingsDefinition } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import { indexTestEnvelope, recordIndexTestSchema } from "@/lib/validation/index-tests";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { requireEventOrder } from "../custody/require-event-order";
import { withActor } from "../db/transaction";
import { findEquipmentStatuses } from "../equipment/find-usable-equipment";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { findSettingsVersionInForce } from "../methods/settings-in-use";
import { parseOrThrow } from "../validation/parse";

/**
 * The technician records an index test on a roll: its raw observations, the instruments it used (each in
 * calibration, or allowed by a QA manager's override), the coupon it was done on. The results are computed
 * by lib/index-tests with the method settings in force when the test was done, and the test goes to QA
 * review. A coupon cut for it is marked tested in its custody ledger.
 */
export async function recordIndexTest(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const { methodCode } = parseOrThrow(indexTestEnvelope, options.input) as { methodCode: IndexMethodCode };
  const now = options.now ?? new Date();
  const definition = methodSettingsDefinition(methodCode)!;
  const method = INDEX_METHODS[methodCode];
  return withActor(options.actor, async (tx) => {
    // The settings in force now judge the form; the version in force at the test's time is the one recorded.
    const current = await findSettingsVersionInForce(tx, methodCode, now);
    const input = parseOrThrow(recordIndexTestSchema(methodCode, readStoredSettings(definition, current?.settings ?? {})), options.input);
    const version = await findSettingsVersionInForce(tx, methodCode, input.testedAt);
    const settings = readStoredSettings(definition, version?.settings ?? {}) as Record<string, unknown> & { expandedUncertainty: number | null; coverageFactor: number };

    const roll = await tx.roll.findUnique({ where: { id: input.rollId }, select: { id: true, labNumber: true, shipment: { select: { receivedAt: true, labNumber: true } } } });
    if (!roll) throw new AppError("NOT_FOUND", "That roll does not exist.");
    const after = [{ at: roll.shipment.receivedAt, what: `roll ${roll.labNumber} was received with shipment ${roll.shipment.labNumber}` }];
    let coupon: { id: string; labNumber: string; state: string; cutAt: Date } | null = null;
    if (input.couponId) {
      coupon = await tx.coupon.findFirst({ where: { id: input.couponId, rollId: roll.id }, select: { id: true, labNumber: true, state: true, cutAt: true } });
      if (!coupon) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { couponId: `Choose a coupon cut from roll ${roll.labNumber}.` } });
      if (coupon.state === "DISPOSED") throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { couponId: `Coupon ${coupon.labNumber} was disposed of.` } });
      after.push({ at: coupon.cutAt, what: `coupon ${coupon.labNumber} was cut` });
    }
    requireEventOrder("testedAt", { label: "The test time", at: input.testedAt, now, zone: await readLabTimeZone(tx), after });

    const instruments = method.instruments.map((role) => ({ role, id: (input.instruments as Record<string, string>)[role.key]! }));
    const statuses = await findEquipmentStatuses({ ids: instruments.map((i) => i.id), now, tx });
    const refusals: string[] = [];
    for (const { role, id } of instruments) {
      const status = statuses.get(id);
      if (!status || status.kind !== role.kind) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { [`instruments.${role.key}`]: `Not a ${role.label.toLowerCase()}.` } });
      if (status.status.usable) continue;
      const granted = status.status.state === "out-of-service" ? null : await tx.calibrationOverride.findFirst({ where: { equipmentId: id, validUntil: { gt: now } } });
      if (!granted) refusals.push(status.status.message);
    }
    if (refusals.length > 0)
      throw new AppError("ILLEGAL_TRANSITION", `This equipment cannot be used for a test: ${refusals.join(" ")} Use calibrated equipment, or ask a QA manager to allow it with a reason.`);

    if (input.correctsId) {
      const redone = await tx.indexTest.findFirst({ where: { id: input.correctsId, rollId: roll.id, methodCode, state: "RETURNED" }, select: { id: true, correctedBy: { select: { id: true } } } });
      if (!redone || redone.correctedBy) throw new AppError("CONFLICT", "Only a test QA returned, and not already redone, can be redone.");
    }

    const evaluation = evaluateIndexTest(input.observations as unknown as IndexObservations, settings);
    const main = evaluation.results[0]!;
    const test = await tx.indexTest.create({
      data: {
        rollId: roll.id, couponId: coupon?.id ?? null, property: main.property, methodCode, value: main.value, unit: main.unit, testedAt: input.testedAt,
        performedById: options.actor.id, observations: input.observations as object, evaluation: { ...evaluation, settingsVersion: version?.version ?? null },
        methodSettingsVersionId: version?.id ?? null, correctsId: input.correctsId ?? null,
        results: { create: evaluation.results.map((r) => ({ property: r.property, value: r.value, unit: r.unit, standardDeviation: r.standardDeviation, specimenCount: r.specimenCount, expandedUncertainty: r.expandedUncertainty, coverageFactor: r.coverageFactor })) },
        equipment: { create: instruments.map(({ role, id }) => ({ equipmentId: id, role: role.label.toLowerCase(), calibrationId: statuses.get(id)!.latestCalibrationId })) },
      },
      select: { id: true },
    });
    if (coupon && coupon.state !== "TESTED")
      await applyCustodyAction(tx, { actor: options.actor, kind: "coupon", id: coupon.id, action: "TESTED", at: input.testedAt, note: `${method.title} on roll ${roll.labNumber}` });
    return { id: test.id, rollLabNumber: roll.labNumber };
  });
}

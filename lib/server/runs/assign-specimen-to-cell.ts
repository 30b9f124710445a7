import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { enteredPressureToPa } from "@/lib/units/pressure-entry";
import { readBuretteAreasM2 } from "@/lib/validation/equipment";
import { assignSpecimenSchema } from "@/lib/validation/runs";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { allocateLabNumber } from "../db/allocate-lab-number";
import { withActor } from "../db/transaction";
import { applyCustodyAction } from "../custody/apply-custody-action";
import { requireEventOrder } from "../custody/require-event-order";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { findEquipmentStatuses } from "../equipment/find-usable-equipment";
import { findSettingsVersionInForce } from "../methods/settings-in-use";
import { parseOrThrow } from "../validation/parse";
import { ACTIVE_RUN_STATES, explainRunCollision } from "./run-collision";

/**
 * The technician mounts a prepared specimen in a free cell: the run starts, with the instruments it uses
 * and the calibration each was under. Equipment that is due or out of calibration is refused unless a
 * QA manager has granted an override for it, which the run then records. The mount time is the one the
 * technician enters: not before the specimen was prepared, not in the future.
 */
export async function assignSpecimenToCell(options: { actor: CurrentUser; input: unknown; now?: Date }) {
  requirePermission(options.actor, "run.operate");
  const input = parseOrThrow(assignSpecimenSchema, options.input);
  const now = options.now ?? new Date();
  // The database keeps one active run per cell and per specimen; the checks below give the usual sentence,
  // the unique indexes decide a race between two people starting runs at the same moment.
  return withActor(options.actor, async (tx) => {
    const specimen = await tx.specimen.findUnique({ where: { id: input.specimenId }, select: { labNumber: true, preparedAt: true } });
    if (!specimen) throw new AppError("INVALID_INPUT", undefined, { fieldErrors: { specimenId: "Choose a prepared specimen." } });
    requireEventOrder("mountedAt", {
      label: "The mount time", at: input.mountedAt, now, zone: await readLabTimeZone(tx),
      after: [{ at: specimen.preparedAt, what: `specimen ${specimen.labNumber} was prepared` }],
    });
    const roles: Array<[id: string | undefined, role: string, kind: string, field: string]> = [
      [input.cellId, "permeameter cell", "PERMEAMETER_CELL", "cellId"],
      [input.burettePanelId, "burette panel", "BURETTE_PANEL", "burettePanelId"],
      [input.transducerId, "pressure transducer", "PRESSURE_TRANSDUCER", "transducerId"],
      [input.thermometerId, "thermometer", "THERMOMETER", "thermometerId"],
      [input.thicknessGaugeId, "thickness gauge", "THICKNESS_GAUGE", "thicknessGaugeId"],
      [input.timerId, "timer", "TIMER", "timerId"],
    ];
    const used = roles.filter((r): r is [string, string, string, string] => !!r[0]);
    const statuses = await findEquipmentStatuses({ ids: used.map((r) => r[0]), now, tx });

    const refusals: string[] = [];
    let override: { reason: string; grantedById: string } | null = null;
    for (const [id, role, kind, field] of used) {
      const status = statuses.get(id);
      if (!status || status.kind !== kind) throw new AppError("INVALID_INPUT", `Choose a ${role}.`, { fieldErrors: { [field]: `Not a ${role}.` } });
      if (status.status.usable) continue;
      const granted = status.status.state === "out-of-service" ? null : await tx.calibrationOverride.findFirst({ where: { equipmentId: id, validUntil: { gt: now } }, orderBy: { createdAt: "desc" } });
      if (granted) override = { reason: `${status.assetTag}: ${granted.reason}`, grantedById: granted.grantedById };
      else refusals.push(status.status.message);
    }
    if (refusals.length > 0)
      throw new AppError("ILLEGAL_TRANSITION", `This equipment cannot be used for a new run: ${refusals.join(" ")} Use calibrated equipment, or ask a QA manager to allow it with a reason.`);

    const busy = await tx.run.findFirst({ where: { cellId: input.cellId, state: { in: ACTIVE_RUN_STATES } }, select: { labNumber: true } });
    if (busy) throw new AppError("CONFLICT", `That cell is holding run ${busy.labNumber}; choose a free cell.`, { fieldErrors: { cellId: "Not free." } });
    const burette = statuses.get(input.burettePanelId)!;
    if (!readBuretteAreasM2(burette.latestValues))
      throw new AppError("INVALID_INPUT", `${burette.assetTag} has no calibrated burette areas; record its calibration first.`, { fieldErrors: { burettePanelId: "No burette areas." } });

    const labNumber = await allocateLabNumber(tx, "run", now);
    // The run is judged by the method settings in force when the specimen was mounted, whatever later versions say.
    const settingsVersion = await findSettingsVersionInForce(tx, input.methodCode, input.mountedAt);
    await applyCustodyAction(tx, { actor: options.actor, kind: "specimen", id: input.specimenId, action: "ASSIGNED", at: input.mountedAt, note: `Run ${labNumber} in ${statuses.get(input.cellId)!.assetTag}` });
    const run = await tx.run.create({
      data: {
        labNumber, specimenId: input.specimenId, cellId: input.cellId, methodCode: input.methodCode, performedById: options.actor.id, assignedAt: input.mountedAt,
        effectiveStressPa: input.effectiveStress === undefined ? null : enteredPressureToPa(input.effectiveStress, input.pressureUnit),
        permeantName: input.permeantName || null, permeantSalt: input.permeantSalt || null, permeantMolarityMolPerL: input.permeantMolarityMolPerL ?? null,
        permeantEcMsPerM: input.permeantEcMsPerM ?? null, permeantPh: input.permeantPh ?? null,
        calibrationOverrideReason: override?.reason ?? null, calibrationOverrideById: override?.grantedById ?? null,
        methodSettingsVersionId: settingsVersion?.id ?? null,
        equipment: { create: used.map(([id, role]) => ({ equipmentId: id, role, calibrationId: statuses.get(id)!.latestCalibrationId })) },
      },
      select: { id: true, labNumber: true },
    });
    return run;
  }).catch(async (error: unknown) => {
    throw (await explainRunCollision(error, input)) ?? error;
  });
}

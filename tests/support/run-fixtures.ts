import { METHOD_SETTINGS } from "@/lib/methods/registry";
import { readStoredSettings } from "@/lib/methods/settings-definition";
import { withActor } from "@/lib/server/db/transaction";
import { db, makeProject, unique } from "./factories";

const SYSTEM = { id: "system:test-factory" };
const DAY = 86_400_000;

/** Invented standard uncertainties (k = 1) of the test instruments and the lab's values, in the units named. */
export const TEST_UNCERTAINTIES = { volumeMl: 0.03, pressureKPa: 0.1, temperatureC: 0.1, thicknessMm: 0.05, timeS: 0.6, diameterMm: 0.06 } as const;

/**
 * A new version of a method's settings (the current one with `overrides`), as a lab administrator would
 * save it; tests pin their runs to it so that other tests' versions do not matter.
 */
export async function makeSettingsVersion(methodCode: "D5887" | "D5084" | "D6766", overrides: Record<string, unknown> = {}) {
  const definition = METHOD_SETTINGS[methodCode]!;
  return withActor(SYSTEM, async (tx) => {
    const latest = await tx.methodSettingsVersion.findFirst({ where: { methodCode }, orderBy: { version: "desc" } });
    const settings = { ...readStoredSettings(definition, latest?.settings ?? {}), ...overrides };
    return tx.methodSettingsVersion.create({ data: { methodCode, version: (latest?.version ?? 0) + 1, settings: settings as object, reason: "Test settings" } });
  });
}

/**
 * A permeating run of `methodCode` whose permeation began `startedDaysAgo` days ago, with every measuring
 * instrument calibrated with a standard uncertainty (burette panel 31.4 / 31.2 mm², outflow zero `outflowZeroMm`
 * above the datum, scale 0 to 500 mm), a cell with a leakage check of `leakageRateM3PerS`, and the run pinned
 * to a settings version carrying the lab's die-diameter uncertainty. All invented.
 */
export async function makePermeatingRun(technicianId: string, options: { methodCode?: "D5887" | "D5084" | "D6766"; startedDaysAgo?: number; outflowZeroMm?: number; leakageRateM3PerS?: number; specimen?: Record<string, number>; projectId?: string } = {}) {
  const methodCode = options.methodCode ?? "D5887";
  const project = options.projectId ? await db().project.findUniqueOrThrow({ where: { id: options.projectId } }) : await makeProject();
  const settings = await makeSettingsVersion(methodCode, { uDieDiameterMm: TEST_UNCERTAINTIES.diameterMm });
  const permeationStartedAt = new Date(Date.now() - (options.startedDaysAgo ?? 4) * DAY);
  const u = TEST_UNCERTAINTIES;
  const run = await withActor(SYSTEM, async (tx) => {
    const shipment = await tx.shipment.create({ data: { labNumber: unique("S"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "x", receivedAt: new Date(), receivedById: technicianId } });
    const roll = await tx.roll.create({ data: { labNumber: unique("R"), shipmentId: shipment.id, projectId: project.id, rollNumber: unique("r"), lotNumber: "L", product: "GCL", manufacturer: "M", state: "UNDER_TEST" } });
    const coupon = await tx.coupon.create({ data: { labNumber: unique("C"), rollId: roll.id, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: technicianId, cutAt: new Date() } });
    const specimen = await tx.specimen.create({ data: { labNumber: unique("P"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 6, initialMassG: 45, intendedMethodCode: methodCode, preparedById: technicianId, preparedAt: new Date(), state: "UNDER_TEST", ...options.specimen } });
    const instrument = async (kind: "PERMEAMETER_CELL" | "BURETTE_PANEL" | "PRESSURE_TRANSDUCER" | "THERMOMETER" | "THICKNESS_GAUGE" | "TIMER", role: string, values: object) => {
      const equipment = await tx.equipment.create({ data: { assetTag: unique(kind.slice(0, 4)).toUpperCase(), kind, name: `Test ${role}`, ratedMaxPressurePa: 1_000_000 } });
      const calibration = await tx.calibration.create({ data: { equipmentId: equipment.id, calibratedAt: new Date(Date.now() - 30 * DAY), dueAt: new Date(Date.now() + 300 * DAY), reference: unique("CAL"), performedBy: "Test metrology", values, recordedById: technicianId } });
      return { equipmentId: equipment.id, calibrationId: calibration.id, role, assetTag: equipment.assetTag, reference: calibration.reference };
    };
    const cell = await instrument("PERMEAMETER_CELL", "permeameter cell", { leakageCheckedAt: new Date(Date.now() - 30 * DAY).toISOString(), leakageMethod: "dummy specimen, 24 h", leakageRateM3PerS: options.leakageRateM3PerS ?? 1e-13 });
    const uses = [
      cell,
      await instrument("BURETTE_PANEL", "burette panel", { inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5, inflowZeroAboveDatumMm: 0, outflowZeroAboveDatumMm: options.outflowZeroMm ?? 40, scaleMinMm: 0, scaleMaxMm: 500, standardUncertainty: u.volumeMl }),
      await instrument("PRESSURE_TRANSDUCER", "pressure transducer", { standardUncertainty: u.pressureKPa }),
      await instrument("THERMOMETER", "thermometer", { standardUncertainty: u.temperatureC }),
      await instrument("THICKNESS_GAUGE", "thickness gauge", { standardUncertainty: u.thicknessMm }),
      await instrument("TIMER", "timer", { standardUncertainty: u.timeS }),
    ];
    const created = await tx.run.create({
      data: {
        labNumber: unique("T"), specimenId: specimen.id, cellId: cell.equipmentId, methodCode, state: "PERMEATING", performedById: technicianId, methodSettingsVersionId: settings.id,
        assignedAt: new Date(permeationStartedAt.getTime() - 3 * DAY),
        equipment: { create: uses.map(({ equipmentId, calibrationId, role }) => ({ equipmentId, calibrationId, role })) },
      },
    });
    await tx.runStage.create({ data: { runId: created.id, sequence: 1, kind: "PERMEATION", cellPressurePa: 550_000, influentPressurePa: 530_000, effluentPressurePa: 516_000, startedAt: permeationStartedAt, recordedById: technicianId } });
    return { ...created, instruments: uses };
  });
  return { run, settings, permeationStartedAt, project };
}

export const readingsOf = (runId: string) => db().reading.findMany({ where: { runId, correctedBy: null }, orderBy: { elapsedS: "asc" } });

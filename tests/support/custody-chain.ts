import { checklistFor } from "@/lib/custody/preparation-checklists";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { logShipment } from "@/lib/server/intake/log-shipment";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { prepareSpecimen } from "@/lib/server/samples/prepare-specimen";
import { db, makeProject, makeStorageLocation, unique } from "./factories";

const DAY = 86_400_000;
export const daysAgo = (days: number) => new Date(Date.now() - days * DAY);

/** What a test roll may say beyond the defaults (lot L1, no delivered size). */
type RollExtras = { lotNumber?: string; deliveredLengthM?: string; deliveredWidthM?: string };

/** A shipment of one roll per entry of `rolls`, for a new project, logged by the clerk through the real operation, received `days` ago. */
export async function logTestShipment(clerk: CurrentUser, days: number, rolls: RollExtras[]) {
  const [project, location] = await Promise.all([makeProject(), makeStorageLocation()]);
  const shipment = await logShipment({
    actor: clerk,
    input: {
      clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Test courier", receivedAt: daysAgo(days).toISOString(),
      conditionNotes: "Wrapped, dry.", storageLocationId: location.id,
      rolls: rolls.map((extras) => ({ rollNumber: unique("R"), lotNumber: "L1", product: "Needle-punched GCL", manufacturer: "Test maker", machineDirectionMarked: "no", ...extras })),
    },
  });
  return { project, shipment, location };
}

/** A shipment of `rolls` rolls logged by the clerk through the real operation, received `days` ago. */
export async function receiveRolls(clerk: CurrentUser, days: number, rolls = 1) {
  const { shipment, location } = await logTestShipment(clerk, days, Array.from({ length: rolls }, () => ({})));
  return { shipment, location, rolls: shipment.rolls };
}

/** The input of a coupon cut from `rollId` at `cutAt`. */
export async function couponInput(rollId: string, locationId: string, cutAt: Date) {
  const roll = await db().roll.findUniqueOrThrow({ where: { id: rollId }, select: { version: true } });
  return { rollId, rollVersion: roll.version, positionInSample: "centre", lengthMm: "300", widthMm: "300", cutAt: cutAt.toISOString(), storageLocationId: locationId };
}

/** The input of a D5887 specimen prepared from `couponId` at `preparedAt`, every checklist item answered yes. */
export function specimenInput(couponId: string, locationId: string, preparedAt: Date) {
  return {
    couponId, dieDiameterMm: "100", initialThicknessMm: "6.8", initialMassG: "46.2", intendedMethodCode: "D5887", preparedAt: preparedAt.toISOString(), storageLocationId: locationId,
    checklist: Object.fromEntries(checklistFor("D5887").map((item) => [item.key, true])),
  };
}

/** A roll received `days.received` ago, cut and prepared at the days given: a specimen ready for a cell. */
export async function makeReadySpecimen(clerk: CurrentUser, technician: CurrentUser, days: { received: number; cut: number; prepared: number }) {
  const { location, rolls, shipment } = await receiveRolls(clerk, days.received);
  const coupon = await cutCoupon({ actor: technician, input: await couponInput(rolls[0]!.id, location.id, daysAgo(days.cut)) });
  const specimen = await prepareSpecimen({ actor: technician, input: specimenInput(coupon.id, location.id, daysAgo(days.prepared)) });
  return { shipment, roll: rolls[0]!, coupon, specimen, location };
}

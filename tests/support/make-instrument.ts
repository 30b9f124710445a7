import { withActor } from "@/lib/server/db/transaction";
import { unique } from "./factories";

const DAY = 86_400_000;

/** A registered instrument with one calibration (30 days old unless told), for runs in tests. */
export async function makeInstrument(
  kind: "PERMEAMETER_CELL" | "BURETTE_PANEL" | "PRESSURE_TRANSDUCER",
  options: { calibratedDaysAgo?: number; ratedMaxPressurePa?: number; values?: object } = {},
) {
  return withActor({ id: "system:test" }, async (tx) => {
    const admin = await tx.user.findFirst({ select: { id: true } });
    const equipment = await tx.equipment.create({ data: { assetTag: unique(kind.slice(0, 4)).toUpperCase(), kind, name: `Test ${kind}`, ratedMaxPressurePa: options.ratedMaxPressurePa ?? 1_000_000 } });
    const calibratedAt = new Date(Date.now() - (options.calibratedDaysAgo ?? 30) * DAY);
    await tx.calibration.create({ data: { equipmentId: equipment.id, calibratedAt, dueAt: new Date(calibratedAt.getTime() + 365 * DAY), reference: unique("CAL"), performedBy: "Test metrology", values: options.values ?? {}, recordedById: admin!.id } });
    return equipment;
  });
}

/** A cell, a burette panel with calibrated areas and a transducer: what a run needs. */
export async function makeRunInstruments() {
  const [cell, panel, transducer] = await Promise.all([
    makeInstrument("PERMEAMETER_CELL"),
    makeInstrument("BURETTE_PANEL", { values: { inflowBuretteAreaM2: 3.14e-5, outflowBuretteAreaM2: 3.12e-5 } }),
    makeInstrument("PRESSURE_TRANSDUCER", { ratedMaxPressurePa: 700_000 }),
  ]);
  return { cell, panel, transducer };
}

import type { CurrentUser } from "@/lib/server/auth/current-user";
import { withActor } from "@/lib/server/db/transaction";
import { logTestShipment } from "./custody-chain";
import { unique } from "./factories";

const DAY = 86_400_000;

/** A registered index-test instrument with one calibration `calibratedDaysAgo` ago, due a year later. */
export async function makeIndexInstrument(kind: "BALANCE" | "OVEN" | "GRADUATED_CYLINDER" | "FILTER_PRESS" | "TENSILE_FRAME" | "LOAD_CELL", options: { calibratedDaysAgo?: number } = {}) {
  return withActor({ id: "system:test" }, async (tx) => {
    const admin = await tx.user.findFirst({ select: { id: true } });
    const equipment = await tx.equipment.create({ data: { assetTag: unique(kind.slice(0, 4)).toUpperCase(), kind, name: `Test ${kind}` } });
    const calibratedAt = new Date(Date.now() - (options.calibratedDaysAgo ?? 30) * DAY);
    await tx.calibration.create({ data: { equipmentId: equipment.id, calibratedAt, dueAt: new Date(calibratedAt.getTime() + 365 * DAY), reference: unique("CAL"), performedBy: "Test metrology", recordedById: admin!.id } });
    return equipment;
  });
}

/** One of each index-test instrument, calibrated. */
export async function makeIndexInstruments() {
  const [balance, oven, cylinder, press, frame, loadCell] = await Promise.all(
    (["BALANCE", "OVEN", "GRADUATED_CYLINDER", "FILTER_PRESS", "TENSILE_FRAME", "LOAD_CELL"] as const).map((k) => makeIndexInstrument(k)),
  );
  return { balanceId: balance!.id, ovenId: oven!.id, cylinderId: cylinder!.id, filterPressId: press!.id, tensileFrameId: frame!.id, loadCellId: loadCell!.id };
}

/** A project whose rolls (lot, delivered length × width in m) arrive in one shipment `days` ago. */
export async function receiveProjectRolls(clerk: CurrentUser, days: number, rolls: Array<{ lot: string; lengthM?: number; widthM?: number }>) {
  const { project, location, shipment } = await logTestShipment(clerk, days, rolls.map((r) => ({
    lotNumber: r.lot, deliveredLengthM: r.lengthM === undefined ? "" : String(r.lengthM), deliveredWidthM: r.widthM === undefined ? "" : String(r.widthM),
  })));
  return { project, location, rolls: shipment.rolls };
}

/** Observations of each method as the form sends them (text), with values that pass. */
export const OBSERVATIONS = {
  D5890: (settledVolumeMl = "27.5") => ({ methodCode: "D5890", dryClayMassG: "2.00", settledVolumeMl, hydrationHours: "18", waterTemperatureC: "21" }),
  D5891: (filtrateVolumeMl = "16.4") => ({ methodCode: "D5891", clayMassG: "22.5", waterVolumeMl: "350", pressureKPa: "690", filtrationMinutes: "30", filtrateVolumeMl }),
  D2216: () => ({ methodCode: "D2216", wetWithTareG: "45.30", dryWithTareG: "40.10", tareG: "15.10", dryingHours: "18", ovenTemperatureC: "110" }),
  D5993: (totalMassG = "210") => ({
    methodCode: "D5993", wetWithTareG: "38.40", dryWithTareG: "36.00", tareG: "16.00",
    specimens: [0, 1, 2].map(() => ({ lengthMm: "200", widthMm: "200", totalMassG, geotextileMassG: "40" })),
  }),
  D6768: (forces = ["912", "887", "945", "901", "865"]) => ({ methodCode: "D6768", direction: "MD", specimens: forces.map((peakForceN) => ({ widthMm: "100", peakForceN })) }),
  D6496: () => ({ methodCode: "D6496", specimens: ["61", "55.5", "58.3", "64.2", "57"].map((peelForceN) => ({ widthMm: "100", peelForceN })) }),
} as const;

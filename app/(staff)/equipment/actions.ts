"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { editEquipment } from "@/lib/server/equipment/edit-equipment";
import { recordCalibration } from "@/lib/server/equipment/record-calibration";
import { registerEquipment } from "@/lib/server/equipment/register-equipment";
import { setEquipmentStatus } from "@/lib/server/equipment/set-equipment-status";

// Each action is the same thin adapter: who is acting, the operation, and a fresh register afterwards.
const refresh = () => revalidatePath("/equipment", "layout");

export async function registerEquipmentAction(input: unknown) {
  return toActionResult(async () => {
    const equipment = await registerEquipment({ actor: await requireUser("equipment.manage"), input });
    refresh();
    return equipment;
  }, "Equipment registered.");
}

export async function recordCalibrationAction(input: unknown) {
  return toActionResult(async () => {
    const calibration = await recordCalibration({ actor: await requireUser("equipment.manage"), input });
    refresh();
    return { id: calibration.id };
  }, "Calibration recorded.");
}

export async function setEquipmentStatusAction(input: unknown) {
  return toActionResult(async () => {
    const equipment = await setEquipmentStatus({ actor: await requireUser("equipment.manage"), input });
    refresh();
    return equipment;
  }, "Status changed.");
}

export async function editEquipmentAction(input: unknown) {
  return toActionResult(async () => {
    const result = await editEquipment({ actor: await requireUser("equipment.manage"), input });
    refresh();
    return result;
  }, "Register entry changed; the old values are kept in its history.");
}

"use server";

import { revalidatePath } from "next/cache";
import { toActionResult } from "@/lib/server/actions/action-result";
import { requireUser } from "@/lib/server/auth/require-permission";
import { createStorageLocation } from "@/lib/server/samples/create-storage-location";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { disposeRetained } from "@/lib/server/samples/dispose-retained";
import { moveItem } from "@/lib/server/samples/move-item";
import { prepareSpecimen } from "@/lib/server/samples/prepare-specimen";
import { retainItem } from "@/lib/server/samples/retain-item";

// Each action is the same thin adapter: who is acting, the operation, and a fresh page afterwards.
const refresh = () => revalidatePath("/samples", "layout");

export async function cutCouponAction(input: unknown) {
  return toActionResult(async () => {
    const coupon = await cutCoupon({ actor: await requireUser("sample.cut"), input });
    refresh();
    return coupon;
  }, "Coupon recorded.");
}

export async function prepareSpecimenAction(input: unknown) {
  return toActionResult(async () => {
    const specimen = await prepareSpecimen({ actor: await requireUser("sample.cut"), input });
    refresh();
    return specimen;
  }, "Specimen recorded.");
}

export async function moveItemAction(input: unknown) {
  return toActionResult(async () => {
    const moved = await moveItem({ actor: await requireUser("sample.move"), input });
    refresh();
    return moved;
  }, "Move recorded.");
}

export async function retainItemAction(input: unknown) {
  return toActionResult(async () => {
    const retained = await retainItem({ actor: await requireUser("sample.move"), input });
    refresh();
    return retained;
  }, "Item put on retention.");
}

export async function disposeRetainedAction(input: unknown) {
  return toActionResult(async () => {
    const result = await disposeRetained({ actor: await requireUser("sample.move"), input });
    refresh();
    return result;
  }, "Disposal recorded.");
}

export async function createStorageLocationAction(input: unknown) {
  return toActionResult(async () => {
    const location = await createStorageLocation({ actor: await requireUser("location.manage"), input });
    refresh();
    return location;
  }, "Location added.");
}

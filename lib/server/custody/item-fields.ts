import "server-only";
import type { ItemKind } from "@/lib/custody/state-machine";

/** The CustodyEvent column that points at an item of each kind. */
export const CUSTODY_ITEM_FIELD: Record<ItemKind, "rollId" | "couponId" | "specimenId"> = { roll: "rollId", coupon: "couponId", specimen: "specimenId" };

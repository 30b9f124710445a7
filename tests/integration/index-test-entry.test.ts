import { describe, expect, it } from "vitest";
import { getIndexTestEntry } from "@/lib/server/index-tests/get-index-test-entry";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { couponInput, daysAgo } from "../support/custody-chain";
import { makeUser } from "../support/factories";
import { receiveProjectRolls } from "../support/index-test-fixtures";

describe("the index-test entry form's coupon", () => {
  it("is chosen beforehand only when a coupon of the roll was cut for that test; one cut for hydraulic specimens is offered but not chosen", async () => {
    const [clerk, technician] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN")]);
    const { rolls, location } = await receiveProjectRolls(clerk, 5, [{ lot: "L1" }]);
    const roll = rolls[0]!;
    const forSpecimens = await cutCoupon({ actor: technician, input: await couponInput(roll.id, location.id, daysAgo(4)) });
    const forSwell = await cutCoupon({ actor: technician, input: { ...(await couponInput(roll.id, location.id, daysAgo(3))), intendedMethodCode: "D5890" } });

    const fluidLoss = await getIndexTestEntry({ actor: technician, rollLabNumber: roll.labNumber, methodCode: "D5891" });
    expect(fluidLoss.coupons.map((c) => c.id)).toEqual([forSpecimens.id, forSwell.id]);
    expect(fluidLoss.defaultCouponId).toBe("");

    const swell = await getIndexTestEntry({ actor: technician, rollLabNumber: roll.labNumber, methodCode: "D5890" });
    expect(swell.coupons.map((c) => c.id)).toEqual([forSpecimens.id, forSwell.id]);
    expect(swell.defaultCouponId).toBe(forSwell.id);
  });
});

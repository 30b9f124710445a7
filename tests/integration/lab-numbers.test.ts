import { describe, expect, it } from "vitest";
import { allocateLabNumber } from "@/lib/server/db/allocate-lab-number";
import { withActor } from "@/lib/server/db/transaction";
import { getHealth } from "@/lib/server/health/get-health";
import { db } from "../support/factories";
import { withOwner } from "../support/owner";

const actor = { id: "system:test" };

describe("lab numbering", () => {
  it("hands out unique, consecutive numbers to concurrent transactions", async () => {
    const year = 2090; // a year no other test uses, so the counter starts at 1
    const numbers = await Promise.all(Array.from({ length: 12 }, () => withActor(actor, (tx) => allocateLabNumber(tx, "specimen", new Date(Date.UTC(year, 5, 1))))));
    expect(new Set(numbers).size).toBe(12);
    expect([...numbers].sort()).toEqual(Array.from({ length: 12 }, (_, i) => `P90-${String(i + 1).padStart(5, "0")}`));
  });

  it("never hands out a committed number again, even after a rolled-back transaction", async () => {
    const at = new Date(Date.UTC(2091, 0, 1));
    const first = await withActor(actor, (tx) => allocateLabNumber(tx, "roll", at));
    await expect(
      withActor(actor, async (tx) => {
        await allocateLabNumber(tx, "roll", at);
        throw new Error("abandon");
      }),
    ).rejects.toThrow("abandon");
    const next = await withActor(actor, (tx) => allocateLabNumber(tx, "roll", at));
    // The abandoned number was never stored on a record, so it may be handed out; the committed one never is.
    expect([first, next]).toEqual(["R91-00001", "R91-00002"]);
  });

  it("refuses to wind a counter back or remove it", async () => {
    await withActor(actor, (tx) => allocateLabNumber(tx, "run", new Date(Date.UTC(2092, 0, 1))));
    await expect(db().numberSequence.update({ where: { key: "run-2092" }, data: { lastValue: 0 } })).rejects.toThrow(/may only increase/);
    await expect(db().numberSequence.delete({ where: { key: "run-2092" } })).rejects.toThrow(/permission denied/);
    await expect(withOwner(actor, (tx) => tx.numberSequence.delete({ where: { key: "run-2092" } }))).rejects.toThrow(/may only increase/);
  });
});

describe("health", () => {
  it("reports the database reachable and every committed migration applied", async () => {
    const health = await getHealth();
    expect(health.database.reachable).toBe(true);
    expect(health.migrations).toMatchObject({ upToDate: true, pending: [] });
    expect(health.migrations!.expected).toBeGreaterThanOrEqual(2);
    expect(health.status).toBe("ok");
  });
});

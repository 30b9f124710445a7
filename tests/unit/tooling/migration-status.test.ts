import { describe, expect, it } from "vitest";
import { nothingPending, readLocalMigrations, type AppliedMigration } from "@/scripts/support/migration-status";

const local = [
  { name: "20260101000000_a", checksum: "aa" },
  { name: "20260102000000_b", checksum: "bb" },
];
const done = (name: string, checksum: string): AppliedMigration => ({ name, checksum, finished: true, rolledBack: false });

describe("nothingPending: whether start-up may skip the migration tool", () => {
  it("is true when every committed migration is applied unchanged", () => {
    expect(nothingPending(local, [done("20260101000000_a", "aa"), done("20260102000000_b", "bb")])).toBe(true);
  });
  it("is false when a committed migration is not applied yet", () => {
    expect(nothingPending(local, [done("20260101000000_a", "aa")])).toBe(false);
  });
  it("is false when an applied migration was edited since (checksum differs)", () => {
    expect(nothingPending(local, [done("20260101000000_a", "aa"), done("20260102000000_b", "changed")])).toBe(false);
  });
  it("is false when an attempt failed half-way, so the tool can report it", () => {
    const failed = { ...done("20260102000000_b", "bb"), finished: false };
    expect(nothingPending(local, [done("20260101000000_a", "aa"), failed])).toBe(false);
  });
  it("ignores a rolled-back attempt once the same migration is applied again", () => {
    const rolledBack = { ...done("20260102000000_b", "bb"), finished: false, rolledBack: true };
    expect(nothingPending(local, [done("20260101000000_a", "aa"), rolledBack, done("20260102000000_b", "bb")])).toBe(true);
  });
  it("is false when the database holds a migration this clone does not have", () => {
    expect(nothingPending(local, [done("20260101000000_a", "aa"), done("20260102000000_b", "bb"), done("20260103000000_c", "cc")])).toBe(false);
  });
  it("reads the committed migrations with the SHA-256 Prisma stores", () => {
    const mine = readLocalMigrations();
    expect(mine.length).toBeGreaterThan(10);
    expect(mine[0]?.name).toBe("20261201000000_initial");
    expect(mine[0]?.checksum).toMatch(/^[0-9a-f]{64}$/);
  });
});

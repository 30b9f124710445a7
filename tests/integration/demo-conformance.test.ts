import { describe, expect, it } from "vitest";
import { loadProjectConformance, type ProjectConformance } from "@/lib/server/conformance/load-project-conformance";
import { withActor } from "@/lib/server/db/transaction";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { buildDemoScenario } from "../../prisma/seed/demo-scenario";

class RolledBack extends Error {}

/** The matrix as a Markdown table, printed so the closing note can show it as the app computes it. */
function asTable(m: ProjectConformance): string {
  const head = `| Roll | Lot | ${m.limits.map((l) => `${TEST_PROPERTY_LABELS[l.property]} (${l.direction === "MAXIMUM" ? "≤" : "≥"} ${l.limitText} ${l.unit})`).join(" | ")} | Verdict |`;
  const rule = `|${" --- |".repeat(m.limits.length + 3)}`;
  const rows = m.rows.map((r) => `| ${r.roll.labNumber} (${r.roll.rollNumber}) | ${r.roll.lotNumber} | ${r.cells.map((c) => (c.value !== null ? `${Number(c.value.toPrecision(3))} ${c.unit}: ${c.status}` : c.status)).join(" | ")} | ${r.verdict} |`);
  return [head, rule, ...rows].join("\n");
}

describe("the demo scenario's conformance", () => {
  it("has rolls with every property at several stages, one roll failing its swell index, and a project short of its sampling frequency", async () => {
    let c4: ProjectConformance | null = null;
    let pond: ProjectConformance | null = null;
    let order: Array<{ what: string; ok: boolean }> = [];
    await withActor({ id: "system:demo-seed" }, async (tx) => {
      await buildDemoScenario(tx, new Date());
      const project = (code: string) => tx.project.findUniqueOrThrow({ where: { code }, select: { id: true } });
      c4 = await loadProjectConformance({ projectId: (await project("MWA-C4")).id, tx });
      pond = await loadProjectConformance({ projectId: (await project("OMC-TPB")).id, tx });
      // Every index test: its coupon cut and its roll received before it was done, approved after it.
      const tests = await tx.indexTest.findMany({ where: { roll: { project: { code: { in: ["MWA-C4", "OMC-TPB"] } } } }, select: { testedAt: true, approvedAt: true, coupon: { select: { cutAt: true } }, roll: { select: { labNumber: true, shipment: { select: { receivedAt: true } } } } } });
      order = tests.map((t) => ({ what: t.roll.labNumber, ok: t.roll.shipment.receivedAt <= t.testedAt && (!t.coupon || t.coupon.cutAt <= t.testedAt) && (!t.approvedAt || t.testedAt <= t.approvedAt) }));
      throw new RolledBack();
    }, { timeoutMs: 300_000 }).catch((error) => {
      if (!(error instanceof RolledBack)) throw error;
    });
    const m = c4! as ProjectConformance;
    console.log(`MWA-C4 conformance matrix (demo):\n${asTable(m)}`);
    console.log(`MWA-C4 coverage: ${JSON.stringify(m.coverage.map((c) => [c.property, c.testsRequired, c.testsApproved, c.covered, c.lotsLacking, c.rollsLacking]))}`);
    expect(order.length).toBeGreaterThan(10);
    expect(order.filter((o) => !o.ok)).toEqual([]);
    const verdicts = Object.fromEntries(m.rows.map((r) => [r.roll.rollNumber, r.verdict]));
    expect(verdicts).toEqual({ "R-4101": "conforms", "R-4102": "fails", "R-4103": "pending" });
    const statuses = new Set(m.rows.flatMap((r) => r.cells.map((c) => c.status)));
    for (const s of ["conforms", "fails", "awaiting review", "in progress", "not required"]) expect(statuses).toContain(s);
    expect(m.rows[1]!.cells.find((c) => c.property === "SWELL_INDEX")).toMatchObject({ status: "fails", value: 22 });
    // The tailings pond asks for a mass per unit area test every 500 m²: 3 rolls of 60 m × 5.3 m = 954 m², so 2; 1 is done.
    const p = (pond! as ProjectConformance).coverage.find((c) => c.property === "BENTONITE_MASS_PER_AREA")!;
    expect(p).toMatchObject({ testsRequired: 2, testsApproved: 1, covered: false });
    expect(p.rollsLacking).toHaveLength(2);
  }, 300_000);
});

import { describe, expect, it } from "vitest";
import { withActor, type Tx } from "@/lib/server/db/transaction";
import { transition, type CustodyActionName, type ItemKind, type ItemStateName } from "@/lib/custody/state-machine";
import { DEMO_CLIENTS } from "../../prisma/seed/demo-people";
import { buildDemoScenario } from "../../prisma/seed/demo-scenario";

class RolledBack extends Error {}

type Event = { action: string; fromState: string | null; toState: string | null; occurredAt: Date };

/**
 * Walks an item's custody events in time order and says where the ledger does not lead, step by step
 * and by the state machine, to the state the item is in. Events at the same moment may come in any
 * order, so among them the one that continues the chain is taken.
 */
function ledgerProblems(label: string, kind: ItemKind, state: string, events: Event[]): string[] {
  const problems: string[] = [];
  const left = [...events].sort((a, b) => a.occurredAt.getTime() - b.occurredAt.getTime());
  let current: string | null = null;
  while (left.length) {
    const at = left[0]!.occurredAt.getTime();
    const index = left.findIndex((e) => e.occurredAt.getTime() === at && e.fromState === current);
    if (index < 0) return [...problems, `${label}: no event continues from ${current ?? "nothing"} at ${left[0]!.occurredAt.toISOString()}`];
    const [event] = left.splice(index, 1) as [Event];
    if (current !== null && event.action !== "CORRECTED") {
      const step = transition(kind, current as ItemStateName, event.action as CustodyActionName);
      if (!step.ok || step.toState !== event.toState) problems.push(`${label}: ${event.action} from ${current} to ${event.toState} is not a step of the custody state machine`);
    }
    current = event.toState;
  }
  if (current !== state) problems.push(`${label}: the ledger ends in ${current} but the item is ${state}`);
  return problems;
}

/**
 * Every break of the order received <= cut <= prepared <= mounted <= stages <= readings <= terminated <= reviewed
 * (with the run's method settings version set before it was mounted), or of a ledger.
 */
async function demoProblems(tx: Tx, now: Date): Promise<string[]> {
  const problems: string[] = [];
  const before = (what: string, a: Date | null | undefined, b: Date | null | undefined) => {
    if (a && b && a > b) problems.push(`${what}: ${a.toISOString()} is after ${b.toISOString()}`);
  };
  const events = { select: { action: true, fromState: true, toState: true, occurredAt: true } } as const;
  // The demo's own shipments only: the shared test database holds other tests' records too.
  const shipments = await tx.shipment.findMany({
    where: { clientOrganization: { code: { in: DEMO_CLIENTS.map((c) => c.code) } } },
    include: {
      rolls: {
        include: {
          custodyEvents: events,
          coupons: {
            include: {
              custodyEvents: events,
              specimens: { include: { custodyEvents: events, runs: { include: { stages: { orderBy: { sequence: "asc" } }, readings: true, reviews: true, methodSettingsVersion: { select: { createdAt: true } } } } } },
            },
          },
        },
      },
    },
  });
  for (const s of shipments) {
    before(`${s.labNumber} received / now`, s.receivedAt, now);
    before(`${s.labNumber} received / acknowledged`, s.receivedAt, s.acknowledgedAt);
    for (const r of s.rolls) {
      problems.push(...ledgerProblems(r.labNumber, "roll", r.state, r.custodyEvents));
      for (const e of r.custodyEvents) before(`${r.labNumber} received / its ${e.action}`, s.receivedAt, e.occurredAt);
      for (const c of r.coupons) {
        before(`${r.labNumber} received / ${c.labNumber} cut`, s.receivedAt, c.cutAt);
        problems.push(...ledgerProblems(c.labNumber, "coupon", c.state, c.custodyEvents));
        for (const p of c.specimens) {
          before(`${c.labNumber} cut / ${p.labNumber} prepared`, c.cutAt, p.preparedAt);
          problems.push(...ledgerProblems(p.labNumber, "specimen", p.state, p.custodyEvents));
          for (const run of p.runs) {
            before(`${p.labNumber} prepared / ${run.labNumber} mounted`, p.preparedAt, run.assignedAt);
            // The settings version a run is judged by was in force when it was mounted.
            if (!run.methodSettingsVersion) problems.push(`${run.labNumber} names no method settings version`);
            before(`${run.labNumber} settings version set / mounted`, run.methodSettingsVersion?.createdAt, run.assignedAt);
            let previous = run.assignedAt;
            for (const stage of run.stages) {
              before(`${run.labNumber} stage ${stage.sequence} start`, previous, stage.startedAt);
              previous = stage.startedAt;
            }
            const permeation = run.stages.find((st) => st.kind === "PERMEATION");
            for (const reading of run.readings) {
              before(`${run.labNumber} permeation / reading ${reading.sequence}`, permeation?.startedAt, reading.takenAt);
              before(`${run.labNumber} reading ${reading.sequence} / terminated`, reading.takenAt, run.terminatedAt ?? now);
              if (reading.inflowLevelMm === null || reading.outflowLevelMm === null) problems.push(`${run.labNumber} reading ${reading.sequence} has no burette levels`);
            }
            before(`${run.labNumber} terminated / submitted`, run.terminatedAt, run.submittedAt);
            for (const review of run.reviews) before(`${run.labNumber} submitted / reviewed`, run.submittedAt, review.createdAt);
          }
        }
      }
    }
  }
  return problems;
}

// The demo's rolls are R-4101 to R-4109; other tests' random roll numbers (R-<8 hex digits>) may also start "R-41".
const DEMO_ROLL_NUMBER = /^R-41\d{2}$/;

describe("the demo scenario", () => {
  it("keeps one order of events and a custody ledger that leads to every item's state", async () => {
    const now = new Date();
    let problems: string[] | null = null;
    let counts = { rolls: 0, runs: 0 };
    // Seeded inside a transaction that is then rolled back, so the shared test database stays as it was.
    await withActor({ id: "system:demo-seed" }, async (tx) => {
      await buildDemoScenario(tx, now);
      problems = await demoProblems(tx, now);
      counts = { rolls: (await tx.roll.findMany({ where: { rollNumber: { startsWith: "R-41" } }, select: { rollNumber: true } })).filter((r) => DEMO_ROLL_NUMBER.test(r.rollNumber)).length, runs: await tx.run.count({ where: { methodCode: "D5887", performedBy: { email: { endsWith: "@quillfen.test" } } } }) };
      throw new RolledBack();
    }, { timeoutMs: 300_000 }).catch((error) => {
      if (!(error instanceof RolledBack)) throw error;
    });
    expect(counts).toEqual({ rolls: 9, runs: 4 });
    expect(problems).toEqual([]);
  }, 300_000);
});

import { describe, expect, it } from "vitest";
import { AUDIT_TABLES } from "@/lib/audit/audit-tables";
import type { AuditEntry } from "@/lib/audit/audit-entry";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { findAuditEntries } from "@/lib/server/audit/find-audit-entries";
import { correctReading } from "@/lib/server/readings/correct-reading";
import { recordReadings } from "@/lib/server/readings/record-readings";
import { createUser } from "@/lib/server/users/create-user";
import type { AuditQueryInput } from "@/lib/validation/audit";
import { db, makeUser, unique } from "../support/factories";
import { at, gridRow, makeRun } from "../support/make-permeating-run";
import { withOwner } from "../support/owner";
import { codeOf, failure } from "../support/refusals";

/** A run with three readings, reading 2 corrected (inflow level 442.1 -> 441.2 mm, temperature 20.1 -> 20.4 °C). */
async function runWithCorrectedReading() {
  const made = await makeRun();
  const { technician, run, permeationStartedAt } = made;
  await recordReadings({ actor: technician, input: { runId: run.id, pressureUnit: "KPA", readings: [gridRow(at(permeationStartedAt, 0), "452", "18"), gridRow(at(permeationStartedAt, 6), "442.1", "28.9"), gridRow(at(permeationStartedAt, 12), "430.4", "39.8")] } });
  const original = await db().reading.findFirstOrThrow({ where: { runId: run.id, sequence: 2 } });
  await correctReading({ actor: technician, input: { readingId: original.id, pressureUnit: "KPA", values: gridRow(at(permeationStartedAt, 6), "441.2", "28.9", { temperatureC: "20.4" }), reason: "Misread the scale: 441.2, not 442.1" } });
  return made;
}

/**
 * Audit rows written straight into the log (INSERT is what the triggers do too), at chosen times, by `actorId`.
 * Only the owner may write the log directly; the runtime role's rows come from the audit trigger.
 */
async function insertAuditRows(actorId: string, times: Date[], tableName = "Roll") {
  for (const [i, time] of times.entries())
    await withOwner({ id: actorId }, (tx) => tx.$executeRaw`INSERT INTO "AuditLog" ("occurredAt", "actorId", "tableName", "rowId", operation, "before", "after", "txId")
      VALUES (${time.toISOString().slice(0, 23).replace("T", " ")}::timestamp, ${actorId}, ${tableName}, ${unique("row")}, 'INSERT', NULL, ${JSON.stringify({ rollNumber: `N${i}` })}::jsonb, txid_current())`);
}

/** Every page, following `older` from the newest, then `newer` back from the oldest. */
async function walk(actor: CurrentUser, input: AuditQueryInput) {
  const down: AuditEntry[][] = [];
  let page = await findAuditEntries({ actor, input });
  down.push(page.entries);
  while (page.older) {
    page = await findAuditEntries({ actor, input: { ...input, before: page.older } });
    down.push(page.entries);
  }
  const up: AuditEntry[][] = [page.entries];
  while (page.newer) {
    page = await findAuditEntries({ actor, input: { ...input, after: page.newer } });
    up.push(page.entries);
  }
  return { down, up: up.reverse() };
}

const ids = (pages: AuditEntry[][]) => pages.flat().map((e) => e.id);

describe("the audit trail filter", () => {
  it("finds a run and its stages, instruments and readings by the run's lab number, with the corrected reading's old and new values", async () => {
    const { technician, run } = await runWithCorrectedReading();
    const other = await runWithCorrectedReading();
    const qa = await makeUser("QA_MANAGER");
    const { entries } = await findAuditEntries({ actor: qa, input: { record: run.labNumber.toLowerCase() } });

    expect(entries.every((e) => e.record?.text === run.labNumber && e.record.href === `/runs/${run.labNumber}`)).toBe(true);
    expect(entries.map((e) => `${e.kind}: ${e.part ?? "itself"} ${e.operation}`).sort()).toEqual([
      "Instrument used in a run: instrument used (burette panel) added",
      "Reading: reading 1 recorded", "Reading: reading 2 corrected", "Reading: reading 2 recorded", "Reading: reading 3 recorded",
      "Run stage: stage 1, permeation recorded", "Run: itself added",
    ]);
    expect(entries.map((e) => e.record?.text)).not.toContain(other.run.labNumber);
    // Newest first: the correction is the last thing that happened to the run.
    const correction = entries[0]!;
    expect(correction).toMatchObject({ kind: "Reading", part: "reading 2", operation: "corrected", person: technician.name });
    expect(correction.changes).toEqual([
      { field: "inflowLevelMm", label: "Inflow burette level", old: "442.1 mm", new: "441.2 mm" },
      { field: "inflowCumulativeMl", label: "Inflow volume, cumulative", old: "0.31086 mL", new: "0.33912 mL" },
      { field: "temperatureC", label: "Temperature", old: "20.1 °C", new: "20.4 °C" },
      { field: "correctionReason", label: "Reason for the correction", old: null, new: "Misread the scale: 441.2, not 442.1" },
    ]);
    const recorded = entries.find((e) => e.part === "reading 3")!;
    expect(recorded.changes.find((c) => c.field === "influentPressurePa")).toEqual({ field: "influentPressurePa", label: "Influent pressure", old: null, new: "530 kPa" });
    expect(recorded.changes.find((c) => c.field === "elapsedS")).toMatchObject({ new: "12 h" });
    expect(recorded.changes.map((c) => c.field)).not.toContain("runId");

    // A QA manager who reads pressures in psi sees them in psi: 530 kPa / 6.894757293168361 kPa/psi (NIST SP 811).
    const inPsi = { ...qa, pressureUnit: "PSI" as const };
    const psi = (await findAuditEntries({ actor: inPsi, input: { record: run.labNumber, table: "reading" } })).entries.find((e) => e.part === "reading 3")!;
    expect(psi.changes.find((c) => c.field === "influentPressurePa")!.new).toBe(`${Number((530 / 6.894757293168361).toPrecision(10))} psi`);
  });

  it("narrows by kind of record, by person and by date range (whole UTC days, both ends included)", async () => {
    const { technician, run } = await runWithCorrectedReading();
    const admin = await makeUser("LAB_ADMIN");
    const readings = await findAuditEntries({ actor: admin, input: { record: run.labNumber, table: "reading" } });
    expect(readings.entries.map((e) => e.kind)).toEqual(["Reading", "Reading", "Reading", "Reading"]);
    expect((await findAuditEntries({ actor: admin, input: { record: run.labNumber, table: "certificate" } })).entries).toEqual([]);

    const byTechnician = await findAuditEntries({ actor: admin, input: { person: technician.id } });
    expect(byTechnician.entries.map((e) => `${e.part} ${e.operation}`)).toEqual(["reading 2 corrected", "reading 3 recorded", "reading 2 recorded", "reading 1 recorded"]);
    expect((await findAuditEntries({ actor: admin, input: { person: technician.id, table: "run" } })).entries).toEqual([]);

    const clerk = await makeUser("INTAKE_CLERK");
    const utc = (text: string) => new Date(`${text}Z`);
    await insertAuditRows(clerk.id, [utc("2025-02-28T23:59:59.999"), utc("2025-03-01T00:00:00.000"), utc("2025-03-01T23:59:59.999"), utc("2025-03-02T00:00:00.000")]);
    const when = async (from?: string, to?: string) =>
      (await findAuditEntries({ actor: admin, input: { person: clerk.id, from, to } })).entries.map((e) => e.occurredAt.toISOString());
    expect(await when("2025-03-01", "2025-03-01")).toEqual(["2025-03-01T23:59:59.999Z", "2025-03-01T00:00:00.000Z"]);
    expect(await when("2025-03-02")).toEqual(["2025-03-02T00:00:00.000Z"]);
    expect(await when(undefined, "2025-02-28")).toEqual(["2025-02-28T23:59:59.999Z"]);
    expect(await when("2025-03-03", "2025-03-09")).toEqual([]);
  });

  it("pages through the whole history with no row lost or repeated, older and back newer", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const clerk = await makeUser("INTAKE_CLERK");
    const someoneElse = await makeUser("INTAKE_CLERK");
    const start = Date.UTC(2025, 5, 1);
    for (let i = 0; i < 23; i++) {
      await insertAuditRows(clerk.id, [new Date(start + i * 60_000)]);
      if (i % 4 === 0) await insertAuditRows(someoneElse.id, [new Date(start + i * 60_000)]);
    }
    const all = await findAuditEntries({ actor: admin, input: { person: clerk.id, pageSize: 100 } });
    expect(all.entries).toHaveLength(23);
    expect(all).toMatchObject({ newer: null, older: null });
    const { down, up } = await walk(admin, { person: clerk.id, pageSize: 5 });
    expect(down.map((p) => p.length)).toEqual([5, 5, 5, 5, 3]);
    expect(ids(down)).toEqual(all.entries.map((e) => e.id));
    expect(new Set(ids(down)).size).toBe(23);
    expect(up.map((p) => p.map((e) => e.id))).toEqual(down.map((p) => p.map((e) => e.id)));

    // Within a date range pages follow time, then id: rows written out of time order are each met once, newest first.
    const late = await makeUser("INTAKE_CLERK");
    const shuffled = [5, 1, 9, 3, 7, 0, 8, 2, 6, 4, 10].map((h) => new Date(Date.UTC(2025, 6, 1) + h * 3_600_000));
    await insertAuditRows(late.id, shuffled);
    const byTime = await walk(admin, { person: late.id, from: "2025-07-01", to: "2025-07-01", pageSize: 3 });
    expect(byTime.down.map((p) => p.length)).toEqual([3, 3, 3, 2]);
    expect(byTime.down.flat().map((e) => e.occurredAt.getTime())).toEqual(shuffled.map((d) => d.getTime()).sort((x, y) => y - x));
    expect(ids(byTime.up)).toEqual(ids(byTime.down));

    // The same through a record's branches (a UNION of its tables): a run with its readings, 3 a page.
    const { run } = await runWithCorrectedReading();
    const whole = (await findAuditEntries({ actor: admin, input: { record: run.labNumber, pageSize: 1000 } })).entries.map((e) => e.id);
    const paged = await walk(admin, { record: run.labNumber, pageSize: 3 });
    expect(ids(paged.down)).toEqual(whole);
    expect(ids(paged.up)).toEqual(whole);
    expect(whole.map(BigInt)).toEqual([...whole.map(BigInt)].sort((a, b) => (a > b ? -1 : 1)));
  });

  it("refuses an end date before the start, an unknown or malformed lab number and an unknown person, and searches nothing", async () => {
    const qa = await makeUser("QA_MANAGER");
    const backwards = await failure(findAuditEntries({ actor: qa, input: { from: "2026-12-01", to: "2026-11-30" } }));
    expect(backwards.code).toBe("INVALID_INPUT");
    expect(backwards.fieldErrors.to).toBe("The end date 2026-11-30 is before the start date 2026-12-01; nothing was searched.");
    const unknown = await failure(findAuditEntries({ actor: qa, input: { record: "T26-99999" } }));
    expect(unknown.code).toBe("INVALID_INPUT");
    expect(unknown.fieldErrors.record).toBe("No record has the lab number T26-99999; check it on the label or in the lists. Nothing was searched.");
    expect(unknown.message).toBe(unknown.fieldErrors.record);
    expect((await failure(findAuditEntries({ actor: qa, input: { record: "roll 42" } }))).fieldErrors.record).toBe("Enter a lab number such as T26-00004, R26-00012 or Q26-00001.");
    expect((await failure(findAuditEntries({ actor: qa, input: { person: "no-such-person" } }))).fieldErrors.person).toMatch(/^No person matches that choice/);
    expect((await failure(findAuditEntries({ actor: qa, input: { table: "AuditLog" } }))).fieldErrors.table).toBe("Choose a kind of record from the list.");
    expect((await failure(findAuditEntries({ actor: qa, input: { from: "2026-02-30" } }))).fieldErrors.from).toBe("Enter a real date.");
  });

  it("is for QA managers and lab administrators only: a client user, a technician and a clerk are refused", async () => {
    const { run } = await runWithCorrectedReading();
    for (const role of ["CLIENT_USER", "TECHNICIAN", "INTAKE_CLERK"] as const)
      expect(await codeOf(findAuditEntries({ actor: await makeUser(role), input: { record: run.labNumber } })), role).toBe("FORBIDDEN");
    for (const role of ["QA_MANAGER", "LAB_ADMIN"] as const)
      expect(await codeOf(findAuditEntries({ actor: await makeUser(role), input: { record: run.labNumber } })), role).toBe("no error");
  });

  it("never shows a password hash, a token hash or a stored file, even if a row carries one", async () => {
    const admin = await makeUser("LAB_ADMIN");
    await createUser({ actor: admin, input: { name: "Audited Newcomer", email: `${unique("new")}@example.test`, role: "TECHNICIAN", password: "a long enough password" } });
    const people = await findAuditEntries({ actor: admin, input: { person: admin.id, table: "person" } });
    expect(people.entries[0]).toMatchObject({ kind: "Person", operation: "added", record: { text: "Audited Newcomer" } });
    expect(people.entries[0]!.changes.map((c) => c.label)).toEqual(expect.arrayContaining(["Email", "Name", "Role", "Active"]));

    const clerk = await makeUser("INTAKE_CLERK");
    await withOwner(clerk, (tx) => tx.$executeRaw`INSERT INTO "AuditLog" ("actorId", "tableName", "rowId", operation, "before", "after", "txId")
      VALUES (${clerk.id}, 'User', 'leaky', 'UPDATE', '{"name": "A", "passwordHash": "$2b$old", "tokenHash": "t1", "data": "AAAA", "apiSecret": "s1"}'::jsonb,
              '{"name": "B", "passwordHash": "$2b$new", "tokenHash": "t2", "data": "BBBB", "apiSecret": "s2"}'::jsonb, txid_current())`);
    const [leaky] = (await findAuditEntries({ actor: admin, input: { person: clerk.id } })).entries;
    expect(leaky!.changes).toEqual([{ field: "name", label: "Name", old: "A", new: "B" }]);
  });

  it("has words for every table the database audits", async () => {
    const audited = await db().$queryRaw<{ table: string }[]>`SELECT DISTINCT c.relname::text AS table FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid WHERE t.tgname = 'audit_row'`;
    expect(audited.length).toBeGreaterThan(20);
    expect(audited.map((a) => a.table).filter((t) => !(t in AUDIT_TABLES))).toEqual([]);
  });
});

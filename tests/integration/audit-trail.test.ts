import { describe, expect, it } from "vitest";
import { createUser } from "@/lib/server/users/create-user";
import { setUserActive } from "@/lib/server/users/set-user-active";
import { withActor } from "@/lib/server/db/transaction";
import { db, makeProject, makeUser, unique } from "../support/factories";
import { withOwner } from "../support/owner";

async function auditRows(tableName: string, rowId: string) {
  return db().auditLog.findMany({ where: { tableName, rowId }, orderBy: { id: "asc" } });
}

describe("audit trail kept by the database", () => {
  it("records who inserted and who updated a row, with before and after, and never the password hash", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const email = `${unique("audited")}@example.test`;
    const created = await createUser({ actor: admin, input: { name: "Audited Person", email, role: "TECHNICIAN", password: "a long enough password" } });

    const user = await db().user.findUniqueOrThrow({ where: { id: created.id } });
    await setUserActive({ actor: admin, input: { userId: created.id, active: false, version: user.version } });

    const rows = await auditRows("User", created.id);
    expect(rows.map((r) => r.operation)).toEqual(["INSERT", "UPDATE"]);
    const [insert, update] = rows;
    expect(insert!.actorId).toBe(admin.id);
    expect(insert!.before).toBeNull();
    expect(insert!.after).toMatchObject({ email, role: "TECHNICIAN", active: true });
    expect(insert!.after).not.toHaveProperty("passwordHash");
    expect(update!.actorId).toBe(admin.id);
    expect(update!.before).toMatchObject({ active: true, version: 1 });
    expect(update!.after).toMatchObject({ active: false, version: 2 });
    expect(update!.txId).not.toBe(insert!.txId);
  });

  it("records deletes too, naming the actor of the transaction", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const code = unique("LOC").toUpperCase();
    const location = await withActor(admin, (tx) => tx.storageLocation.create({ data: { code, name: "Temporary shelf" } }));
    // The app's runtime role deletes nothing; the owner's delete shows the trigger records deletes too.
    await expect(withActor(admin, (tx) => tx.storageLocation.delete({ where: { id: location.id } }))).rejects.toThrow(/permission denied/);
    await withOwner(admin, (tx) => tx.storageLocation.delete({ where: { id: location.id } }));
    const rows = await auditRows("StorageLocation", location.id);
    expect(rows.map((r) => [r.operation, r.actorId])).toEqual([["INSERT", admin.id], ["DELETE", admin.id]]);
    expect(rows[1]!.before).toMatchObject({ code });
    expect(rows[1]!.after).toBeNull();
  });

  it("refuses to update, delete or truncate audit rows, to the app's role by rights and to the owner by trigger", async () => {
    await makeProject();
    const row = await db().auditLog.findFirstOrThrow({ orderBy: { id: "desc" } });
    await expect(db().$executeRaw`DELETE FROM "AuditLog" WHERE id = ${row.id}`).rejects.toThrow(/permission denied/);
    await expect(db().$executeRaw`UPDATE "AuditLog" SET "actorId" = 'someone else' WHERE id = ${row.id}`).rejects.toThrow(/permission denied/);
    await expect(db().$executeRawUnsafe(`TRUNCATE "AuditLog"`)).rejects.toThrow(/permission denied/);
    const system = { id: "system:test" };
    await expect(withOwner(system, (tx) => tx.$executeRaw`DELETE FROM "AuditLog" WHERE id = ${row.id}`)).rejects.toThrow(/append-only/);
    await expect(withOwner(system, (tx) => tx.$executeRaw`UPDATE "AuditLog" SET "actorId" = 'someone else' WHERE id = ${row.id}`)).rejects.toThrow(/append-only/);
    await expect(withOwner(system, (tx) => tx.$executeRawUnsafe(`TRUNCATE "AuditLog"`))).rejects.toThrow(/append-only/);
    expect(await db().auditLog.findUnique({ where: { id: row.id } })).toMatchObject({ actorId: row.actorId });
  });

  it("keeps the custody ledger append-only as well", async () => {
    const clerk = await makeUser("INTAKE_CLERK");
    const project = await makeProject();
    const event = await withActor(clerk, async (tx) => {
      const shipment = await tx.shipment.create({
        data: { labNumber: unique("S"), clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Test carrier", receivedAt: new Date(), receivedById: clerk.id },
      });
      const roll = await tx.roll.create({
        data: { labNumber: unique("R"), shipmentId: shipment.id, projectId: project.id, rollNumber: unique("roll"), lotNumber: "L1", product: "Test GCL", manufacturer: "Test maker" },
      });
      return tx.custodyEvent.create({ data: { action: "RECEIVED", rollId: roll.id, toState: "RECEIVED", actorId: clerk.id } });
    });
    await expect(db().custodyEvent.update({ where: { id: event.id }, data: { note: "rewritten" } })).rejects.toThrow(/permission denied/);
    await expect(db().custodyEvent.delete({ where: { id: event.id } })).rejects.toThrow(/permission denied/);
    await expect(withOwner(clerk, (tx) => tx.custodyEvent.update({ where: { id: event.id }, data: { note: "rewritten" } }))).rejects.toThrow(/append-only/);
    await expect(withOwner(clerk, (tx) => tx.custodyEvent.delete({ where: { id: event.id } }))).rejects.toThrow(/append-only/);
  });
});

import { describe, expect, it } from "vitest";
import { editEquipment } from "@/lib/server/equipment/edit-equipment";
import { listEquipmentChanges } from "@/lib/server/equipment/list-equipment-changes";
import { registerEquipment } from "@/lib/server/equipment/register-equipment";
import { setEquipmentStatus } from "@/lib/server/equipment/set-equipment-status";
import { failure } from "../support/refusals";
import { db, makeUser, unique } from "../support/factories";

async function registerCell(admin: Awaited<ReturnType<typeof makeUser>>) {
  return registerEquipment({ actor: admin, input: { assetTag: unique("CELL").toUpperCase(), kind: "PERMEAMETER_CELL", name: "Cell seven", serialNumber: "SN-7", ratedMaxPressure: "1000", pressureUnit: "KPA" } });
}

describe("equipment after registration", () => {
  it("edits the register entry with a reason, keeping each changed field's old value; nothing changed or no reason is refused", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const technician = await makeUser("TECHNICIAN");
    const cell = await registerCell(admin);
    const edit = { equipmentId: cell.id, version: cell.version, name: "Cell seven (rebuilt)", serialNumber: "SN-7B", ratedMaxPressure: "145", pressureUnit: "PSI", reason: "Rebuilt by the maker with a new body" };
    expect((await failure(editEquipment({ actor: technician, input: edit }))).code).toBe("FORBIDDEN");
    expect((await failure(editEquipment({ actor: admin, input: { ...edit, reason: "" } }))).fieldErrors.reason).toMatch(/Say why/);
    expect((await failure(editEquipment({ actor: admin, input: { ...edit, ratedMaxPressure: "" } }))).fieldErrors.ratedMaxPressure).toMatch(/keeps its rated maximum/);

    const result = await editEquipment({ actor: admin, input: edit });
    expect(result.changed).toEqual(["name", "serialNumber", "ratedMaxPressurePa"]);
    const stored = await db().equipment.findUniqueOrThrow({ where: { id: cell.id } });
    // 145 psi = 999.74 kPa with 1 psi = 6.894757293168 kPa (exact by definition of the pound and inch; NIST SP 811).
    expect(stored.ratedMaxPressurePa).toBeCloseTo(145 * 6894.757293168, 3);
    expect(stored).toMatchObject({ name: "Cell seven (rebuilt)", serialNumber: "SN-7B", assetTag: cell.assetTag, kind: "PERMEAMETER_CELL" });
    const changes = await listEquipmentChanges({ actor: admin, equipmentId: cell.id });
    expect(changes.map((c) => [c.field, c.oldValue, c.reason])).toEqual(expect.arrayContaining([["name", "Cell seven", edit.reason], ["serialNumber", "SN-7", edit.reason], ["ratedMaxPressurePa", "1000000", edit.reason]]));

    const same = await failure(editEquipment({ actor: admin, input: { ...edit, version: stored.version } }));
    expect(same.message).toBe("Nothing was changed.");
    expect((await failure(editEquipment({ actor: admin, input: { ...edit, version: 1, name: "Stale" } }))).code).toBe("CONFLICT");
  });

  it("changes status only with a reason, kept beside the audit trail", async () => {
    const admin = await makeUser("LAB_ADMIN");
    const cell = await registerCell(admin);
    const noReason = await failure(setEquipmentStatus({ actor: admin, input: { equipmentId: cell.id, version: cell.version, status: "OUT_OF_SERVICE" } }));
    expect(noReason.fieldErrors.reason).toMatch(/Say why/);
    expect((await db().equipment.findUniqueOrThrow({ where: { id: cell.id } })).status).toBe("IN_SERVICE");
    await setEquipmentStatus({ actor: admin, input: { equipmentId: cell.id, version: cell.version, status: "OUT_OF_SERVICE", reason: "Membrane seal failed the leak check" } });
    const [change] = await listEquipmentChanges({ actor: admin, equipmentId: cell.id });
    expect(change).toMatchObject({ field: "status", oldValue: "IN_SERVICE", newValue: "OUT_OF_SERVICE", reason: "Membrane seal failed the leak check", actor: { name: admin.name } });
    const audit = await db().auditLog.findFirst({ where: { tableName: "Equipment", rowId: cell.id, operation: "UPDATE" }, orderBy: { id: "desc" } });
    expect(audit).toMatchObject({ actorId: admin.id, after: expect.objectContaining({ status: "OUT_OF_SERVICE" }) });
    expect((await failure(setEquipmentStatus({ actor: admin, input: { equipmentId: cell.id, version: cell.version + 1, status: "OUT_OF_SERVICE", reason: "Again" } }))).fieldErrors).toHaveProperty("status");
  });
});

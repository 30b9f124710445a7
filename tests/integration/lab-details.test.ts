import { afterEach, describe, expect, it } from "vitest";
import { correctReceipt } from "@/lib/server/intake/correct-receipt";
import { getLabDetails } from "@/lib/server/lab/get-lab-details";
import { readLabTimeZone } from "@/lib/server/lab/read-lab-time-zone";
import { updateLabDetails } from "@/lib/server/lab/update-lab-details";
import { logShipment } from "@/lib/server/intake/log-shipment";
import { cutCoupon } from "@/lib/server/samples/cut-coupon";
import { withOwner } from "../support/owner";
import { failure } from "../support/refusals";
import { couponInput, daysAgo, receiveRolls } from "../support/custody-chain";
import { db, makeProject, makeStorageLocation, makeUser, unique } from "../support/factories";

// Other tests read times in the lab's zone (UTC while unset): put the lab row back as it was after each test.
const SYSTEM = { id: "system:test" };
let saved: Awaited<ReturnType<typeof snapshot>> | undefined;
const snapshot = () => db().laboratory.findUnique({ where: { id: "lab" } });
afterEach(async () => {
  if (saved === undefined) return;
  if (saved) await db().laboratory.update({ where: { id: "lab" }, data: { name: saved.name, address: saved.address, accreditation: saved.accreditation, timeZone: saved.timeZone } });
  else await withOwner(SYSTEM, (tx) => tx.laboratory.deleteMany({ where: { id: "lab" } })); // the app's role may not delete
  saved = undefined;
});

describe("the lab's own details and time zone", () => {
  it("are set by the administrator only; an unknown time zone is refused with the field named", async () => {
    saved = await snapshot();
    const [admin, qa] = await Promise.all([makeUser("LAB_ADMIN"), makeUser("QA_MANAGER")]);
    const details = { name: "Brackwater Clay Lab (invented)", address: "4 Kiln Street\nBrackwater", accreditation: "Invented accreditation 1234", timeZone: "Europe/Dublin" };
    expect((await failure(updateLabDetails({ actor: qa, input: details }))).code).toBe("FORBIDDEN");
    const bad = await failure(updateLabDetails({ actor: admin, input: { ...details, timeZone: "Mars/Olympus" } }));
    expect(bad.fieldErrors.timeZone).toMatch(/Choose a time zone from the list/);
    await updateLabDetails({ actor: admin, input: details });
    expect(await getLabDetails({ actor: admin })).toMatchObject(details);
    const audit = await db().auditLog.findFirst({ where: { tableName: "Laboratory", rowId: "lab" }, orderBy: { id: "desc" } });
    expect(audit).toMatchObject({ actorId: admin.id, after: expect.objectContaining({ timeZone: "Europe/Dublin" }) });
  });

  it("names times in the lab's zone and reads a typed receipt time as the lab's wall clock", async () => {
    saved = await snapshot();
    const [admin, clerk, technician] = await Promise.all([makeUser("LAB_ADMIN"), makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN")]);
    // Asia/Kolkata is UTC+05:30 all year (no daylight saving; IANA tz database), so the expected instant is fixed.
    await updateLabDetails({ actor: admin, input: { name: "Lab", address: "Somewhere", timeZone: "Asia/Kolkata" } });
    expect(await readLabTimeZone(db())).toBe("Asia/Kolkata");

    const { rolls, location, shipment } = await receiveRolls(clerk, 2);
    const early = await failure(cutCoupon({ actor: technician, input: await couponInput(rolls[0]!.id, location.id, daysAgo(3)) }));
    expect(early.fieldErrors.cutAt).toMatch(/^The cut time \(\d{4}-\d{2}-\d{2} \d{2}:\d{2} GMT\+5:30\) is before roll/);

    const current = await db().shipment.findUniqueOrThrow({ where: { id: shipment.id } });
    const wall = "2026-01-10T09:30";
    await correctReceipt({ actor: clerk, input: { target: "shipment", id: shipment.id, field: "receivedAt", value: wall, reason: "Time taken from the gate log", version: current.version } });
    expect((await db().shipment.findUniqueOrThrow({ where: { id: shipment.id } })).receivedAt.toISOString()).toBe("2026-01-10T04:00:00.000Z");
  });

  it("refuses a yes-or-no cell that is neither, naming the roll row and field; a roll's own condition is kept", async () => {
    const clerk = await makeUser("INTAKE_CLERK");
    const [project, location] = await Promise.all([makeProject(), makeStorageLocation()]);
    const roll = (marked: string, conditionNotes = "") => ({ rollNumber: unique("R"), lotNumber: "L", product: "GCL", manufacturer: "M", machineDirectionMarked: marked, conditionNotes });
    const input = { clientOrganizationId: project.clientOrganizationId, projectId: project.id, deliveredBy: "Van", receivedAt: daysAgo(1).toISOString(), storageLocationId: location.id };
    const refused = await failure(logShipment({ actor: clerk, input: { ...input, rolls: [roll("no"), roll("maybe")] } }));
    expect(refused.fieldErrors["rolls.1.machineDirectionMarked"]).toBe("Write whether the machine direction is marked as yes/no, y/n, true/false or 1/0.");
    expect(await db().shipment.count({ where: { projectId: project.id } })).toBe(0);

    const saved = await logShipment({ actor: clerk, input: { ...input, rolls: [roll("N"), roll("Yes", "Torn wrapping at one end"), roll("0"), roll("1")] } });
    const stored = await db().roll.findMany({ where: { shipmentId: saved.id }, orderBy: { labNumber: "asc" }, select: { machineDirectionMarked: true, conditionNotes: true } });
    expect(stored.map((r) => r.machineDirectionMarked)).toEqual([false, true, false, true]);
    expect(stored[1]!.conditionNotes).toBe("Torn wrapping at one end");
  });
});

import { beforeAll, describe, expect, it } from "vitest";
import type { Role } from "@/lib/generated/prisma/client";
import { can } from "@/lib/policy/permissions";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { withActor } from "@/lib/server/db/transaction";
import { getShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import { getCertificatePdf } from "@/lib/server/portal/get-portal-certificate-pdf";
import { getPortalProject } from "@/lib/server/portal/get-portal-project";
import { listPortalCertificates } from "@/lib/server/portal/list-portal-certificates";
import { makeOrganization, makeProject, makeUser, unique } from "../support/factories";
import { issueRevision, TEST_PDF } from "../support/issue-certificate-revision";
import { codeOf, failure } from "../support/refusals";

const DAY = 86_400_000;
const ago = (days: number) => new Date(Date.now() - days * DAY);

type OrgFixture = {
  client: CurrentUser;
  projectCode: string;
  projectName: string;
  shipment: string;
  rolls: { certified: string; testing: string; received: string };
  /** rev 1 issued (its PDF stored), rev 2 still a draft with a PDF of its own. */
  main: string;
  /** rev 1 superseded by rev 2, both with PDFs. */
  revised: string;
  /** Only a draft revision. */
  draftOnly: string;
  /** rev 1 issued without a stored PDF. */
  noPdf: string;
};

let staff: Record<Exclude<Role, "CLIENT_USER">, CurrentUser>;
let a: OrgFixture;
let b: OrgFixture;

const number = () => unique("Q").toUpperCase();

/** One organisation's world: a project, a shipment of three rolls along the chain, and four certificates. */
async function makeOrgFixture(): Promise<OrgFixture> {
  const org = await makeOrganization();
  const project = await makeProject(org.id);
  const client = await makeUser("CLIENT_USER", { clientOrganizationId: org.id });
  return withActor(staff.QA_MANAGER, async (tx) => {
    const shipment = await tx.shipment.create({
      data: {
        labNumber: unique("S").toUpperCase(), clientOrganizationId: org.id, projectId: project.id, deliveredBy: "Carrier, driver signed", receivedAt: ago(20),
        receivedById: staff.INTAKE_CLERK.id, conditionNotes: "INTERNAL NOTE: outer film torn", acknowledgedAt: ago(19), acknowledgedById: staff.INTAKE_CLERK.id,
      },
    });
    const roll = (n: number, state: "TESTED" | "UNDER_TEST" | "RECEIVED") =>
      tx.roll.create({
        data: {
          labNumber: unique("R").toUpperCase(), shipmentId: shipment.id, projectId: project.id, rollNumber: `R-${n}`, lotNumber: `L-${n}`,
          product: "Needle-punched GCL", manufacturer: "Invented Mills", state,
        },
      });
    const cell = await tx.equipment.create({ data: { assetTag: unique("CELL").toUpperCase(), kind: "PERMEAMETER_CELL", name: "Test cell", ratedMaxPressurePa: 1_000_000 } });
    const specimenOf = async (rollId: string, daysAgo: number) => {
      const coupon = await tx.coupon.create({
        data: { labNumber: unique("C").toUpperCase(), rollId, positionInSample: "centre", lengthMm: 300, widthMm: 300, cutById: staff.TECHNICIAN.id, cutAt: ago(daysAgo) },
      });
      return tx.specimen.create({
        data: {
          labNumber: unique("P").toUpperCase(), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 7, initialMassG: 60, intendedMethodCode: "D5887",
          preparedById: staff.TECHNICIAN.id, preparedAt: ago(daysAgo - 1),
        },
      });
    };
    const certifiedRoll = await roll(1, "TESTED");
    const testingRoll = await roll(2, "UNDER_TEST");
    const receivedRoll = await roll(3, "RECEIVED");
    const certifiedRun = await tx.run.create({
      data: {
        labNumber: unique("T").toUpperCase(), specimenId: (await specimenOf(certifiedRoll.id, 18)).id, cellId: cell.id, methodCode: "D5887", state: "APPROVED",
        performedById: staff.TECHNICIAN.id, assignedAt: ago(16), terminatedAt: ago(10), submittedAt: ago(10),
      },
    });
    await tx.run.create({
      data: {
        labNumber: unique("T").toUpperCase(), specimenId: (await specimenOf(testingRoll.id, 8)).id, cellId: cell.id, methodCode: "D5887", state: "PERMEATING",
        performedById: staff.TECHNICIAN.id, assignedAt: ago(6),
      },
    });
    const result = await tx.result.create({
      data: { runId: certifiedRun.id, property: "INDEX_FLUX", value: 2.4e-9, unit: "m3/m2/s", approvedById: staff.QA_MANAGER.id, approvedAt: ago(9) },
    });

    const certificate = () => tx.certificate.create({ data: { number: number(), projectId: project.id, clientOrganizationId: org.id } });
    const main = await certificate();
    await issueRevision(tx, main.id, 1, { resultIds: [result.id], daysAgo: 8 });
    await tx.certificateRevision.create({
      data: { certificateId: main.id, revision: 2, verificationCode: unique("V").toUpperCase(), reason: "Draft correction", pdf: TEST_PDF, pdfSha256: "draft" },
    });
    const revised = await certificate();
    const first = await issueRevision(tx, revised.id, 1, { daysAgo: 7 });
    await issueRevision(tx, revised.id, 2, { supersedesId: first.id, daysAgo: 3 });
    await tx.certificateRevision.update({ where: { id: first.id }, data: { status: "SUPERSEDED", supersededAt: ago(3) } });
    const draftOnly = await certificate();
    await tx.certificateRevision.create({ data: { certificateId: draftOnly.id, revision: 1, verificationCode: unique("V").toUpperCase(), pdf: TEST_PDF } });
    const noPdf = await certificate();
    await issueRevision(tx, noPdf.id, 1, { pdf: false, daysAgo: 2 });

    return {
      client, projectCode: project.code, projectName: project.name, shipment: shipment.labNumber,
      rolls: { certified: certifiedRoll.labNumber, testing: testingRoll.labNumber, received: receivedRoll.labNumber },
      main: main.number, revised: revised.number, draftOnly: draftOnly.number, noPdf: noPdf.number,
    };
  });
}

beforeAll(async () => {
  const [clerk, technician, qa, admin] = await Promise.all([makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN"), makeUser("QA_MANAGER"), makeUser("LAB_ADMIN")]);
  staff = { INTAKE_CLERK: clerk, TECHNICIAN: technician, QA_MANAGER: qa, LAB_ADMIN: admin };
  a = await makeOrgFixture();
  b = await makeOrgFixture();
});

describe("client portal: a client sees their own organisation", () => {
  it("gets their project with shipments, each roll's progress and its certificates, without staff names or internal notes", async () => {
    const project = await getPortalProject({ actor: a.client, projectCode: a.projectCode });
    expect(project.name).toBe(a.projectName);
    expect(project.shipments).toEqual([expect.objectContaining({ labNumber: a.shipment, rollCount: 3, acknowledgedAt: expect.any(Date) })]);
    const progress = Object.fromEntries(project.rolls.map((r) => [r.labNumber, r.progress.map((s) => s.status).join(" ")]));
    expect(progress[a.rolls.certified]).toBe("done done done done done done");
    expect(progress[a.rolls.testing]).toBe("done done done current pending pending");
    expect(progress[a.rolls.received]).toBe("current pending pending pending pending pending");
    expect(project.rolls.find((r) => r.labNumber === a.rolls.certified)!.certificateNumbers).toEqual([a.main]);
    expect(project.certificates.map((c) => c.number).sort()).toEqual([a.main, a.noPdf, a.revised].sort());

    const text = JSON.stringify(project);
    for (const person of Object.values(staff)) expect(text).not.toContain(person.name);
    expect(text).not.toContain("INTERNAL NOTE");
  });

  it("lists only non-draft revisions, a superseded one marked with the revision that replaced it", async () => {
    const certificates = await listPortalCertificates({ actor: a.client });
    const byNumber = new Map(certificates.map((c) => [c.number, c]));
    expect([...byNumber.keys()].sort()).toEqual([a.main, a.noPdf, a.revised].sort());
    expect(byNumber.has(a.draftOnly)).toBe(false);
    expect(byNumber.get(a.main)!.revisions.map((r) => [r.revision, r.status])).toEqual([[1, "ISSUED"]]);
    expect(byNumber.get(a.revised)!.revisions.map((r) => [r.revision, r.status, r.supersededByRevision])).toEqual([
      [2, "ISSUED", null],
      [1, "SUPERSEDED", 2],
    ]);
    expect(byNumber.get(a.noPdf)!.revisions[0]!.hasPdf).toBe(false);
    expect(byNumber.get(a.main)!.revisions[0]!.hasPdf).toBe(true);
  });

  it("downloads their PDFs: the latest issued by default, a superseded revision on request, never a draft", async () => {
    const latest = await getCertificatePdf({ actor: a.client, number: a.main });
    expect(latest).toMatchObject({ fileName: `${a.main}-rev1.pdf`, status: "ISSUED", revision: 1 });
    expect(latest.pdf.toString("latin1")).toBe("%PDF-1.4 test");
    expect(await codeOf(getCertificatePdf({ actor: a.client, number: a.main, revision: 2 }))).toBe("NOT_FOUND"); // the draft
    expect(await codeOf(getCertificatePdf({ actor: a.client, number: a.draftOnly }))).toBe("NOT_FOUND");
    expect(await codeOf(getCertificatePdf({ actor: a.client, number: a.main, revision: "7" }))).toBe("NOT_FOUND");

    expect(await getCertificatePdf({ actor: a.client, number: a.revised })).toMatchObject({ revision: 2, status: "ISSUED", fileName: `${a.revised}-rev2.pdf` });
    const superseded = await getCertificatePdf({ actor: a.client, number: a.revised.toLowerCase(), revision: "1" });
    expect(superseded).toMatchObject({ revision: 1, status: "SUPERSEDED", fileName: `${a.revised}-rev1-superseded.pdf` });
  });

  it("says plainly when an issued revision has no stored PDF, and refuses a revision that is not a number", async () => {
    const refusal = await failure(getCertificatePdf({ actor: a.client, number: a.noPdf }));
    expect(refusal.code).toBe("NOT_FOUND");
    expect(refusal.message).toMatch(/No PDF is stored for certificate .* revision 1; ask the laboratory/);
    expect(await codeOf(getCertificatePdf({ actor: a.client, number: a.main, revision: "one" }))).toBe("INVALID_INPUT");
  });

  it("gets their own shipment's receipt acknowledgement", async () => {
    expect((await getShipmentReceipt({ actor: a.client, labNumber: a.shipment })).labNumber).toBe(a.shipment);
  });
});

describe("client portal: nothing of another organisation is reachable", () => {
  it("answers NOT_FOUND for B's project, certificates, PDFs and receipt, every time", async () => {
    expect(await codeOf(getPortalProject({ actor: a.client, projectCode: b.projectCode }))).toBe("NOT_FOUND");
    for (const certificate of [b.main, b.revised, b.draftOnly, b.noPdf]) {
      expect(await codeOf(getCertificatePdf({ actor: a.client, number: certificate })), certificate).toBe("NOT_FOUND");
      expect(await codeOf(getCertificatePdf({ actor: a.client, number: certificate, revision: 1 })), certificate).toBe("NOT_FOUND");
    }
    expect(await codeOf(getShipmentReceipt({ actor: a.client, labNumber: b.shipment }))).toBe("NOT_FOUND");
    // And the other way round.
    expect(await codeOf(getPortalProject({ actor: b.client, projectCode: a.projectCode }))).toBe("NOT_FOUND");
    expect(await codeOf(getCertificatePdf({ actor: b.client, number: a.main }))).toBe("NOT_FOUND");
  });

  it("gives no hint that B's records exist: the refusal reads as for a number nobody has", async () => {
    const theirs = await failure(getCertificatePdf({ actor: a.client, number: b.main }));
    const nobodys = await failure(getCertificatePdf({ actor: a.client, number: "Q99-99999" }));
    expect(theirs.message.replace(b.main, "N")).toBe(nobodys.message.replace("Q99-99999", "N"));
    const project = await failure(getPortalProject({ actor: a.client, projectCode: b.projectCode }));
    const noProject = await failure(getPortalProject({ actor: a.client, projectCode: "NO-SUCH" }));
    expect(project.message.replace(b.projectCode, "N")).toBe(noProject.message.replace("NO-SUCH", "N"));
  });

  it("never lists B's certificates or rolls to A", async () => {
    const numbers = (await listPortalCertificates({ actor: a.client })).map((c) => c.number);
    for (const certificate of [b.main, b.revised, b.draftOnly, b.noPdf]) expect(numbers).not.toContain(certificate);
    const project = await getPortalProject({ actor: a.client, projectCode: a.projectCode });
    expect(project.rolls.map((r) => r.labNumber)).not.toContain(b.rolls.certified);
  });
});

describe("certificate PDFs for the lab's staff", () => {
  it("lets every role with certificate.view fetch any organisation's issued PDF, and still never a draft", async () => {
    for (const [role, actor] of Object.entries(staff)) {
      expect(can(actor.role, "certificate.view"), role).toBe(true); // the matrix gives it to all staff (STAFF_READ)
      expect((await getCertificatePdf({ actor, number: a.main })).revision, role).toBe(1);
      expect((await getCertificatePdf({ actor, number: b.revised, revision: 1 })).status, role).toBe("SUPERSEDED");
      expect(await codeOf(getCertificatePdf({ actor, number: b.main, revision: 2 })), role).toBe("NOT_FOUND");
    }
  });

  it("keeps the portal's own pages to client users", async () => {
    expect(await codeOf(getPortalProject({ actor: staff.QA_MANAGER, projectCode: a.projectCode }))).toBe("FORBIDDEN");
    expect(await codeOf(listPortalCertificates({ actor: staff.LAB_ADMIN }))).toBe("FORBIDDEN");
  });
});

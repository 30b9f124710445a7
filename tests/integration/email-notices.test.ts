import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { SMTPServer } from "smtp-server";
import { createCertificateDraft } from "@/lib/server/certificates/create-certificate-draft";
import { issueCertificate } from "@/lib/server/certificates/issue-certificate";
import { reviseCertificate } from "@/lib/server/certificates/revise-certificate";
import { withActor } from "@/lib/server/db/transaction";
import { notifyCalibrationsDue } from "@/lib/server/notices/notify-calibrations-due";
import { notifyCertificateIssued } from "@/lib/server/notices/notify-certificate-issued";
import { approveRun } from "@/lib/server/review/approve-run";
import { findBrowser } from "../../e2e/support/find-browser";
import { db, makeUser, TEST_PASSWORD, unique } from "../support/factories";
import { makePermeatingRun } from "../support/run-fixtures";

const SYSTEM = { id: "system:test" };
const DAY = 86_400_000;
const browser = findBrowser();
if (!browser && process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("these tests issue certificates and need Chromium");

type Received = { from: string; to: string[]; raw: string };
const received: Received[] = [];
let server: SMTPServer;

/** A real SMTP server in this process, on a loopback port, keeping every message it is given. */
beforeAll(async () => {
  server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        received.push({ from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "", to: session.envelope.rcptTo.map((r) => r.address), raw: Buffer.concat(chunks).toString("utf8") });
        callback();
      });
    },
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const address = server.server.address();
  process.env.SEEPLINE_SMTP_HOST = "127.0.0.1";
  process.env.SEEPLINE_SMTP_PORT = String(typeof address === "object" && address ? address.port : 0);
  process.env.SEEPLINE_MAIL_FROM = "Test lab <lab@example.test>";
});

afterAll(async () => {
  delete process.env.SEEPLINE_SMTP_HOST;
  delete process.env.SEEPLINE_SMTP_PORT;
  delete process.env.SEEPLINE_MAIL_FROM;
  await new Promise<void>((resolve) => server.close(() => resolve()));
});

/** A run approved into results (steady invented readings, as tests/integration/review-and-certificates.test.ts). */
async function approvedResults() {
  const [technician, qa] = await Promise.all([makeUser("TECHNICIAN"), makeUser("QA_MANAGER")]);
  const { run, project } = await makePermeatingRun(technician.id);
  await withActor(SYSTEM, async (tx) => {
    await tx.run.update({ where: { id: run.id }, data: { state: "SUBMITTED", terminatedAt: new Date(), terminationKind: "CRITERIA_MET", postTestThicknessMm: 5.9, submittedAt: new Date() } });
    const stepMl = 2e-9 * ((Math.PI * 0.1 ** 2) / 4) * 21_600 * 1e6;
    await tx.reading.createMany({ data: Array.from({ length: 8 }, (_, i) => ({ runId: run.id, sequence: i + 1, takenAt: new Date(), elapsedS: i * 21_600, inflowCumulativeMl: i * stepMl, outflowCumulativeMl: i * stepMl * 0.98, headPa: 14_000, temperatureC: 20, recordedById: technician.id })) });
  });
  await approveRun({ actor: qa, input: { runId: run.id, version: 1 } });
  const resultIds = (await db().result.findMany({ where: { runId: run.id }, select: { id: true } })).map((r) => r.id);
  return { qa, project, resultIds };
}

describe.skipIf(!browser)("e-mail notices to the client's contacts", () => {
  it("sends one e-mail, with the PDF, to the active contacts when a certificate is issued, and one more for its revision", async () => {
    const { qa, project, resultIds } = await approvedResults();
    const active = `${unique("qa-engineer")}@client.example.test`;
    await withActor(SYSTEM, async (tx) => {
      await tx.clientContact.create({ data: { clientOrganizationId: project.clientOrganizationId, name: "Active contact", email: active } });
      await tx.clientContact.create({ data: { clientOrganizationId: project.clientOrganizationId, name: "Former contact", email: `${unique("former")}@client.example.test`, active: false } });
    });
    const certificate = await createCertificateDraft({ actor: qa, input: { projectId: project.id, resultIds } });
    const draft = await db().certificateRevision.findFirstOrThrow({ where: { certificateId: certificate.id } });
    const before = received.length;
    await issueCertificate({ actor: qa, input: { revisionId: draft.id, password: TEST_PASSWORD } });
    const mails = received.slice(before);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.to).toEqual([active]);
    expect(mails[0]!.from).toBe("lab@example.test");
    expect(mails[0]!.raw).toMatch(new RegExp(`Subject: Certificate ${certificate.number} issued: project ${project.code}`));
    expect(mails[0]!.raw).toMatch(new RegExp(`filename=${certificate.number}`));
    expect(mails[0]!.raw).toMatch(/Content-Type: application\/pdf/);
    expect(mails[0]!.raw).toMatch(/\/verify\//);

    // Asked again (a retry, a second instance): nothing more goes out.
    expect(await notifyCertificateIssued(draft.id)).toBe("already-sent");
    expect(received.length).toBe(before + 1);
    const delivery = await db().noticeDelivery.findUniqueOrThrow({ where: { key: `certificate-issued:${draft.id}` } });
    expect(delivery).toMatchObject({ transport: "smtp", recipients: [active], failure: null });
    expect(delivery.deliveredAt).not.toBeNull();

    const revision2 = await reviseCertificate({ actor: qa, input: { certificateId: certificate.id, reason: "Client name spelt wrongly" } });
    await issueCertificate({ actor: qa, input: { revisionId: revision2.id, password: TEST_PASSWORD } });
    expect(received.length).toBe(before + 2);
    expect(received.at(-1)!.raw).toMatch(new RegExp(`Subject: Revision 2 of certificate ${certificate.number} issued`));
    expect(received.at(-1)!.raw.replace(/=\r?\n/g, "")).toMatch(/because: Client name spelt wrongly/);
  }, 120_000);
});

describe("e-mail notices to the lab", () => {
  it("lists calibrations due within the set days once, however often the check runs", async () => {
    await makeUser("LAB_ADMIN");
    const soon = unique("PG").toUpperCase();
    const later = unique("PG").toUpperCase();
    await withActor(SYSTEM, async (tx) => {
      for (const [tag, days] of [[soon, 3], [later, 60]] as const) {
        const e = await tx.equipment.create({ data: { assetTag: tag, kind: "THERMOMETER", name: "Test thermometer" } });
        await tx.calibration.create({ data: { equipmentId: e.id, calibratedAt: new Date(Date.now() - 300 * DAY), dueAt: new Date(Date.now() + days * DAY), reference: unique("CAL"), performedBy: "Test metrology", recordedById: (await tx.user.findFirstOrThrow({ where: { role: "LAB_ADMIN" } })).id } });
      }
    });
    const before = received.length;
    const first = await notifyCalibrationsDue({ withinDays: 14 });
    expect(first.outcome).toBe("sent");
    expect(received.length).toBe(before + 1);
    const text = received.at(-1)!.raw.replace(/=\r?\n/g, "");
    expect(text).toContain(soon);
    expect(text).not.toContain(later);
    expect((await notifyCalibrationsDue({ withinDays: 14 })).outcome).toBe("already-sent");
    expect(received.length).toBe(before + 1);
  });

  it("writes a notice to the log when no SMTP server is set", async () => {
    const host = process.env.SEEPLINE_SMTP_HOST;
    delete process.env.SEEPLINE_SMTP_HOST;
    const log = vi.spyOn(console, "info").mockImplementation(() => undefined);
    try {
      await makeUser("LAB_ADMIN");
      const tag = unique("PG").toUpperCase();
      await withActor(SYSTEM, async (tx) => {
        const e = await tx.equipment.create({ data: { assetTag: tag, kind: "THERMOMETER", name: "Test thermometer" } });
        await tx.calibration.create({ data: { equipmentId: e.id, calibratedAt: new Date(Date.now() - 300 * DAY), dueAt: new Date(Date.now() + DAY), reference: unique("CAL"), performedBy: "Test metrology", recordedById: (await tx.user.findFirstOrThrow({ where: { role: "LAB_ADMIN" } })).id } });
      });
      const before = received.length;
      expect((await notifyCalibrationsDue({ withinDays: 14 })).outcome).toBe("logged");
      expect(received.length).toBe(before);
      expect(log.mock.calls.map((c) => String(c[0])).join("\n")).toContain(tag);
    } finally {
      log.mockRestore();
      process.env.SEEPLINE_SMTP_HOST = host;
    }
  });
});

import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CurrentUser } from "@/lib/server/auth/current-user";
import { allocateLabNumber } from "@/lib/server/db/allocate-lab-number";
import { withActor } from "@/lib/server/db/transaction";
import { getShipmentReceipt } from "@/lib/server/intake/get-shipment-receipt";
import { getLetterhead } from "@/lib/server/lab/get-letterhead";
import { renderReceiptPdf } from "@/lib/server/intake/render-receipt-pdf";
import { getPrintableLabels } from "@/lib/server/labels/get-printable-labels";
import { renderLabelSheetPdf } from "@/lib/server/labels/render-label-sheet-pdf";
import { closePdfBrowser, renderPdf } from "@/lib/server/pdf/render-pdf";
import { findLabelItems } from "@/lib/server/samples/find-label-items";
import { findBrowser } from "../../e2e/support/find-browser";
import { makeOrganization, makeProject, makeUser, unique } from "../support/factories";

type Fixture = {
  clerk: CurrentUser; technician: CurrentUser; ownClient: CurrentUser; otherClient: CurrentUser;
  shipment: string; rolls: Array<{ labNumber: string; rollNumber: string }>; coupon: string; specimen: string; orgCode: string; projectCode: string;
};
let f: Fixture;

// A shipment of three rolls, one cut into a coupon and a specimen, made directly in the database.
beforeAll(async () => {
  const org = await makeOrganization();
  const project = await makeProject(org.id);
  const [clerk, technician, ownClient, otherClient] = await Promise.all([
    makeUser("INTAKE_CLERK"), makeUser("TECHNICIAN"), makeUser("CLIENT_USER", { clientOrganizationId: org.id }), makeUser("CLIENT_USER"),
  ]);
  f = await withActor(clerk, async (tx) => {
    const receivedAt = new Date();
    const shipment = await tx.shipment.create({
      data: {
        labNumber: await allocateLabNumber(tx, "shipment", receivedAt), clientOrganizationId: org.id, projectId: project.id,
        deliveredBy: "Carrier, driver signed", receivedAt, receivedById: clerk.id, conditionNotes: "Outer film torn at one end; liner intact.",
      },
    });
    const rolls = [];
    for (let n = 1; n <= 3; n++)
      rolls.push(await tx.roll.create({
        data: {
          labNumber: await allocateLabNumber(tx, "roll", receivedAt), shipmentId: shipment.id, projectId: project.id,
          rollNumber: unique(`RN${n}`), lotNumber: `LOT-${n}`, product: "Needle-punched GCL, sodium bentonite", manufacturer: "Invented Mills",
          sampleLengthMm: 1000, sampleWidthMm: 1200, machineDirectionMarked: n !== 2,
        },
      }));
    const coupon = await tx.coupon.create({
      data: { labNumber: await allocateLabNumber(tx, "coupon"), rollId: rolls[0]!.id, positionInSample: "centre, 300 mm from edge", lengthMm: 300, widthMm: 300, cutById: technician.id, cutAt: new Date() },
    });
    const specimen = await tx.specimen.create({
      data: {
        labNumber: await allocateLabNumber(tx, "specimen"), couponId: coupon.id, dieDiameterMm: 100, initialThicknessMm: 7.1, initialMassG: 62.5,
        intendedMethodCode: "ASTM-D5887", preparedById: technician.id, preparedAt: new Date(),
      },
    });
    return {
      clerk, technician, ownClient, otherClient, shipment: shipment.labNumber, coupon: coupon.labNumber, specimen: specimen.labNumber,
      rolls: rolls.map((r) => ({ labNumber: r.labNumber, rollNumber: r.rollNumber })), orgCode: org.code, projectCode: project.code,
    };
  });
});

afterAll(async () => {
  await closePdfBrowser();
});

describe("receipt acknowledgement", () => {
  it("lists what arrived, for staff and for the client's own organisation", async () => {
    const receipt = await getShipmentReceipt({ actor: f.clerk, labNumber: f.shipment });
    expect(receipt.rolls.map((r) => r.labNumber)).toEqual(f.rolls.map((r) => r.labNumber));
    expect(receipt.rolls.map((r) => r.machineDirectionMarked)).toEqual([true, false, true]);
    expect(receipt).toMatchObject({ deliveredBy: "Carrier, driver signed", receivedBy: { name: f.clerk.name }, acknowledgedAt: null, acknowledgedBy: null });
    const asClient = await getShipmentReceipt({ actor: f.ownClient, labNumber: f.shipment.toLowerCase() });
    expect(asClient.labNumber).toBe(f.shipment);
  });

  it("is simply not found for a client user of another organisation, or an unknown number", async () => {
    await expect(getShipmentReceipt({ actor: f.otherClient, labNumber: f.shipment })).rejects.toMatchObject({ code: "NOT_FOUND" });
    await expect(getShipmentReceipt({ actor: f.clerk, labNumber: "S99-99999" })).rejects.toMatchObject({ code: "NOT_FOUND" });
  });
});

describe("labels", () => {
  it("describes rolls, coupons and specimens in the order asked and lists unknown numbers apart", async () => {
    const [roll] = f.rolls;
    const { items, unknown } = await findLabelItems({ actor: f.technician, labNumbers: [`${f.specimen}, ${f.coupon}`, roll!.labNumber.toLowerCase(), "R99-99999", "hello", f.shipment, f.coupon] });
    expect(items).toEqual([
      { kind: "specimen", labNumber: f.specimen, description: `from coupon ${f.coupon} · ASTM-D5887` },
      { kind: "coupon", labNumber: f.coupon, description: `from roll ${roll!.labNumber} · centre, 300 mm from edge` },
      { kind: "roll", labNumber: roll!.labNumber, description: `${f.orgCode} · ${f.projectCode} · roll ${roll!.rollNumber} · lot LOT-1` },
    ]);
    expect(unknown).toEqual(["hello", f.shipment, "R99-99999"]);
  });

  it("is for lab staff only", async () => {
    await expect(findLabelItems({ actor: f.ownClient, labNumbers: [f.coupon] })).rejects.toMatchObject({ code: "FORBIDDEN" });
  });

  it("puts the lab number, as plain text, in each QR code's SVG", async () => {
    const { labels } = await getPrintableLabels({ actor: f.clerk, labNumbers: f.rolls.map((r) => r.labNumber) });
    expect(labels).toHaveLength(3);
    for (const label of labels) expect(label.qrSvg).toMatch(/^<svg[^>]*viewBox="0 0 \d+ \d+"/);
  });
});

describe("PDF service without a browser", () => {
  it("answers UNAVAILABLE with a sentence instead of crashing", async () => {
    await closePdfBrowser();
    const saved = process.env.CHROME_PATH;
    process.env.CHROME_PATH = "/nonexistent/chromium";
    try {
      await expect(renderPdf({ html: "<p>x</p>" })).rejects.toMatchObject({ code: "UNAVAILABLE", message: expect.stringContaining("needs Chromium") });
    } finally {
      if (saved === undefined) delete process.env.CHROME_PATH;
      else process.env.CHROME_PATH = saved;
    }
  });
});

// Chromium is a system package: the PDF checks skip without it, unless the run insists on it.
const browser = findBrowser();
if (!browser && process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("SEEPLINE_REQUIRE_BROWSER=1 but no Chromium was found (set CHROME_PATH or install Debian's chromium).");
if (!browser) console.warn("receipt-and-labels: no Chromium found, so the PDF checks are skipped (install Debian's chromium or set CHROME_PATH).");

describe.skipIf(!browser)("PDF documents (Chromium)", () => {
  const dir = mkdtempSync(path.join(os.tmpdir(), "seepline-pdf-test-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  function pdfText(pdf: Buffer, name: string): string {
    const file = path.join(dir, `${name}.pdf`);
    writeFileSync(file, pdf);
    // SEEPLINE_KEEP_PDFS=<folder> keeps the printed files to look at.
    if (process.env.SEEPLINE_KEEP_PDFS) writeFileSync(path.join(process.env.SEEPLINE_KEEP_PDFS, `${name}.pdf`), pdf);
    return execFileSync("pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
  }

  it("prints the receipt with the shipment number, every roll and the not-acknowledged notice", async () => {
    const [receipt, lab] = await Promise.all([getShipmentReceipt({ actor: f.clerk, labNumber: f.shipment }), getLetterhead()]);
    const pdf = await renderReceiptPdf({ receipt, lab });
    expect(pdf.subarray(0, 4).toString("latin1")).toBe("%PDF");
    const text = pdfText(pdf, "receipt");
    expect(text).toContain(f.shipment);
    for (const roll of f.rolls) {
      expect(text).toContain(roll.labNumber);
      expect(text).toContain(roll.rollNumber);
    }
    expect(text).toContain("Not yet acknowledged");
    expect(text).toMatch(/Page 1 of 1/);
  });

  it("prints a label sheet and serves concurrent requests from the one browser", async () => {
    const { labels } = await getPrintableLabels({ actor: f.clerk, labNumbers: [...f.rolls.map((r) => r.labNumber), f.coupon, f.specimen] });
    const pdfs = await Promise.all(Array.from({ length: 4 }, () => renderLabelSheetPdf({ labels, labName: "Test lab" })));
    const text = pdfText(pdfs[0]!, "labels");
    for (const number of [...f.rolls.map((r) => r.labNumber), f.coupon, f.specimen]) expect(text).toContain(number);
    expect(new Set(pdfs.map((p) => p.subarray(0, 4).toString("latin1")))).toEqual(new Set(["%PDF"]));
  });

  it("breaks long documents into whole pages: 21 labels a sheet, and a long roll table over several pages", async () => {
    const labels = Array.from({ length: 45 }, (_, i) => ({ kind: "roll" as const, labNumber: `R26-${String(i + 1).padStart(5, "0")}`, description: "ORG · PRJ · roll R-1 · lot L1", qrSvg: "<svg viewBox=\"0 0 1 1\"></svg>" }));
    const pages = pdfText(await renderLabelSheetPdf({ labels, labName: "Test lab" }), "labels-45").split("\f").filter((page) => page.trim());
    expect(pages).toHaveLength(3);
    expect(pages[1]).toContain("R26-00022");
    expect(pages[1]).not.toContain("R26-00043");

    const receipt = await getShipmentReceipt({ actor: f.clerk, labNumber: f.shipment });
    const rolls = Array.from({ length: 40 }, (_, i) => ({ ...receipt.rolls[0]!, labNumber: `R26-${String(90001 + i)}`, rollNumber: `RN-${i + 1}` }));
    const text = pdfText(await renderReceiptPdf({ receipt: { ...receipt, rolls }, lab: await getLetterhead() }), "receipt-long");
    const receiptPages = text.split("\f").filter((page) => page.trim());
    expect(receiptPages.length).toBeGreaterThan(1);
    receiptPages.forEach((page, i) => expect(page).toContain(`Page ${i + 1} of ${receiptPages.length}`));
    expect(receiptPages[1]).toContain("Lab number"); // the table header repeats on the new page
    expect(text).toContain("R26-90040");
    // The sign-off and the closing sentence are never split across pages.
    expect(receiptPages.find((page) => page.includes("Acknowledged by"))).toContain("condition of the shipment");
  });
});

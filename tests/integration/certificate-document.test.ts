import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CERTIFICATE_CAUTIONS } from "@/lib/certificates/certificate-wording";
import { newVerificationCode, VERIFICATION_RANDOM_BYTES } from "@/lib/certificates/verification-code";
import { renderCertificateHtml, renderCertificatePdf } from "@/lib/server/certificates/render-certificate-pdf";
import { verifyCertificate } from "@/lib/server/certificates/verify-certificate";
import { withActor, type Tx } from "@/lib/server/db/transaction";
import { closePdfBrowser } from "@/lib/server/pdf/render-pdf";
import { findBrowser } from "../../e2e/support/find-browser";
import { makeCertificateSnapshot } from "../support/make-certificate-snapshot";
import { makeProject, makeUser, unique } from "../support/factories";

const newCode = () => newVerificationCode(randomBytes(VERIFICATION_RANDOM_BYTES));
const digest = () => randomBytes(32).toString("hex");
const DAY = 86_400_000;

type Codes = { valid: string; superseded: string; replacement: string; revoked: string; draft: string; draftSuccessorOf: string };
let codes: Codes;
let numbers: Record<"valid" | "superseded" | "revoked", string>;
let validDigest: string;
let issuedAt: Date;

// Revisions are made as the database allows (migration 20261201225500_certificate_rules): drafted, then
// issued; an issued one may afterwards only become superseded or revoked, with the matching time.
async function draftThenIssue(tx: Tx, data: { certificateId: string; revision: number; verificationCode: string; supersedesId?: string; issuedAt: Date }) {
  const draft = await tx.certificateRevision.create({ data: { certificateId: data.certificateId, revision: data.revision, verificationCode: data.verificationCode, supersedesId: data.supersedesId } });
  return tx.certificateRevision.update({ where: { id: draft.id }, data: { status: "ISSUED", issuedAt: data.issuedAt, pdfSha256: digest() } });
}

beforeAll(async () => {
  const project = await makeProject();
  const qa = await makeUser("QA_MANAGER");
  issuedAt = new Date(Date.now() - 3 * DAY);
  codes = { valid: newCode(), superseded: newCode(), replacement: newCode(), revoked: newCode(), draft: newCode(), draftSuccessorOf: newCode() };
  numbers = { valid: unique("C26"), superseded: unique("C26"), revoked: unique("C26") };
  validDigest = await withActor(qa, async (tx) => {
    const certificate = (number: string) => tx.certificate.create({ data: { number, projectId: project.id, clientOrganizationId: project.clientOrganizationId } });

    const valid = await draftThenIssue(tx, { certificateId: (await certificate(numbers.valid)).id, revision: 1, verificationCode: codes.valid, issuedAt });

    const corrected = await certificate(numbers.superseded);
    const first = await draftThenIssue(tx, { certificateId: corrected.id, revision: 1, verificationCode: codes.superseded, issuedAt: new Date(issuedAt.getTime() - 10 * DAY) });
    await draftThenIssue(tx, { certificateId: corrected.id, revision: 2, verificationCode: codes.replacement, supersedesId: first.id, issuedAt });
    await tx.certificateRevision.update({ where: { id: first.id }, data: { status: "SUPERSEDED", supersededAt: issuedAt } });

    const withdrawn = await draftThenIssue(tx, { certificateId: (await certificate(numbers.revoked)).id, revision: 1, verificationCode: codes.revoked, issuedAt });
    await tx.certificateRevision.update({ where: { id: withdrawn.id }, data: { status: "REVOKED", revokedAt: new Date() } });

    // A certificate still in draft, and an issued one whose correction is only drafted so far.
    await tx.certificateRevision.create({ data: { certificateId: (await certificate(unique("C26"))).id, revision: 1, verificationCode: codes.draft } });
    const pending = await certificate(unique("C26"));
    const standing = await draftThenIssue(tx, { certificateId: pending.id, revision: 1, verificationCode: codes.draftSuccessorOf, issuedAt });
    await tx.certificateRevision.create({ data: { certificateId: pending.id, revision: 2, verificationCode: newCode(), supersedesId: standing.id } });
    return valid.pdfSha256!;
  });
});

afterAll(async () => {
  await closePdfBrowser();
});

describe("verifyCertificate (public)", () => {
  it("answers valid with the number, revision, issue date and PDF digest, and nothing else", async () => {
    const result = await verifyCertificate(codes.valid);
    expect(result).toEqual({ status: "VALID", number: numbers.valid, revision: 1, issuedAt, pdfSha256: validDigest, supersededBy: null, since: null });
  });

  it("finds a code however it was typed", async () => {
    const typed = ` ${codes.valid.replace(/-/g, " ").toLowerCase()} `;
    expect(await verifyCertificate(typed)).toMatchObject({ status: "VALID", number: numbers.valid });
  });

  it("says a superseded revision is superseded, and by which revision; the replacement is valid", async () => {
    expect(await verifyCertificate(codes.superseded)).toMatchObject({ status: "SUPERSEDED", number: numbers.superseded, revision: 1, supersededBy: { revision: 2 } });
    expect(await verifyCertificate(codes.replacement)).toMatchObject({ status: "VALID", number: numbers.superseded, revision: 2, supersededBy: null });
  });

  it("says a revoked certificate is revoked", async () => {
    expect(await verifyCertificate(codes.revoked)).toMatchObject({ status: "REVOKED", number: numbers.revoked, supersededBy: null });
  });

  it("treats a draft as unknown, and a drafted correction does not yet unseat the issued revision", async () => {
    expect(await verifyCertificate(codes.draft)).toBeNull();
    expect(await verifyCertificate(codes.draftSuccessorOf)).toMatchObject({ status: "VALID", supersededBy: null });
  });

  it("answers null for an unknown or malformed code", async () => {
    expect(await verifyCertificate("ZZZZ-ZZZZ-ZZZZ")).toBeNull();
    expect(await verifyCertificate("not a code!")).toBeNull();
    expect(await verifyCertificate("")).toBeNull();
  });
});

describe("certificate HTML", () => {
  it("holds a 2D code for the verification address", async () => {
    const html = await renderCertificateHtml(makeCertificateSnapshot({ tests: 1 }));
    expect(html.startsWith("<!doctype html>")).toBe(true);
    expect(html).toMatch(/<div class="cert-qr"><svg[^>]*viewBox="0 0 \d+ \d+"/);
  });
});

// Chromium is a system package: the PDF check skips without it, unless the run insists on it.
const browser = findBrowser();
if (!browser && process.env.SEEPLINE_REQUIRE_BROWSER === "1") throw new Error("SEEPLINE_REQUIRE_BROWSER=1 but no Chromium was found (set CHROME_PATH or install Debian's chromium).");
if (!browser) console.warn("certificate-document: no Chromium found, so the PDF check is skipped (install Debian's chromium or set CHROME_PATH).");

describe.skipIf(!browser)("certificate PDF (Chromium)", () => {
  const dir = mkdtempSync(path.join(os.tmpdir(), "seepline-certificate-test-"));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("prints the number, results, conformance statements, page numbers and both cautions", async () => {
    const snapshot = makeCertificateSnapshot({ tests: 3, chartPoints: 60, supersedes: true });
    const pdf = await renderCertificatePdf(snapshot);
    expect(pdf.subarray(0, 4).toString("latin1")).toBe("%PDF");
    const file = path.join(dir, "certificate.pdf");
    writeFileSync(file, pdf);
    if (process.env.SEEPLINE_KEEP_PDFS) writeFileSync(path.join(process.env.SEEPLINE_KEEP_PDFS, "certificate.pdf"), pdf);
    const raw = execFileSync("pdftotext", [file, "-"], { encoding: "utf8" });
    const pages = raw.split("\f").filter((page) => page.trim());
    const text = raw.replace(/\s+/g, " ");

    expect(text).toContain(snapshot.number);
    expect(text).toContain(snapshot.tests[0]!.results[0]!.display); // "2.4 × 10⁻⁹ m³/m²/s"
    expect(text).toContain("8.70 × 10⁻¹¹ m/s, rounded to 9 × 10⁻¹¹ m/s (ASTM E29, half to even), exceeds the maximum of 5 × 10⁻¹¹ m/s: does not conform.");
    expect(text).toContain("Amended certificate. Revision 2 supersedes revision 1, which is no longer valid. Reason: Client address corrected; the results are unchanged.");
    expect(text).toContain(snapshot.verificationCode);
    for (const caution of CERTIFICATE_CAUTIONS) expect(text).toContain(caution);
    expect(pages.length).toBeGreaterThan(1);
    // The footer names the certificate and counts pages on every page.
    pages.forEach((page, i) => {
      expect(page).toMatch(new RegExp(`page ${i + 1} of ${pages.length}`, "i"));
      expect(page).toContain(`Certificate ${snapshot.number} · revision 2`);
    });
    // The signatory, the verification box and the cautions are never split over two pages.
    expect(pages.find((page) => page.includes("Authorised for issue by"))).toContain(CERTIFICATE_CAUTIONS[1].slice(0, 40));
  });
});

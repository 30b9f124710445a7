import { describe, expect, it } from "vitest";
import { certificatePdfFileName, revisionStanding } from "@/lib/certificates/revision-standing";

const since = new Date("2026-11-30T10:00:00Z");

// One wording for the verification page and the portal; the rule (a revoked certificate is not passed on
// as valid, a superseded one is kept but marked) follows ISO/IEC 17025:2017 7.8.8 on amended reports.
describe("what a revision's status means to its holder", () => {
  it("valid: downloadable, plain", () => {
    expect(revisionStanding({ status: "ISSUED", supersededByRevision: null, since: null })).toEqual({
      tone: "ok", label: "Issued, valid", headline: "Valid.", detail: "This is the current revision of the certificate.", clientMayDownload: true,
    });
  });

  it("superseded: names the replacing revision and the date, still downloadable", () => {
    const standing = revisionStanding({ status: "SUPERSEDED", supersededByRevision: 2, since });
    expect(standing).toMatchObject({ tone: "warn", label: "Superseded by revision 2", headline: "Superseded by revision 2 on 2026-11-30.", clientMayDownload: true });
    expect(standing.detail).toBe("This revision has been replaced and no longer stands; ask the issuer for the revision 2 certificate.");
    expect(revisionStanding({ status: "SUPERSEDED", supersededByRevision: null, since: null })).toMatchObject({ label: "Superseded", headline: "Superseded." });
  });

  it("revoked: says so with the date, and is not offered to the client", () => {
    expect(revisionStanding({ status: "REVOKED", supersededByRevision: null, since })).toMatchObject({
      tone: "bad", label: "Revoked", headline: "Revoked on 2026-11-30.", clientMayDownload: false,
    });
  });

  it("names the file after its standing", () => {
    expect(certificatePdfFileName("Q26-00001", 1, "ISSUED")).toBe("Q26-00001-rev1.pdf");
    expect(certificatePdfFileName("Q26-00001", 1, "SUPERSEDED")).toBe("Q26-00001-rev1-superseded.pdf");
    expect(certificatePdfFileName("Q26-00001", 2, "REVOKED")).toBe("Q26-00001-rev2-REVOKED.pdf");
  });
});

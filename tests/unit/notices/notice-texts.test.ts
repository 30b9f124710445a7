import { describe, expect, it } from "vitest";
import { calibrationsDueNotice, certificateIssuedNotice } from "@/lib/notices/notice-texts";

const base = { labName: "Quillfen Liner Laboratory", clientName: "Marrowdale Waste Authority", number: "Q26-00007", reason: "", projectCode: "MWA-CELL4", projectName: "Cell 4 liner", issuedAtText: "2026-12-02 10:00 CET", verifyUrl: "https://lab.example.test/verify/ABCD", portalUrl: "https://lab.example.test/portal" };

describe("notice texts (invented lab and client)", () => {
  it("a first issue names the certificate, the project, where to verify it, and that results apply only to the specimens tested", () => {
    const n = certificateIssuedNotice({ ...base, revision: 1 });
    expect(n.subject).toBe("Certificate Q26-00007 issued: project MWA-CELL4");
    expect(n.text).toContain("Certificate Q26-00007 for project MWA-CELL4 (Cell 4 liner) was issued by Quillfen Liner Laboratory on 2026-12-02 10:00 CET.");
    expect(n.text).toContain("https://lab.example.test/verify/ABCD");
    expect(n.text).toMatch(/apply only to the specimens tested/);
    expect(n.text).not.toMatch(/replaces/);
  });

  it("a revision says what it replaces and why", () => {
    const n = certificateIssuedNotice({ ...base, revision: 3, reason: "Specimen thickness corrected" });
    expect(n.subject).toBe("Revision 3 of certificate Q26-00007 issued: project MWA-CELL4");
    expect(n.text).toContain("It replaces revision 2, because: Specimen thickness corrected. The earlier revision is superseded");
  });

  it("the lab's notice lists each instrument with its due date and counts the overdue ones", () => {
    const n = calibrationsDueNotice({ labName: "Quillfen Liner Laboratory", withinDays: 14, equipmentUrl: "https://lab.example.test/equipment", due: [
      { assetTag: "CELL-06", equipmentName: "Permeameter cell 6", reference: "CAL-CELL-06-2025", dueAtText: "2026-11-20 09:00 CET", overdue: true },
      { assetTag: "PT-02", equipmentName: "Cell pressure transducer", reference: "CAL-PT-02-2025", dueAtText: "2026-12-10 09:00 CET", overdue: false },
    ] });
    expect(n.subject).toBe("2 calibrations due within 14 days");
    expect(n.text).toContain("(1 already overdue)");
    expect(n.text).toContain("- CELL-06 Permeameter cell 6: calibration CAL-CELL-06-2025 was due 2026-11-20 09:00 CET");
    expect(n.text).toContain("- PT-02 Cell pressure transducer: calibration CAL-PT-02-2025 is due 2026-12-10 09:00 CET");
  });
});

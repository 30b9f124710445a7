import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { StaffQueues } from "@/components/home/staff-queues";
import type { HomeQueues } from "@/lib/server/queues/get-home-queues";

// The home page's queues as static HTML, from queue rows alone (the queries are checked with the database).
const NOW = new Date("2026-12-10T12:00:00Z");
const hoursAgo = (h: number) => new Date(NOW.getTime() - h * 3_600_000);
const name = (n: string) => ({ name: n });

function allQueues(): HomeQueues {
  return {
    shipments: [{ id: "s1", labNumber: "S26-00031", receivedAt: hoursAgo(5), deliveredBy: "Courier", clientOrganization: name("Marrowdale Waste Authority"), project: name("Cell 4 landfill expansion"), _count: { rolls: 3 } }],
    rollsToCut: [{ id: "r1", labNumber: "R26-00112", rollNumber: "R-4107", product: "Needle-punched GCL", state: "STORED", project: name("Cell 4 landfill expansion") }],
    specimens: [{ id: "sp1", labNumber: "SP26-00045", intendedMethodCode: "D5887", preparedAt: hoursAgo(14), coupon: { roll: { labNumber: "R26-00112", project: name("Cell 4 landfill expansion") } } }],
    runs: [{ id: "run1", labNumber: "H26-00019", state: "PERMEATING", methodCode: "D5887", assignedAt: hoursAgo(50), cell: { assetTag: "CELL-03" }, specimen: { labNumber: "SP26-00040" }, performedBy: name("Bram Oyelaran") }],
    reviews: [
      { id: "run2", labNumber: "H26-00017", methodCode: "D6766", submittedAt: hoursAgo(72), performedBy: name("Bram Oyelaran"), specimen: { labNumber: "SP26-00038" } },
      { id: "run3", labNumber: "H26-00018", methodCode: "D5887", submittedAt: null, performedBy: name("Signe Pellow"), specimen: { labNumber: "SP26-00039" } },
    ],
    calibrations: [
      { id: "e1", assetTag: "CELL-06", name: "Cell 6", kind: "PERMEAMETER_CELL", dueAt: new Date("2026-12-01T00:00:00Z") },
      { id: "e2", assetTag: "BAL-01", name: "Bench balance", kind: "BALANCE", dueAt: new Date("2026-12-20T00:00:00Z") },
    ],
    projects: null,
    indexTestsWaiting: [{ rollLabNumber: "R26-00112", rollNumber: "R-4107", projectName: "Cell 4 landfill expansion", methods: [{ code: "D5890", title: "Swell index" }, { code: "D5891", title: "Fluid loss" }] }],
    // Tested six days before it was recorded: it has waited for review since it was recorded.
    indexTestsToReview: [{ id: "it1", methodCode: "D5993", testedAt: hoursAgo(146), createdAt: hoursAgo(2), performedBy: name("Signe Pellow"), roll: { labNumber: "R26-00110" } }],
  } as unknown as HomeQueues;
}

const html = (queues: HomeQueues, zone?: string) => renderToStaticMarkup(createElement(StaffQueues, { queues, now: NOW, zone }));
/** The text of the card with this test id, tags dropped. */
function card(markup: string, testId: string): string | null {
  const body = markup.match(new RegExp(`<section[^>]*data-testid="${testId}"[^>]*>([\\s\\S]*?)</section>`))?.[1];
  return body === undefined ? null : body.replace(/<[^>]+>/g, " ").replace(/\s+/g, " ").trim();
}

describe("staff home queues", () => {
  it("shows each queue it is given under its own heading, with its column headings, rows and links", () => {
    const out = html(allQueues());
    expect(card(out, "queue-shipments")).toBe("Shipments to acknowledge 1 shown Shipment Client / project Rolls Waiting S26-00031 Marrowdale Waste Authority Cell 4 landfill expansion 3 5 h");
    expect(card(out, "queue-rolls")).toBe("Rolls waiting to be cut 1 shown Roll Project State R26-00112 R-4107 Cell 4 landfill expansion Stored");
    expect(card(out, "queue-specimens")).toBe("Specimens waiting for a cell 1 shown Specimen From roll Method Prepared SP26-00045 R26-00112 Cell 4 landfill expansion ASTM D5887 2026-12-09");
    expect(card(out, "queue-index-tests")).toBe("Index tests waiting 1 shown Roll Project Tests the specification asks for R26-00112 R-4107 Cell 4 landfill expansion Swell index , Fluid loss");
    expect(card(out, "queue-index-reviews")).toBe("Index tests to review 1 shown Test Roll Technician Waiting ASTM D5993 R26-00110 Signe Pellow 2 h");
    expect(card(out, "queue-runs")).toBe("Runs in progress 1 shown Run Cell Specimen State By H26-00019 ASTM D5887 CELL-03 SP26-00040 Permeating Bram Oyelaran");
    expect(card(out, "queue-reviews")).toBe("Results to review 2 shown Run Specimen Technician Waiting H26-00017 ASTM D6766 SP26-00038 Bram Oyelaran 3 d H26-00018 ASTM D5887 SP26-00039 Signe Pellow —");
    expect(card(out, "queue-calibrations")).toBe("Calibrations due within 30 days 2 shown Asset Kind Due CELL-06 Permeameter cell overdue 2026-12-01 BAL-01 Balance 2026-12-20");
    expect(out).toContain('href="/intake/shipments/S26-00031"');
    expect(out).toContain('href="/runs/new?specimen=sp1"');
    expect(out).toContain('href="/index-tests/new/R26-00112/D5891"');
    expect(out).toContain('<tr data-roll="R26-00112">');
    expect(out).toContain('href="/review/H26-00017"');
    expect(out).toContain('<span class="state state-bad">overdue 2026-12-01</span>');
  });

  it("leaves out the queues the role is not given and says so plainly when a queue is empty", () => {
    const q = { ...allQueues(), shipments: null, rollsToCut: null, specimens: null, indexTestsWaiting: null, indexTestsToReview: null, calibrations: null, runs: [], reviews: [] } as HomeQueues;
    const out = html(q);
    for (const id of ["queue-shipments", "queue-rolls", "queue-specimens", "queue-index-tests", "queue-index-reviews", "queue-calibrations"]) expect(card(out, id)).toBeNull();
    expect(card(out, "queue-runs")).toBe("Runs in progress none No run is in progress.");
    expect(card(out, "queue-reviews")).toBe("Results to review none Nothing is waiting for review.");
    expect(out).not.toContain("<table");
  });

  it("writes dates in the lab's time zone", () => {
    const out = html(allQueues(), "Pacific/Auckland");
    expect(card(out, "queue-specimens")).toContain("2026-12-10");
    expect(card(out, "queue-calibrations")).toContain("overdue 2026-12-01");
  });
});

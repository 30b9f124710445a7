import { describe, expect, it } from "vitest";
import { certificateCoverage } from "@/lib/certificates/property-coverage";

describe("what a certificate covers of its specification", () => {
  const properties = [
    { property: "INDEX_FLUX", label: "Index flux", testingFrequencyAreaM2: 25_000 },
    { property: "SWELL_INDEX", label: "Bentonite swell index", testingFrequencyPerLot: true },
    { property: "FLUID_LOSS", label: "Bentonite fluid loss" },
    { property: "TENSILE_STRENGTH", label: "Tensile strength" },
    { property: "PEEL_STRENGTH", label: "Peel strength" },
  ];
  const rows = [
    {
      rollLabNumber: "R26-00001",
      cells: [
        { property: "INDEX_FLUX" as const, status: "conforms" as const, source: "T26-00001" },
        { property: "SWELL_INDEX" as const, status: "not required" as const, source: null },
        { property: "FLUID_LOSS" as const, status: "in progress" as const, source: "T26-00002" },
        { property: "TENSILE_STRENGTH" as const, status: "returned" as const, source: "Tensile strength (ASTM D6768)" },
        { property: "PEEL_STRENGTH" as const, status: "fails" as const, source: "Peel strength (ASTM D6496)" },
      ],
    },
    { rollLabNumber: "R26-00002", cells: [] },
  ];

  it("gives every property of each reported roll a status, and a reason for each one not reported", () => {
    const c = certificateCoverage(properties, rows, new Set(["R26-00001 INDEX_FLUX"]));
    expect(c.rows).toEqual([{ rollLabNumber: "R26-00001", cells: expect.any(Array) }]);
    expect(c.rows[0]!.cells.map((x) => x.status)).toEqual(["reported", "not required", "pending", "pending", "not included"]);
    expect(c.notTested).toEqual([
      "Bentonite swell index of R26-00001: not required for this roll by the specification's sampling frequency (1 per lot); other rolls carry the test.",
      "Bentonite fluid loss of R26-00001: pending: T26-00002 is under way.",
      "Tensile strength of R26-00001: pending: Tensile strength (ASTM D6768) was returned to the technician for changes.",
      // An approved result left out (a failing one too) is said to be left out, never passed over in silence.
      "Peel strength of R26-00001: tested and approved, but not included in this certificate.",
    ]);
    expect(c.otherRolls).toEqual(["R26-00002"]);
  });

  it("a property with no cell for the roll reads not tested", () => {
    const c = certificateCoverage(properties.slice(0, 2), [{ rollLabNumber: "R26-00003", cells: [] }], new Set(["R26-00003 INDEX_FLUX"]));
    expect(c.notTested).toEqual(["Bentonite swell index of R26-00003: not tested: the specification asks for it and no test has been recorded yet."]);
  });
});

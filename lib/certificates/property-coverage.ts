/**
 * What a certificate covers of its specification: for every roll it reports on, every property the
 * specification lists, either reported here or the reason it is not (not required for the roll by the
 * sampling frequency, pending, not tested yet, approved but left out of this certificate); and the
 * project's rolls it does not cover at all. Pure: from the conformance matrix and what the certificate includes.
 */
import type { MatrixCell } from "../conformance/conformance-matrix";
import { describeTestingFrequency } from "../conformance/sampling-coverage";

export type CoverageProperty = { property: string; label: string; testingFrequencyAreaM2?: number | null; testingFrequencyPerLot?: boolean };
export type CoverageMatrixRow = { rollLabNumber: string; cells: Array<Pick<MatrixCell, "property" | "status" | "source">> };

export type CertificateCoverageCell = {
  property: string;
  /** reported: on this certificate; the others say why not. */
  status: "reported" | "not required" | "pending" | "not tested" | "not included";
  /** Why the property is not reported for the roll (empty when reported). */
  reason: string;
};

export type CertificateCoverage = {
  properties: Array<{ property: string; label: string }>;
  rows: Array<{ rollLabNumber: string; cells: CertificateCoverageCell[] }>;
  /** One sentence per property of a roll that is not reported, with the reason. */
  notTested: string[];
  /** The project's rolls with no result on this certificate. */
  otherRolls: string[];
};

function reasonFor(cell: Pick<MatrixCell, "status" | "source">, property: CoverageProperty): Omit<CertificateCoverageCell, "property"> {
  switch (cell.status) {
    case "not required":
      return { status: "not required", reason: `not required for this roll by the specification's sampling frequency (${describeTestingFrequency(property.testingFrequencyAreaM2 ?? null, property.testingFrequencyPerLot ?? false)}); other rolls carry the test` };
    case "awaiting review":
      return { status: "pending", reason: `pending: ${cell.source ?? "the test"} awaits the QA manager's review` };
    case "returned":
      return { status: "pending", reason: `pending: ${cell.source ?? "the test"} was returned to the technician for changes` };
    case "in progress":
      return { status: "pending", reason: `pending: ${cell.source ?? "the test"} is under way` };
    case "not tested":
      return { status: "not tested", reason: "not tested: the specification asks for it and no test has been recorded yet" };
    default:
      // An approved result exists but this certificate does not include it (another certificate may report it).
      return { status: "not included", reason: "tested and approved, but not included in this certificate" };
  }
}

/**
 * The coverage of a certificate: `rows` are the conformance matrix's rows (every roll of the project),
 * `reported` the keys "<roll lab number> <property>" the certificate includes a result for.
 */
export function certificateCoverage(properties: readonly CoverageProperty[], rows: readonly CoverageMatrixRow[], reported: ReadonlySet<string>): CertificateCoverage {
  const covered = rows.filter((r) => properties.some((p) => reported.has(`${r.rollLabNumber} ${p.property}`)));
  const notTested: string[] = [];
  const out = covered.map((row) => ({
    rollLabNumber: row.rollLabNumber,
    cells: properties.map((p): CertificateCoverageCell => {
      if (reported.has(`${row.rollLabNumber} ${p.property}`)) return { property: p.property, status: "reported", reason: "" };
      const cell = row.cells.find((c) => c.property === p.property) ?? { status: "not tested" as const, source: null };
      const why = reasonFor(cell, p);
      notTested.push(`${p.label} of ${row.rollLabNumber}: ${why.reason}.`);
      return { property: p.property, ...why };
    }),
  }));
  return {
    properties: properties.map((p) => ({ property: p.property, label: p.label })),
    rows: out,
    notTested,
    otherRolls: rows.filter((r) => !covered.includes(r)).map((r) => r.rollLabNumber),
  };
}


import { conformanceSummary } from "@/lib/results/conformance-summary";
import { formatResultValue, formatUncertainty } from "@/lib/results/format-result";
import type { CertificateIndexTest, CertificateResultLine, CertificateSnapshot, CertificateTest } from "@/lib/certificates/certificate-snapshot";
import { certificateCoverage } from "@/lib/certificates/property-coverage";

/**
 * Invented certificate snapshots, worded as buildCertificateSnapshot words real ones (lib/results formatting
 * and conformance) for the document tests, the benchmark and looking at the PDF: an invented
 * lab and client, 1-3 tests (index flux that conforms, hydraulic conductivity that conforms, and one with a
 * salt solution that does not), and charts of any length. Deterministic for a given seed.
 */
export type SnapshotOptions = {
  tests?: number; chartPoints?: number; seed?: number; supersedes?: boolean; deviations?: boolean;
  /** The lab's time zone written into the snapshot (older snapshots have none: UTC). */
  timeZone?: string;
  /** Give each roll its condition on arrival, as snapshots from receipts with per-roll remarks carry. */
  conditions?: boolean;
  /** Carry every item ISO/IEC 17025 7.8.2.1 and 7.8.3.1 asks for, as snapshots built since issue 12 do. */
  complete?: boolean;
  /** Add index tests (tensile strength and swell index on the first roll) and the specification's coverage. */
  indexTests?: boolean;
};

function random(seed: number) {
  let s = seed >>> 0 || 1;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

const HOUR = 3_600_000;

function result(property: string, label: string, value: number, unit: string, uncertainty: number, limit: string): CertificateResultLine {
  return {
    property, label, value, unit, display: formatResultValue(value, unit), expandedUncertainty: uncertainty, uncertaintyDisplay: formatUncertainty(uncertainty, unit, { value }),
    conformance: conformanceSummary({ value, unit }, { limitText: limit, unit, direction: "MAXIMUM", conformanceMethod: "ROUNDING" }),
  };
}

const TEMPLATES = [
  {
    method: { code: "ASTM D5887", title: "Index flux through saturated GCL specimens, flexible-wall permeameter" },
    permeant: "de-aired water", flux: 2.4e-9, k: 3.1e-11,
    results: () => [result("INDEX_FLUX", "Index flux", 2.43e-9, "m3/m2/s", 0.21e-9, "1e-8")],
  },
  {
    method: { code: "ASTM D5084", title: "Hydraulic conductivity, flexible-wall permeameter, method C (falling head, rising tail)" },
    permeant: "de-aired water", flux: 1.9e-9, k: 2.7e-11,
    results: () => [result("HYDRAULIC_CONDUCTIVITY", "Hydraulic conductivity at 20 °C", 2.7e-11, "m/s", 0.31e-11, "5e-11")],
  },
  {
    method: { code: "ASTM D6766", title: "Hydraulic properties of GCLs permeated with potentially incompatible liquids" },
    permeant: "calcium chloride solution, CaCl2, 0.1 mol/L", flux: 6.3e-9, k: 8.7e-11,
    results: () => [
      result("HYDRAULIC_CONDUCTIVITY", "Hydraulic conductivity at 20 °C", 8.7e-11, "m/s", 0.92e-11, "5e-11"),
      result("INDEX_FLUX", "Index flux", 6.3e-9, "m3/m2/s", 0.64e-9, "1e-8"),
    ],
  },
];

export function makeCertificateSnapshot(options: SnapshotOptions = {}): CertificateSnapshot {
  const rand = random(options.seed ?? 7);
  const testCount = Math.min(3, Math.max(1, options.tests ?? 2));
  const points = options.chartPoints ?? 24;
  const issuedAt = Date.UTC(2026, 11, 14, 9, 30);
  const receivedAt = issuedAt - 30 * 24 * HOUR;
  const revision = options.supersedes ? 2 : 1;
  const code = "7Q4K-2M9X-HT3B";

  const rolls = ["R26-00412", "R26-00413"];
  const tests: CertificateTest[] = Array.from({ length: testCount }, (_, i) => {
    const t = TEMPLATES[i]!;
    const roll = rolls[i % rolls.length]!;
    const chart = Array.from({ length: points }, (_, n) => {
      // Flux settles from about twice its final value, with a little scatter, as a hydrating GCL does.
      const settle = 1 + 1.1 * Math.exp(-n / Math.max(2, points / 8));
      const scatter = 1 + 0.05 * (rand() - 0.5);
      return { hours: Math.round((n + 1) * (i === 2 ? 12 : 6) * 10) / 10, flux: t.flux * settle * scatter, k20: t.k * settle * scatter * (1 + 0.01 * (rand() - 0.5)) };
    });
    return {
      runLabNumber: `T26-0009${i + 1}`, specimenLabNumber: `S26-0031${i + 1}`, rollLabNumber: roll,
      method: t.method,
      conditions: { effectiveStressKPa: 34.5, headKPa: 14.0 + i * 0.2, permeant: t.permeant, meanTemperatureC: 20.6 - i * 0.4, cell: `CELL-0${i + 1}`, thicknessMm: 5.92 + i * 0.11 },
      terminatedAt: new Date(issuedAt - (6 - i) * 24 * HOUR).toISOString(),
      termination: i === 2 ? "ended early: client asked for the result after 18 days" : "termination criteria met",
      deviations: options.deviations && i === 0 ? ["Permeation paused for 3 h on day 2 (power cut); readings before and after are kept, the pause is excluded from the intervals."] : [],
      results: (i === 0 ? t.results().map((r) => ({ ...r, uncertaintyContributors: ["burette readings 1.8 % (BP-01 calibration CAL-BP-01-2026)", "die diameter 0.12 % (lab value, ASTM D5887 settings, version 2)", "time stamps 0.001 % (CLK-01 calibration CAL-CLK-01-2026)"] })) : t.results())
        .map((r) => (options.complete ? { ...r, coverage: "coverage factor k = 2, for a coverage probability of about 95 %" } : r)),
      ...(i === 0 && {
        calculation: "Falling head with rising tail (ASTM D5084 method C): the head across the specimen is the line-pressure difference plus the inflow burette level minus the outflow burette level, both above one datum (zeros 0 mm and 40 mm above it).",
        criteria: { settings: "ASTM D5887 settings, version 2", chosen: null, lines: [{ name: "Outflow/inflow ratio", limit: "0.75 ≤ outflow/inflow ≤ 1.25 for each of the last 4 intervals", met: true }] },
        leakage: "Apparatus leakage of cell CELL-01, checked 2026-10-01 (dummy specimen, 24 h): 2.1 × 10⁻¹³ m³/s, 1.1 % of the measured flow; ASTM D5887 asks for less than 10 %.",
        refills: 1,
        refillHours: [36.1],
      }),
      chart,
      performedBy: i % 2 ? "Tamsin Okerlund" : "Quenby Ardlow", approvedBy: "Ottilie Brannagh", approvedAt: new Date(issuedAt - (4 - i) * 24 * HOUR).toISOString(),
      ...(options.complete && {
        method: { ...t.method, edition: t.method.code.replace("ASTM ", "") + "-20" },
        dates: {
          mountedAt: new Date(receivedAt + 4 * 24 * HOUR).toISOString(),
          permeationStartedAt: new Date(receivedAt + 6 * 24 * HOUR).toISOString(),
          permeationEndedAt: new Date(issuedAt - (6 - i) * 24 * HOUR).toISOString(),
        },
        // 100 mm die: A = pi 100^2 / 4 = 7853.98 mm^2 (78.54 cm^2).
        specimen: {
          dieDiameterMm: 100, areaMm2: (Math.PI * 100 ** 2) / 4, initialThicknessMm: 7.1, initialMassG: 60.52, postTestThicknessMm: 5.92 + i * 0.11, postTestMassG: 118.4,
          moistureContentPct: 11.2, hydrationHours: 48, equilibrationHours: 24, effectiveStressKPa: 34.5, gradient: 240, permeant: t.permeant,
        },
      }),
    };
  });

  const custody = (roll: string, n: number) => [
    { at: new Date(receivedAt).toISOString(), action: "received", item: roll, by: "Edvin Harrowgill" },
    { at: new Date(receivedAt + 2 * HOUR).toISOString(), action: "stored", item: roll, by: "Edvin Harrowgill" },
    { at: new Date(receivedAt + 3 * 24 * HOUR).toISOString(), action: "cut", item: `C26-0020${n}`, by: "Quenby Ardlow" },
    { at: new Date(receivedAt + 3 * 24 * HOUR + HOUR).toISOString(), action: "prepared", item: `S26-0031${n}`, by: "Quenby Ardlow" },
    { at: new Date(receivedAt + 4 * 24 * HOUR).toISOString(), action: "mounted in a cell", item: `S26-0031${n}`, by: "Quenby Ardlow" },
    { at: new Date(receivedAt + 4 * 24 * HOUR + 2 * HOUR).toISOString(), action: "permeation started", item: `S26-0031${n}`, by: "Tamsin Okerlund" },
    { at: new Date(issuedAt - 6 * 24 * HOUR).toISOString(), action: "tested", item: `S26-0031${n}`, by: "Tamsin Okerlund" },
  ];
  const usedRolls = rolls.slice(0, Math.min(rolls.length, testCount));
  const indexTests = options.indexTests ? makeIndexTests(rolls[0]!, issuedAt) : undefined;

  return {
    number: "C26-00017",
    revision,
    reason: options.supersedes ? "Client address corrected; the results are unchanged" : "",
    verificationCode: code,
    verificationUrl: `https://lab.example.test/verify/${code}`,
    issuedAt: new Date(issuedAt).toISOString(),
    lab: { name: "Quillfen Liner Laboratory (invented)", address: "Unit 4, Quarry Lane\nTarnwick TW7 0QL", accreditation: "Accredited to ISO/IEC 17025 (invented accreditation no. 0000)", ...(options.timeZone ? { timeZone: options.timeZone } : {}) },
    client: { name: "Marrowdale Waste Authority (invented)", address: "12 Tipyard Road, Marrowdale" },
    project: { code: "MWA-C4", name: "Landfill cell 4 basal liner", siteName: "Marrowdale Tip", siteLocation: "Cell 4, east bench" },
    specification: { name: "MWA cell 4 GCL specification, rev. B (GRI-GCL3 limits)" },
    samples: usedRolls.map((roll, i) => ({
      rollLabNumber: roll, rollNumber: `GCL-44${71 + i}-A`, lotNumber: `L-2209-${i + 1}`, product: "Needle-punched GCL, sodium bentonite, 4.0 kg/m²",
      manufacturer: "Invented Mills", shipmentLabNumber: "S26-00031", receivedAt: new Date(receivedAt).toISOString(),
      ...(options.conditions ? { condition: i === 0 ? "Outer wrapping torn at one end; liner dry." : "" } : {}),
      custody: tests
        .filter((t) => t.rollLabNumber === roll)
        .flatMap((t, j) => custody(roll, Number(t.specimenLabNumber.slice(-1))).slice(j ? 2 : 0))
        .sort((a, b) => a.at.localeCompare(b.at)),
    })),
    tests,
    ...(indexTests && {
      indexTests,
      propertyCoverage: certificateCoverage(
        [
          { property: "INDEX_FLUX", label: "Index flux" }, { property: "HYDRAULIC_CONDUCTIVITY", label: "Hydraulic conductivity (20 °C)" },
          { property: "SWELL_INDEX", label: "Bentonite swell index", testingFrequencyPerLot: true }, { property: "FLUID_LOSS", label: "Bentonite fluid loss", testingFrequencyPerLot: true },
          { property: "TENSILE_STRENGTH", label: "Tensile strength", testingFrequencyAreaM2: 20_000 },
        ],
        [
          { rollLabNumber: rolls[0]!, cells: [{ property: "FLUID_LOSS", status: "awaiting review", source: "Fluid loss (ASTM D5891)" }] },
          { rollLabNumber: rolls[1]!, cells: [{ property: "SWELL_INDEX", status: "not required", source: null }, { property: "FLUID_LOSS", status: "not required", source: null }, { property: "TENSILE_STRENGTH", status: "not required", source: null }] },
          { rollLabNumber: "R26-00414", cells: [] },
        ],
        new Set([...tests.flatMap((t) => t.results.map((r) => `${t.rollLabNumber} ${r.property}`)), ...indexTests.flatMap((t) => t.results.map((r) => `${t.rollLabNumber} ${r.property}`))]),
      ),
    }),
    signatory: { name: "Ottilie Brannagh", role: "QA manager", meaning: "Reviewed the results and records and approved this certificate for issue", signedAt: new Date(issuedAt).toISOString() },
    supersedes: options.supersedes ? { revision: 1, reason: "Client address corrected; the results are unchanged" } : null,
    ...(options.complete && {
      client: { name: "Marrowdale Waste Authority (invented)", address: "12 Tipyard Road, Marrowdale", contact: "Ada Penhallow, ada.penhallow@marrowdale.test" },
      specification: { name: "MWA cell 4 GCL specification (GRI-GCL3 limits)", revision: "Rev. B, 2026-05" },
      decisionRule: "Index flux and hydraulic conductivity at 20 °C: ASTM E29 rounding method. The expanded uncertainty is stated beside each result but is not taken into account in the decision.",
      remarks: "Specimens cut at the lab from the roll samples as received.",
      unitSystem: "SI" as const,
      ...(options.supersedes && { changes: ['Remarks changed; they now read: "Specimens cut at the lab from the roll samples as received."'] }),
    }),
  };
}

/**
 * Two index tests on one roll, worded as buildIndexTestEntries words them. Tensile strength, ASTM D6768: five
 * 100 mm strips at 912, 887, 945, 901 and 865 N give 9.12, 8.87, 9.45, 9.01 and 8.65 kN/m, mean 4510 / 5 = 902 N
 * per 0.1 m = 9.02 kN/m (printed to two digits, 9.0), sample standard deviation sqrt(3544 / 4) = 29.8 N, 0.30
 * kN/m; against a minimum of 4 kN/m (E29 rounding: 9) it conforms. Swell index, ASTM D5890: 27 mL per 2 g
 * against a minimum of 24 conforms.
 */
function makeIndexTests(roll: string, issuedAt: number): CertificateIndexTest[] {
  const line = (property: string, label: string, value: number, unit: string, display: string, limitText: string, sd: string | null, count: number): CertificateResultLine => ({
    property, label, value, unit, display, expandedUncertainty: null, uncertaintyDisplay: null,
    uncertaintyNote: "The lab declares no expanded uncertainty for this method; the result is reported without one.",
    conformance: conformanceSummary({ value, unit }, { limitText, unit, direction: "MINIMUM", conformanceMethod: "ROUNDING" }),
    specimenCount: count, standardDeviationDisplay: sd,
  });
  const base = { performedBy: "Quenby Ardlow", approvedBy: "Ottilie Brannagh", approvedAt: new Date(issuedAt - 2 * 24 * HOUR).toISOString(), departures: [] };
  return [
    {
      ...base, rollLabNumber: roll, couponLabNumber: "C26-00209", method: { code: "D6768", title: "Tensile strength (ASTM D6768)", edition: "D6768/D6768M-20" },
      testedAt: new Date(issuedAt - 3 * 24 * HOUR).toISOString(), specimenValues: ["9.1 kN/m", "8.9 kN/m", "9.5 kN/m", "9.0 kN/m", "8.7 kN/m"],
      instruments: ["Tensile frame TF-01 (calibration CAL-TF-01-2026)", "Load cell LC-01 (calibration CAL-LC-01-2026)"],
      results: [line("TENSILE_STRENGTH", "Tensile strength", 9.02, "kN/m", "9.0 kN/m", "4", "0.30 kN/m", 5)],
    },
    {
      ...base, rollLabNumber: roll, couponLabNumber: null, method: { code: "D5890", title: "Swell index (ASTM D5890)", edition: "D5890-19" },
      testedAt: new Date(issuedAt - 3 * 24 * HOUR).toISOString(), specimenValues: ["27 mL/2 g"],
      instruments: ["Balance BAL-01 (calibration CAL-BAL-01-2026)", "Graduated cylinder GC-01 (calibration CAL-GC-01-2026)"],
      results: [line("SWELL_INDEX", "Bentonite swell index", 27, "mL/2 g", "27 mL/2 g", "24", null, 1)],
    },
  ];
}

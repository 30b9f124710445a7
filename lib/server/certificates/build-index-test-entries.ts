import "server-only";
import type { CertificateIndexTest, CertificateResultLine } from "@/lib/certificates/certificate-snapshot";
import { COVERAGE_STATEMENT, formatPropertyUncertainty, formatPropertyValue, type UnitSystem } from "@/lib/format/result-numbers";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { conformanceSummary } from "@/lib/results/conformance-summary";
import { TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";
import type { Tx } from "../db/transaction";
import type { ProjectLimits } from "../specifications/find-project-limits";

const EQUIPMENT_WORDS: Record<string, string> = { BALANCE: "Balance", OVEN: "Drying oven", GRADUATED_CYLINDER: "Graduated cylinder", FILTER_PRESS: "Filter press", TENSILE_FRAME: "Tensile frame", LOAD_CELL: "Load cell" };

type IndexEvaluationRecord = { specimenValues?: number[]; departures?: string[]; notes?: string[] };

/**
 * The index tests a certificate reports, from the approved index-test results its draft includes: one
 * entry per test (roll, coupon, method and edition, specimens, instruments, people), each with the included
 * results judged against the specification's limits. Also the roll and coupon ids, for the samples table.
 */
export async function buildIndexTestEntries(tx: Tx, options: { indexResultIds: string[]; limits: ProjectLimits | null; unitSystem: UnitSystem }): Promise<{ entries: CertificateIndexTest[]; rolls: Array<{ rollId: string; couponId: string | null }> }> {
  if (options.indexResultIds.length === 0) return { entries: [], rolls: [] };
  const included = new Set(options.indexResultIds);
  const tests = await tx.indexTest.findMany({
    where: { results: { some: { id: { in: options.indexResultIds } } } },
    orderBy: [{ roll: { labNumber: "asc" } }, { methodCode: "asc" }, { testedAt: "asc" }],
    include: {
      roll: { select: { labNumber: true } },
      coupon: { select: { labNumber: true } },
      methodSettingsVersion: { select: { version: true } },
      performedBy: { select: { name: true } },
      approvedBy: { select: { name: true } },
      results: { orderBy: { property: "asc" } },
      equipment: { include: { equipment: { select: { assetTag: true, kind: true } }, calibration: { select: { reference: true } } } },
    },
  });
  const methods = await tx.testMethod.findMany({ where: { code: { in: [...new Set(tests.map((t) => t.methodCode))] } }, select: { code: true, title: true, edition: true } });
  const entries = tests.map((test): CertificateIndexTest => {
    const method = methods.find((m) => m.code === test.methodCode);
    const title = isIndexMethodCode(test.methodCode) ? INDEX_METHODS[test.methodCode].title : (method?.title ?? test.methodCode);
    const record = (test.evaluation ?? {}) as IndexEvaluationRecord;
    const main = test.results.find((r) => r.property === (isIndexMethodCode(test.methodCode) ? INDEX_METHODS[test.methodCode].properties[0] : r.property)) ?? test.results[0];
    const results = test.results
      .filter((r) => included.has(r.id))
      .map((r): CertificateResultLine => {
        const limit = options.limits?.get(r.property as TestProperty) ?? null;
        return {
          property: r.property,
          label: TEST_PROPERTY_LABELS[r.property as TestProperty] ?? r.property,
          value: r.value,
          unit: r.unit,
          display: formatPropertyValue(r.property, r.value, r.unit, options.unitSystem).text,
          expandedUncertainty: r.expandedUncertainty,
          uncertaintyDisplay: formatPropertyUncertainty(r.property, r.expandedUncertainty, r.value, r.unit, options.unitSystem),
          ...(r.expandedUncertainty === null
            ? { uncertaintyNote: "The lab declares no expanded uncertainty for this method; the result is reported without one." }
            : { coverage: r.coverageFactor && r.coverageFactor !== 2 ? `coverage factor k = ${r.coverageFactor}` : COVERAGE_STATEMENT }),
          conformance: limit ? conformanceSummary({ value: r.value, unit: r.unit }, limit) : null,
          specimenCount: r.specimenCount,
          standardDeviationDisplay: r.standardDeviation === null ? null : formatPropertyValue(r.property, r.standardDeviation, r.unit, options.unitSystem).text,
        };
      });
    return {
      rollLabNumber: test.roll.labNumber,
      couponLabNumber: test.coupon?.labNumber ?? null,
      method: { code: test.methodCode, title, edition: method?.edition || undefined },
      testedAt: test.testedAt.toISOString(),
      specimenValues: main ? (record.specimenValues ?? []).map((v) => formatPropertyValue(main.property, v, main.unit, options.unitSystem).text) : [],
      departures: record.departures ?? [],
      conditions: record.notes ?? [],
      instruments: test.equipment.map((e) => `${EQUIPMENT_WORDS[e.equipment.kind] ?? e.role} ${e.equipment.assetTag}${e.calibration ? ` (calibration ${e.calibration.reference})` : ""}`),
      results,
      performedBy: test.performedBy.name,
      approvedBy: test.approvedBy?.name ?? "—",
      approvedAt: test.approvedAt?.toISOString() ?? "",
    };
  });
  return { entries, rolls: tests.map((t) => ({ rollId: t.rollId, couponId: t.couponId })) };
}

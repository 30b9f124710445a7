import "server-only";
import { inSentence } from "@/lib/format/sentence-case";
import { INDEX_METHODS, isIndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";
import type { Db } from "../db/client";
import type { Tx } from "../db/transaction";
import { LIVE_REVISION_STATES } from "./certificate-collision";
import { indexTestName } from "./index-results";

export type FreeIndexResult = {
  id: string;
  property: TestProperty;
  value: number;
  unit: string;
  rollLabNumber: string;
  /** The shipment the roll arrived in (a certificate may cover one shipment's rolls). */
  shipmentLabNumber: string;
  project: { id: string; name: string; code: string; client: string };
  /** "roll R26-00012 (shipment S26-00004) · ASTM D5890 · bentonite swell index". */
  label: string;
  /** The test as the certificate's checks name it ("the swell index (ASTM D5890) of R26-00012"). */
  of: string;
};

/**
 * Approved, current index-test results (of one project, or of all) that no live certificate other than
 * `exceptCertificateId` includes, as the database decides (a draft's newest content says what it includes);
 * `keep` are offered even when held (the draft's own). No permission check: a building block.
 */
export async function listFreeIndexResults(db: Tx | Db, options: { projectId?: string; exceptCertificateId?: string; keep?: string[] } = {}): Promise<FreeIndexResult[]> {
  const found = await db.indexTestResult.findMany({
    where: { indexTest: { state: "APPROVED", correctedBy: null, ...(options.projectId ? { roll: { projectId: options.projectId } } : {}) } },
    orderBy: [{ indexTest: { roll: { labNumber: "asc" } } }, { indexTest: { methodCode: "asc" } }, { property: "asc" }],
    select: {
      id: true, property: true, value: true, unit: true,
      certificates: {
        where: { revision: { status: { in: [...LIVE_REVISION_STATES] }, ...(options.exceptCertificateId ? { certificateId: { not: options.exceptCertificateId } } : {}) } },
        select: { revision: { select: { contents: { orderBy: { version: "desc" }, take: 1, select: { indexResultIds: true } } } } },
      },
      indexTest: { select: { methodCode: true, roll: { select: { labNumber: true, shipment: { select: { labNumber: true } }, project: { select: { id: true, name: true, code: true, clientOrganization: { select: { name: true } } } } } } } },
    },
  });
  const keep = new Set(options.keep ?? []);
  return found
    .filter((r) => keep.has(r.id) || !r.certificates.some((c) => !c.revision.contents[0] || c.revision.contents[0].indexResultIds.includes(r.id)))
    .map((r) => {
      const { roll, methodCode } = r.indexTest;
      const method = isIndexMethodCode(methodCode) ? `ASTM ${INDEX_METHODS[methodCode].code}` : `ASTM ${methodCode}`;
      return {
        id: r.id, property: r.property, value: r.value, unit: r.unit, rollLabNumber: roll.labNumber, shipmentLabNumber: roll.shipment.labNumber,
        project: { id: roll.project.id, name: roll.project.name, code: roll.project.code, client: roll.project.clientOrganization.name },
        label: `roll ${roll.labNumber} (shipment ${roll.shipment.labNumber}) · ${method} · ${inSentence(TEST_PROPERTY_LABELS[r.property])}`,
        of: indexTestName(r.indexTest),
      };
    });
}

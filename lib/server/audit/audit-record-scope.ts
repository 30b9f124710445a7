import "server-only";
import { Prisma } from "@/lib/generated/prisma/client";
import { AppError } from "@/lib/errors/app-error";
import { parseLabNumber, type LabNumberKind } from "@/lib/numbering/lab-number";
import { getDb } from "../db/client";

/** The audit rows of one table that belong to a record: a condition on "rowId". */
export type AuditScopeBranch = { table: string; rows: Prisma.Sql };

const ident = (name: string) => Prisma.raw(`"${name}"`);
const own = (table: string, id: string): AuditScopeBranch => ({ table, rows: Prisma.sql`"rowId" = ${id}` });
const children = (table: string, column: string, id: string): AuditScopeBranch => ({
  table,
  rows: Prisma.sql`"rowId" IN (SELECT id FROM ${ident(table)} WHERE ${ident(column)} = ${id})`,
});
const corrections = (entity: string, id: string): AuditScopeBranch => ({
  table: "Correction",
  rows: Prisma.sql`"rowId" IN (SELECT id FROM "Correction" WHERE entity = ${entity} AND "entityId" = ${id})`,
});

/**
 * The parts of a record that have no lab number of their own and that a person expects to see with it:
 * a run's stages, readings, instruments, reviews and results; a roll's custody events and index tests;
 * a certificate's revisions, their results and signatures. Parts are found through the rows that exist,
 * since records are never deleted; a certificate's results are matched by the revision part of their key,
 * so a result taken off a draft is still found.
 */
function branchesOf(kind: LabNumberKind, id: string): AuditScopeBranch[] {
  switch (kind) {
    case "shipment":
      return [own("Shipment", id), children("ShipmentPhoto", "shipmentId", id), corrections("Shipment", id)];
    case "roll":
      return [
        own("Roll", id), children("CustodyEvent", "rollId", id), children("IndexTest", "rollId", id),
        { table: "IndexTestResult", rows: Prisma.sql`"rowId" IN (SELECT r.id FROM "IndexTestResult" r JOIN "IndexTest" t ON t.id = r."indexTestId" WHERE t."rollId" = ${id})` },
        { table: "IndexTestReview", rows: Prisma.sql`"rowId" IN (SELECT r.id FROM "IndexTestReview" r JOIN "IndexTest" t ON t.id = r."indexTestId" WHERE t."rollId" = ${id})` },
        { table: "IndexTestEquipment", rows: Prisma.sql`"rowId" IN (SELECT e."indexTestId" || ':' || e."equipmentId" FROM "IndexTestEquipment" e JOIN "IndexTest" t ON t.id = e."indexTestId" WHERE t."rollId" = ${id})` },
        corrections("Roll", id),
      ];
    case "coupon":
      return [own("Coupon", id), children("CustodyEvent", "couponId", id), corrections("Coupon", id)];
    case "specimen":
      return [own("Specimen", id), children("SpecimenChecklistItem", "specimenId", id), children("CustodyEvent", "specimenId", id), corrections("Specimen", id)];
    case "run":
      return [
        own("Run", id), children("RunStage", "runId", id), children("Reading", "runId", id), children("Review", "runId", id), children("Result", "runId", id),
        { table: "RunEquipment", rows: Prisma.sql`"rowId" IN (SELECT "runId" || ':' || "equipmentId" FROM "RunEquipment" WHERE "runId" = ${id})` },
        corrections("Run", id),
      ];
    case "certificate":
      return [
        own("Certificate", id), children("CertificateRevision", "certificateId", id),
        { table: "CertificateResult", rows: Prisma.sql`split_part("rowId", ':', 1) IN (SELECT id FROM "CertificateRevision" WHERE "certificateId" = ${id})` },
        { table: "Signature", rows: Prisma.sql`"rowId" IN (SELECT s.id FROM "Signature" s JOIN "CertificateRevision" r ON r.id = s."revisionId" WHERE r."certificateId" = ${id})` },
        { table: "CertificateDraftContent", rows: Prisma.sql`"rowId" IN (SELECT d.id FROM "CertificateDraftContent" d JOIN "CertificateRevision" r ON r.id = d."revisionId" WHERE r."certificateId" = ${id})` },
      ];
  }
}

async function findRecordId(kind: LabNumberKind, labNumber: string): Promise<string | null> {
  const db = getDb();
  const where = { where: { labNumber }, select: { id: true } } as const;
  const found =
    kind === "shipment" ? await db.shipment.findUnique(where)
    : kind === "roll" ? await db.roll.findUnique(where)
    : kind === "coupon" ? await db.coupon.findUnique(where)
    : kind === "specimen" ? await db.specimen.findUnique(where)
    : kind === "run" ? await db.run.findUnique(where)
    : await db.certificate.findUnique({ where: { number: labNumber }, select: { id: true } });
  return found?.id ?? null;
}

/** The audit rows of the record with this lab number, as one branch per table; INVALID_INPUT when there is no such record. */
export async function auditRecordScope(labNumber: string): Promise<AuditScopeBranch[]> {
  const parsed = parseLabNumber(labNumber);
  const id = parsed ? await findRecordId(parsed.kind, labNumber) : null;
  if (!parsed || !id) {
    const message = `No record has the lab number ${labNumber}; check it on the label or in the lists. Nothing was searched.`;
    throw new AppError("INVALID_INPUT", message, { fieldErrors: { record: message } });
  }
  return branchesOf(parsed.kind, id);
}

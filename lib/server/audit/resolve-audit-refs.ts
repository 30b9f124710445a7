import "server-only";
import type { AuditRefKind } from "@/lib/audit/audit-fields";
import type { AuditRecordName } from "@/lib/audit/audit-owner";
import { labNumberAddress } from "@/lib/numbering/lab-number-address";
import { TEST_PROPERTY_LABELS } from "@/lib/results/property-units";
import { getDb } from "../db/client";

export type AuditRefs = Map<string, AuditRecordName>;
export const refKey = (ref: AuditRefKind, id: string) => `${ref}:${id}`;

type Loader = (ids: string[]) => Promise<Array<{ id: string } & AuditRecordName>>;
const numbered = (rows: Array<{ id: string; labNumber: string }>) => rows.map((r) => ({ id: r.id, text: r.labNumber, href: labNumberAddress(r.labNumber) }));
const named = (rows: Array<{ id: string; name: string }>) => rows.map((r) => ({ id: r.id, text: r.name, href: null }));
const property = (p: string) => (TEST_PROPERTY_LABELS[p as keyof typeof TEST_PROPERTY_LABELS] ?? p).toLowerCase();

// One query per kind of record, by id; plain SELECTs on the record tables.
const LOADERS: Record<AuditRefKind, Loader> = {
  user: async (ids) => named(await getDb().user.findMany({ where: { id: { in: ids } }, select: { id: true, name: true } })),
  shipment: async (ids) => numbered(await getDb().shipment.findMany({ where: { id: { in: ids } }, select: { id: true, labNumber: true } })),
  roll: async (ids) => numbered(await getDb().roll.findMany({ where: { id: { in: ids } }, select: { id: true, labNumber: true } })),
  coupon: async (ids) => numbered(await getDb().coupon.findMany({ where: { id: { in: ids } }, select: { id: true, labNumber: true } })),
  specimen: async (ids) => numbered(await getDb().specimen.findMany({ where: { id: { in: ids } }, select: { id: true, labNumber: true } })),
  run: async (ids) => numbered(await getDb().run.findMany({ where: { id: { in: ids } }, select: { id: true, labNumber: true } })),
  certificate: async (ids) =>
    (await getDb().certificate.findMany({ where: { id: { in: ids } }, select: { id: true, number: true } })).map((c) => ({ id: c.id, text: c.number, href: labNumberAddress(c.number) })),
  revision: async (ids) =>
    (await getDb().certificateRevision.findMany({ where: { id: { in: ids } }, select: { id: true, revision: true, certificate: { select: { number: true } } } })).map((r) => ({
      id: r.id, text: `${r.certificate.number} revision ${r.revision}`, href: labNumberAddress(r.certificate.number),
    })),
  equipment: async (ids) =>
    (await getDb().equipment.findMany({ where: { id: { in: ids } }, select: { id: true, assetTag: true } })).map((e) => ({ id: e.id, text: e.assetTag, href: `/equipment/${encodeURIComponent(e.assetTag)}` })),
  calibration: async (ids) =>
    (await getDb().calibration.findMany({ where: { id: { in: ids } }, select: { id: true, reference: true, equipment: { select: { assetTag: true } } } })).map((c) => ({
      id: c.id, text: `${c.equipment.assetTag} calibration ${c.reference}`, href: `/equipment/${encodeURIComponent(c.equipment.assetTag)}`,
    })),
  specification: async (ids) =>
    (await getDb().specification.findMany({ where: { id: { in: ids } }, select: { id: true, name: true } })).map((s) => ({ id: s.id, text: s.name, href: `/specifications/${encodeURIComponent(s.id)}` })),
  project: async (ids) => (await getDb().project.findMany({ where: { id: { in: ids } }, select: { id: true, code: true } })).map((p) => ({ id: p.id, text: p.code, href: null })),
  client: async (ids) => named(await getDb().clientOrganization.findMany({ where: { id: { in: ids } }, select: { id: true, name: true } })),
  location: async (ids) => (await getDb().storageLocation.findMany({ where: { id: { in: ids } }, select: { id: true, code: true } })).map((l) => ({ id: l.id, text: l.code, href: null })),
  reading: async (ids) =>
    (await getDb().reading.findMany({ where: { id: { in: ids } }, select: { id: true, sequence: true, run: { select: { labNumber: true } } } })).map((r) => ({
      id: r.id, text: `reading ${r.sequence} of ${r.run.labNumber}`, href: labNumberAddress(r.run.labNumber),
    })),
  result: async (ids) =>
    (await getDb().result.findMany({ where: { id: { in: ids } }, select: { id: true, property: true, run: { select: { labNumber: true } } } })).map((r) => ({
      id: r.id, text: `${property(r.property)} of ${r.run.labNumber}`, href: labNumberAddress(r.run.labNumber),
    })),
};

/** The lab numbers and names behind the ids audit rows point at, looked up in one query per kind of record. */
export async function resolveAuditRefs(refs: Array<{ ref: AuditRefKind; id: string }>): Promise<AuditRefs> {
  const byKind = new Map<AuditRefKind, Set<string>>();
  for (const { ref, id } of refs) byKind.set(ref, (byKind.get(ref) ?? new Set()).add(id));
  const found = new Map<string, AuditRecordName>();
  await Promise.all(
    [...byKind].map(async ([ref, ids]) => {
      for (const row of await LOADERS[ref]([...ids])) found.set(refKey(ref, row.id), { text: row.text, href: row.href });
    }),
  );
  return found;
}

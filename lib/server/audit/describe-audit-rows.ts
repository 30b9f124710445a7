import "server-only";
import type { AuditEntry } from "@/lib/audit/audit-entry";
import { auditOwner } from "@/lib/audit/audit-owner";
import { auditTableLabel } from "@/lib/audit/audit-tables";
import { auditRowRefs, auditOperationWords, describeAuditChanges, replacedRowId, type AuditRowData, type AuditRowInput } from "@/lib/audit/describe-audit-change";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { getDb } from "../db/client";
import type { AuditLogRow } from "./audit-log-query";
import { refKey, resolveAuditRefs, type AuditRefs } from "./resolve-audit-refs";

// Users are named; system actors ("system:demo-seed") are shown as what they are.
function describeActor(actorId: string | null, refs: AuditRefs): string {
  if (!actorId) return "database (no person set)";
  if (actorId.startsWith("system:")) return `system (${actorId.slice("system:".length).replace(/-/g, " ")})`;
  return refs.get(refKey("user", actorId))?.text ?? actorId;
}

/** The rows that corrections replace, as their own insert recorded them (the same form as the correction's row). */
async function replacedRows(rows: AuditRowInput[]): Promise<Map<string, AuditRowData>> {
  const wanted = rows.flatMap((r) => {
    const id = replacedRowId(r);
    return id ? [{ tableName: r.tableName, rowId: id }] : [];
  });
  if (wanted.length === 0) return new Map();
  const found = await getDb().auditLog.findMany({
    where: { operation: "INSERT", OR: wanted.map((w) => ({ tableName: w.tableName, rowId: w.rowId })) },
    select: { tableName: true, rowId: true, after: true },
  });
  return new Map(found.map((f) => [`${f.tableName}:${f.rowId}`, f.after as AuditRowData]));
}

/** Audit rows in words: who, which record (lab number and link), which part, what operation, which values changed. */
export async function describeAuditRows(rows: AuditLogRow[], pressureUnit: PressureUnit): Promise<AuditEntry[]> {
  const inputs: AuditRowInput[] = rows.map((r) => ({ tableName: r.tableName, operation: r.operation, before: r.before, after: r.after }));
  const originals = await replacedRows(inputs);
  for (const input of inputs) {
    const id = replacedRowId(input);
    if (id) input.replaces = originals.get(`${input.tableName}:${id}`) ?? null;
  }
  const refs = await resolveAuditRefs([
    ...inputs.flatMap(auditRowRefs),
    ...rows.flatMap((r) => (r.actorId && !r.actorId.startsWith("system:") ? [{ ref: "user" as const, id: r.actorId }] : [])),
  ]);
  const refLabel: Parameters<typeof describeAuditChanges>[1]["refLabel"] = (ref, id) => refs.get(refKey(ref, id))?.text;
  return rows.map((row, i) => {
    const input = inputs[i]!;
    const owner = auditOwner(row.tableName, row.after ?? row.before ?? {});
    const record = owner.record && "ref" in owner.record ? (refs.get(refKey(owner.record.ref, owner.record.id)) ?? { text: owner.record.id, href: null }) : owner.record;
    return {
      id: row.id.toString(),
      occurredAt: row.occurredAt,
      person: describeActor(row.actorId, refs),
      kind: auditTableLabel(row.tableName),
      record,
      part: owner.part,
      operation: auditOperationWords(input),
      changes: describeAuditChanges(input, { pressureUnit, refLabel }),
    };
  });
}

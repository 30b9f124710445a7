/**
 * One row of the audit trail as people read it, and the same as lines of a spreadsheet (one line per
 * changed column, so old and new values stand in columns of their own). Pure.
 */
import type { AuditRecordName } from "./audit-owner";
import type { AuditChange } from "./describe-audit-change";

export type AuditEntry = {
  /** The AuditLog id, as text (it is a bigint). */
  id: string;
  occurredAt: Date;
  person: string;
  /** The kind of record in words ("Reading"). */
  kind: string;
  record: AuditRecordName | null;
  part: string | null;
  operation: string;
  changes: AuditChange[];
};

export const AUDIT_CSV_HEADER = ["Entry", "When (UTC)", "Person", "Record", "Part", "Kind of record", "Operation", "Field", "Old value", "New value"];

/** The spreadsheet lines of one entry: one per changed column, or one with blank field cells when none is shown. */
export function auditCsvLines(entry: AuditEntry): string[][] {
  const head = [entry.id, entry.occurredAt.toISOString().slice(0, 19).replace("T", " "), entry.person, entry.record?.text ?? "", entry.part ?? "", entry.kind, entry.operation];
  if (entry.changes.length === 0) return [[...head, "", "", ""]];
  return entry.changes.map((c) => [...head, c.label, c.old ?? "", c.new ?? ""]);
}

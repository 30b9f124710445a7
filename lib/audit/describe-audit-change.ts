/**
 * What one audit row says, in words: the operation and the columns that changed with their old and new
 * values. An insert lists what was set, a delete what was there. A row that corrects another (a reading
 * with `correctsId`) is shown as a correction: the values that differ from the row it replaces, old and
 * new, and the reason, because that is what the person did. Pure.
 */
import { auditFieldSpec, type AuditRefKind } from "./audit-fields";
import { auditOwner } from "./audit-owner";
import { formatAuditValue, type AuditValueContext } from "./format-audit-value";

export type AuditChange = { field: string; label: string; old: string | null; new: string | null };
export type AuditRowData = Record<string, unknown>;
export type AuditRowInput = {
  tableName: string;
  operation: string;
  before: AuditRowData | null;
  after: AuditRowData | null;
  /** For a row that corrects another: the corrected row as it was recorded. */
  replaces?: AuditRowData | null;
};

const VERBS: Record<string, string> = { INSERT: "added", UPDATE: "changed", DELETE: "removed" };
const RECORDED = new Set(["Reading", "RunStage", "CustodyEvent", "Review", "Calibration", "IndexTest"]);
// Columns of a correcting row that say who and why, not what changed: shown elsewhere.
const CORRECTION_BOOKKEEPING = new Set(["correctsId", "correctionReason", "recordedById"]);

/** The row a correcting row replaces (its `correctsId`), or null. */
export function replacedRowId(row: Pick<AuditRowInput, "operation" | "after">): string | null {
  const id = row.operation === "INSERT" ? row.after?.correctsId : null;
  return typeof id === "string" ? id : null;
}

/** The operation in words: "added", "recorded", "changed", "corrected", "signed", "removed". */
export function auditOperationWords(row: AuditRowInput): string {
  if (row.replaces) return "corrected";
  if (row.operation === "INSERT" && RECORDED.has(row.tableName)) return "recorded";
  if (row.operation === "INSERT" && row.tableName === "Signature") return "signed";
  return VERBS[row.operation] ?? row.operation.toLowerCase();
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** The changed columns of an audit row, old and new values in words, sorted by label. */
export function describeAuditChanges(row: AuditRowInput, ctx: Omit<AuditValueContext, "row">): AuditChange[] {
  const mode = row.replaces ? "correction" : row.operation === "UPDATE" ? "update" : row.operation === "DELETE" ? "delete" : "insert";
  const before = row.replaces ?? row.before ?? {};
  const after = row.after ?? {};
  const ownerKeys = new Set(auditOwner(row.tableName, row.after ?? row.before ?? {}).keys);
  const changes: AuditChange[] = [];
  for (const field of new Set([...Object.keys(before), ...Object.keys(after)])) {
    const spec = auditFieldSpec(row.tableName, field);
    if (spec.kind === "hidden" || spec.kind === "secret" || ownerKeys.has(field)) continue;
    if (mode === "correction" && CORRECTION_BOOKKEEPING.has(field)) continue;
    const show = (value: unknown, source: AuditRowData) => formatAuditValue(spec, value, { ...ctx, row: source });
    const [oldValue, newValue] = [before[field], after[field]];
    const label = spec.label;
    if (mode === "insert") {
      if (newValue !== null && newValue !== undefined) changes.push({ field, label, old: null, new: show(newValue, after) });
    } else if (mode === "delete") {
      if (oldValue !== null && oldValue !== undefined) changes.push({ field, label, old: show(oldValue, before), new: null });
    } else if (!same(oldValue, newValue)) changes.push({ field, label, old: show(oldValue, before), new: show(newValue, after) });
  }
  changes.sort((a, b) => a.label.localeCompare(b.label, "en"));
  if (mode === "correction" && typeof after.correctionReason === "string")
    changes.push({ field: "correctionReason", label: auditFieldSpec(row.tableName, "correctionReason").label, old: null, new: after.correctionReason });
  return changes;
}

/** Every id an audit row's record and shown columns point at, for the server to look up in one go. */
export function auditRowRefs(row: AuditRowInput): Array<{ ref: AuditRefKind; id: string }> {
  const refs: Array<{ ref: AuditRefKind; id: string }> = [];
  const owner = auditOwner(row.tableName, row.after ?? row.before ?? {}).record;
  if (owner && "ref" in owner) refs.push(owner);
  for (const data of [row.before, row.after, row.replaces])
    for (const [field, value] of Object.entries(data ?? {})) {
      const spec = auditFieldSpec(row.tableName, field);
      if (spec.kind === "ref" && typeof value === "string") refs.push({ ref: spec.ref, id: value });
    }
  return refs;
}

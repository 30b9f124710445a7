import "server-only";
import type { AuditEntry } from "@/lib/audit/audit-entry";
import { AUDIT_MAX_PAGE_SIZE, type AuditFilterText } from "@/lib/validation/audit";
import type { CurrentUser } from "../auth/current-user";
import { findAuditEntries } from "../audit/find-audit-entries";
import { addSheet, DATE_TIME_FORMAT, newWorkbook, workbookBuffer } from "./workbook";

/** A workbook is built in memory: past this many entries the export says so and stops (the CSV streams any number). */
export const AUDIT_XLSX_MAX_ENTRIES = 100_000;

type Line = { entry: AuditEntry; field: string; old: string; new: string };

/**
 * The audit rows a filter selects as an XLSX workbook, through findAuditEntries (the same filter, permission
 * check and words as the page and the CSV): one line per changed field, the entry number as a number and its
 * time as a date (UTC).
 */
export async function exportAuditWorkbook(options: { actor: CurrentUser; filter: AuditFilterText }): Promise<{ fileName: string; buffer: Buffer; truncated: boolean }> {
  const input = { ...options.filter, pageSize: AUDIT_MAX_PAGE_SIZE };
  const lines: Line[] = [];
  let entries = 0;
  let page = await findAuditEntries({ actor: options.actor, input });
  for (;;) {
    for (const entry of page.entries) {
      entries += 1;
      if (entry.changes.length === 0) lines.push({ entry, field: "", old: "", new: "" });
      for (const c of entry.changes) lines.push({ entry, field: c.label, old: c.old ?? "", new: c.new ?? "" });
    }
    if (!page.older || entries >= AUDIT_XLSX_MAX_ENTRIES) break;
    page = await findAuditEntries({ actor: options.actor, input: { ...input, before: page.older } });
  }
  const truncated = Boolean(page.older);
  const workbook = newWorkbook();
  const sheet = addSheet<Line>(workbook, "Audit trail", [
    { header: "Entry", value: (l) => Number(l.entry.id) },
    { header: "When (UTC)", value: (l) => l.entry.occurredAt, numFmt: DATE_TIME_FORMAT, width: 20 },
    { header: "Person", value: (l) => l.entry.person, width: 22 },
    { header: "Record", value: (l) => l.entry.record?.text ?? "", width: 18 },
    { header: "Part", value: (l) => l.entry.part ?? "", width: 22 },
    { header: "Kind of record", value: (l) => l.entry.kind, width: 20 },
    { header: "Operation", value: (l) => l.entry.operation },
    { header: "Field", value: (l) => l.field, width: 24 },
    { header: "Old value (with its unit)", value: (l) => l.old, width: 28 },
    { header: "New value (with its unit)", value: (l) => l.new, width: 28 },
  ], lines);
  if (truncated) sheet.addRow([null, null, `Stopped after ${AUDIT_XLSX_MAX_ENTRIES.toLocaleString("en")} entries; narrow the filter, or download the CSV, which has them all.`]);
  const stamp = new Date().toISOString().slice(0, 16).replace(/[-:]/g, "").replace("T", "-");
  return { fileName: `audit-trail-${stamp}.xlsx`, buffer: await workbookBuffer(workbook), truncated };
}

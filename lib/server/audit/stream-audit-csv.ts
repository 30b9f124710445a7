import "server-only";
import { stringify } from "csv-stringify/sync";
import { AUDIT_CSV_HEADER, auditCsvLines } from "@/lib/audit/audit-entry";
import { AUDIT_MAX_PAGE_SIZE, type AuditFilterText } from "@/lib/validation/audit";
import type { CurrentUser } from "../auth/current-user";
import { findAuditEntries, type AuditEntryPage } from "./find-audit-entries";

/**
 * Every audit row a filter selects, as CSV, streamed page by page through findAuditEntries (the same
 * filter, permission check and words as the page), oldest page last. The first page is read before the
 * stream is returned, so a refused filter or role is an error response, not a broken file. Cells that a
 * spreadsheet would run as a formula (=, +, -, @) are prefixed with a quote; a byte-order mark tells
 * spreadsheets the file is UTF-8 (°C, m³).
 */
export async function streamAuditCsv(options: { actor: CurrentUser; filter: AuditFilterText }): Promise<ReadableStream<Uint8Array>> {
  const input = { ...options.filter, pageSize: AUDIT_MAX_PAGE_SIZE };
  let page: AuditEntryPage | null = await findAuditEntries({ actor: options.actor, input });
  const encoder = new TextEncoder();
  const csv = (lines: string[][]) => encoder.encode(stringify(lines, { escape_formulas: true, record_delimiter: "windows" }));
  return new ReadableStream<Uint8Array>({
    start(controller) {
      controller.enqueue(encoder.encode("\uFEFF"));
      controller.enqueue(csv([AUDIT_CSV_HEADER]));
    },
    async pull(controller) {
      if (!page) return controller.close();
      if (page.entries.length) controller.enqueue(csv(page.entries.flatMap(auditCsvLines)));
      page = page.older ? await findAuditEntries({ actor: options.actor, input: { ...input, before: page.older } }) : null;
    },
  });
}

import "server-only";
import type { AuditEntry } from "@/lib/audit/audit-entry";
import { auditQuerySchema } from "@/lib/validation/audit";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { parseOrThrow } from "../validation/parse";
import { auditKeyset, auditSelection, selectAuditRows, type AuditSelection } from "./audit-log-query";
import { describeAuditRows } from "./describe-audit-rows";

export type AuditEntryPage = {
  /** Newest first. */
  entries: AuditEntry[];
  /** Pass as `after` for the newer rows; null when these are the newest. */
  newer: string | null;
  /** Pass as `before` for the older rows; null when these are the oldest. */
  older: string | null;
};

const exists = async (selection: AuditSelection, relation: "<" | ">", cursor: bigint) => (await selectAuditRows(selection, auditKeyset(selection, relation, cursor), "DESC", 1)).length > 0;

/**
 * One page of the audit trail, filtered by record (lab number, with its parts), kind of record, person
 * and date range, newest first, in words. Keyset paging with the AuditLog id as the cursor (`before` /
 * `after` an id; see AuditSelection for the order), so a page deep in millions of rows costs what the
 * first does and no row is skipped or repeated between pages. The one filter operation: the audit trail
 * page, the CSV export and later exports all call it. An end date before the start, an unknown lab number
 * or person: INVALID_INPUT, and nothing is searched.
 */
export async function findAuditEntries(options: { actor: CurrentUser; input: unknown }): Promise<AuditEntryPage> {
  requirePermission(options.actor, "audit.view");
  const query = parseOrThrow(auditQuerySchema, options.input);
  const selection = await auditSelection(query);
  if (!selection) return { entries: [], newer: null, older: null };

  const towardsNewer = query.after !== undefined;
  const keyset = towardsNewer ? auditKeyset(selection, ">", query.after!) : query.before !== undefined ? auditKeyset(selection, "<", query.before) : null;
  const fetched = await selectAuditRows(selection, keyset, towardsNewer ? "ASC" : "DESC", query.pageSize + 1);
  const more = fetched.length > query.pageSize;
  const rows = fetched.slice(0, query.pageSize);
  if (towardsNewer) rows.reverse();
  const newest = rows[0]?.id;
  const oldest = rows.at(-1)?.id;

  const newer = newest === undefined ? null : towardsNewer ? (more ? newest : null) : query.before !== undefined && (await exists(selection, ">", newest)) ? newest : null;
  const older = oldest === undefined ? null : !towardsNewer ? (more ? oldest : null) : (await exists(selection, "<", oldest)) ? oldest : null;
  return { entries: await describeAuditRows(rows, options.actor.pressureUnit), newer: newer?.toString() ?? null, older: older?.toString() ?? null };
}

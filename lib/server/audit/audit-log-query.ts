import "server-only";
import { Prisma } from "@/lib/generated/prisma/client";
import { auditTableForSlug } from "@/lib/audit/audit-tables";
import { AppError } from "@/lib/errors/app-error";
import type { AuditFilter } from "@/lib/validation/audit";
import { getDb } from "../db/client";
import { auditRecordScope, type AuditScopeBranch } from "./audit-record-scope";

export type AuditLogRow = {
  id: bigint;
  occurredAt: Date;
  actorId: string | null;
  tableName: string;
  rowId: string | null;
  operation: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
};

/**
 * What a filter selects: per-table branches of one record (or every row), the other conditions, and the
 * order of its pages. Newest first by id; within a date range by time, then id, because the time index
 * then finds a week a year back at once where walking the ids back would read a year of rows first.
 */
export type AuditSelection = { branches: AuditScopeBranch[] | null; conditions: Prisma.Sql[]; order: "id" | "time" };

const COLUMNS = Prisma.sql`id, "occurredAt", "actorId", "tableName", "rowId", operation, "before", "after"`;
const DAY_MS = 86_400_000;
// "occurredAt" holds UTC without a zone (as Prisma stores times): compare it with zone-less text, so the
// session's time zone cannot shift the range.
const utcTimestamp = (date: Date) => date.toISOString().slice(0, 23).replace("T", " ");

/**
 * The selection a checked filter makes, or null when it can select nothing (a record has no rows of the
 * chosen table). An unknown lab number or person is INVALID_INPUT with a sentence, and nothing is searched.
 */
export async function auditSelection(filter: AuditFilter): Promise<AuditSelection | null> {
  const conditions: Prisma.Sql[] = [];
  const table = filter.table ? auditTableForSlug(filter.table) : null;
  let branches = filter.record ? await auditRecordScope(filter.record) : null;
  if (branches && table) branches = branches.filter((b) => b.table === table);
  if (branches?.length === 0) return null;
  if (table && !branches) conditions.push(Prisma.sql`"tableName" = ${table}`);
  if (filter.person) {
    const person = await getDb().user.findUnique({ where: { id: filter.person }, select: { id: true } });
    if (!person) {
      const message = "No person matches that choice; choose one from the list. Nothing was searched.";
      throw new AppError("INVALID_INPUT", message, { fieldErrors: { person: message } });
    }
    conditions.push(Prisma.sql`"actorId" = ${filter.person}`);
  }
  if (filter.from) conditions.push(Prisma.sql`"occurredAt" >= ${utcTimestamp(filter.from)}::timestamp`);
  if (filter.to) conditions.push(Prisma.sql`"occurredAt" < ${utcTimestamp(new Date(filter.to.getTime() + DAY_MS))}::timestamp`);
  return { branches, conditions, order: filter.from || filter.to ? "time" : "id" };
}

/** The keyset condition "after `cursor` in the selection's order", towards older (<) or newer (>) rows. */
export function auditKeyset(selection: AuditSelection, relation: "<" | ">", cursor: bigint): Prisma.Sql {
  const op = Prisma.raw(relation);
  return selection.order === "id"
    ? Prisma.sql`id ${op} ${cursor}`
    : Prisma.sql`("occurredAt", id) ${op} (SELECT "occurredAt", id FROM "AuditLog" WHERE id = ${cursor})`;
}

/**
 * Audit rows of a selection in its order, `limit` of them past the keyset condition (auditKeyset).
 * Plain SELECTs only. A record's branches are a UNION ALL, each served by the ("tableName", "rowId") index;
 * a table or person filter walks its own ("tableName", id) or ("actorId", id) index in id order; a date
 * range walks the "occurredAt" index.
 */
export async function selectAuditRows(selection: AuditSelection, keyset: Prisma.Sql | null, direction: "ASC" | "DESC", limit: number): Promise<AuditLogRow[]> {
  const where = (branch: AuditScopeBranch | null) => {
    const all = [...(branch ? [Prisma.sql`"tableName" = ${branch.table}`, branch.rows] : []), ...selection.conditions, ...(keyset ? [keyset] : [])];
    return all.length ? Prisma.join(all, " AND ") : Prisma.sql`TRUE`;
  };
  const dir = Prisma.raw(direction);
  const order = selection.order === "id" ? Prisma.sql`id ${dir}` : Prisma.sql`"occurredAt" ${dir}, id ${dir}`;
  const query = selection.branches
    ? Prisma.sql`SELECT ${COLUMNS} FROM (${Prisma.join(selection.branches.map((b) => Prisma.sql`SELECT ${COLUMNS} FROM "AuditLog" WHERE ${where(b)}`), " UNION ALL ")}) a ORDER BY ${order} LIMIT ${limit}`
    : Prisma.sql`SELECT ${COLUMNS} FROM "AuditLog" WHERE ${where(null)} ORDER BY ${order} LIMIT ${limit}`;
  return getDb().$queryRaw<AuditLogRow[]>(query);
}

import "server-only";
import type { ListQuery } from "@/lib/validation/list-query";

export type ListPage<Row> = { rows: Row[]; total: number; page: number; pageSize: number; pageCount: number };

/**
 * One page of a list: the count and the page's rows are asked for together (two connections), and a
 * page past the end is an empty page with the right total rather than an error.
 */
export async function listPage<Row>(query: ListQuery, count: () => Promise<number>, rows: (skip: number, take: number) => Promise<Row[]>): Promise<ListPage<Row>> {
  const skip = (query.page - 1) * query.pageSize;
  const [total, pageRows] = await Promise.all([count(), rows(skip, query.pageSize)]);
  return { rows: pageRows, total, page: query.page, pageSize: query.pageSize, pageCount: Math.max(1, Math.ceil(total / query.pageSize)) };
}

export type TextPrefix = { startsWith: string; gte: string; lt: string };

/**
 * A prefix match that an ordinary b-tree index serves under any collation: the range narrows through the
 * index (PostgreSQL only turns LIKE into a range itself under the "C" collation), the LIKE keeps it exact.
 */
export function textPrefix(prefix: string): TextPrefix {
  const last = prefix.charCodeAt(prefix.length - 1);
  return { startsWith: prefix, gte: prefix, lt: prefix.slice(0, -1) + String.fromCharCode(Math.min(last + 1, 0xffff)) };
}

export type LabKind = "shipment" | "roll" | "coupon" | "specimen";
const LAB_LETTERS: Record<string, LabKind> = { S: "shipment", R: "roll", C: "coupon", P: "specimen" };
// A beginning of a lab number: its letter, then up to two year digits, then the dash and counter digits.
const LAB_PREFIX = /^([SRCP])(\d{0,2}|\d{2}-\d*)$/;

/**
 * What a search box entry is: the beginning of a lab number of one kind (searched on that kind's own
 * column, so each list asks one index), and always the text itself for roll numbers.
 */
export function readSearch(q: string): { labKind: LabKind | null; lab: TextPrefix; text: TextPrefix } {
  const upper = q.toUpperCase();
  const match = LAB_PREFIX.exec(upper);
  return { labKind: match ? LAB_LETTERS[match[1]!]! : null, lab: textPrefix(upper), text: textPrefix(q) };
}

/** The received/cut/prepared date window of a list, as a Prisma filter. */
export function dateWindow(query: ListQuery): { gte?: Date; lt?: Date } | undefined {
  return query.from || query.to ? { ...(query.from && { gte: query.from }), ...(query.to && { lt: query.to }) } : undefined;
}

/** Puts rows fetched by id back into the order of the page's ids. */
export function inIdOrder<T extends { id: string }>(ids: string[], rows: T[]): T[] {
  const byId = new Map(rows.map((r) => [r.id, r]));
  return ids.map((id) => byId.get(id)).filter((r): r is T => r !== undefined);
}

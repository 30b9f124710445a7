import { z } from "zod";
import { AUDIT_TABLE_SLUGS } from "@/lib/audit/audit-tables";
import { parseLabNumber } from "@/lib/numbering/lab-number";
import { calendarDay } from "./list-query";

/**
 * The audit trail's filter: one record by lab number, one kind of record, one person, a date range (whole
 * days, UTC, both ends included). Shared by the filter form, the page, the CSV export and any later export,
 * which all call findAuditEntries with it. Blank fields mean "any".
 */
export const AUDIT_PAGE_SIZE = 50;
/** The page sizes the audit trail page offers. */
export const AUDIT_PAGE_SIZES = [10, 25, 50, 100] as const;
/** The most rows one call returns (exports page through the whole history in steps of this size). */
export const AUDIT_MAX_PAGE_SIZE = 1000;

// A form sends "" for an empty field, an address leaves the key out: both mean no filter.
const blankable = <T extends z.ZodType<unknown, string>>(schema: T) =>
  z
    .string()
    .optional()
    .transform((v) => (v?.trim() ? v.trim() : undefined))
    .pipe(schema.optional());

const PICK_PERSON = "Choose a person from the list.";

const filterShape = {
  record: blankable(
    z.string().toUpperCase().refine((text) => parseLabNumber(text) !== null, "Enter a lab number such as T26-00004, R26-00012 or Q26-00001."),
  ),
  table: blankable(z.enum(AUDIT_TABLE_SLUGS, { message: "Choose a kind of record from the list." })),
  person: blankable(z.string().max(64, PICK_PERSON).regex(/^[A-Za-z0-9:_-]+$/, PICK_PERSON)),
  from: blankable(calendarDay),
  to: blankable(calendarDay),
};

type DateRange = { from?: Date; to?: Date };
const day = (d: Date) => d.toISOString().slice(0, 10);

function endNotBeforeStart(filter: DateRange, ctx: z.RefinementCtx) {
  if (filter.from && filter.to && filter.to < filter.from)
    ctx.addIssue({ code: "custom", path: ["to"], message: `The end date ${day(filter.to)} is before the start date ${day(filter.from)}; nothing was searched.` });
}

export const auditFilterSchema = z.object(filterShape).superRefine(endNotBeforeStart);
export type AuditFilterInput = z.input<typeof auditFilterSchema>;
export type AuditFilter = z.output<typeof auditFilterSchema>;

// Keyset paging on the AuditLog id: `before` gives the rows older than an id, `after` the rows newer than it.
const cursor = blankable(z.string().regex(/^\d{1,18}$/, "That is not a place in the audit trail.").transform((text) => BigInt(text)));

export const auditQuerySchema = z
  .object({
    ...filterShape,
    before: cursor,
    after: cursor,
    pageSize: z.coerce.number().int("A page holds a whole number of rows.").min(1).max(AUDIT_MAX_PAGE_SIZE).default(AUDIT_PAGE_SIZE),
  })
  .superRefine((query, ctx) => {
    endNotBeforeStart(query, ctx);
    if (query.before !== undefined && query.after !== undefined) ctx.addIssue({ code: "custom", path: ["before"], message: "Page to older or to newer rows, not both." });
  });
export type AuditQueryInput = z.input<typeof auditQuerySchema>;
export type AuditQuery = z.output<typeof auditQuerySchema>;

export const AUDIT_FILTER_KEYS = ["record", "table", "person", "from", "to"] as const;
/** The filter as the page address and the form hold it: text as typed, blank keys left out. */
export type AuditFilterText = Partial<Record<(typeof AUDIT_FILTER_KEYS)[number], string>>;
type RawParams = Record<string, string | string[] | undefined> | URLSearchParams;

function first(raw: RawParams, key: string): string | undefined {
  const value = raw instanceof URLSearchParams ? (raw.get(key) ?? undefined) : raw[key];
  const text = Array.isArray(value) ? value[0] : value;
  return text?.trim() ? text.trim() : undefined;
}

/** The filter keys of a page address (Next.js searchParams or URLSearchParams), nothing else. */
export function readAuditFilterText(raw: RawParams): AuditFilterText {
  return Object.fromEntries(AUDIT_FILTER_KEYS.flatMap((key) => (first(raw, key) ? [[key, first(raw, key)!]] : [])));
}

export type AuditPaging = { before?: string; after?: string; pageSize?: number };

/** The paging keys of a page address; a page size that is not offered is left out (the default applies). */
export function readAuditPaging(raw: RawParams): AuditPaging {
  const size = Number(first(raw, "pageSize"));
  return {
    ...(first(raw, "before") && { before: first(raw, "before") }),
    ...(first(raw, "after") && { after: first(raw, "after") }),
    ...((AUDIT_PAGE_SIZES as readonly number[]).includes(size) && size !== AUDIT_PAGE_SIZE && { pageSize: size }),
  };
}

/** "?record=T26-00004&before=812" for the audit trail page or its export; "" when there is nothing to say. */
export function auditSearch(filter: AuditFilterText, paging: AuditPaging = {}): string {
  const params = new URLSearchParams();
  for (const key of AUDIT_FILTER_KEYS) if (filter[key]) params.set(key, filter[key]);
  if (paging.before) params.set("before", paging.before);
  if (paging.after) params.set("after", paging.after);
  if (paging.pageSize && paging.pageSize !== AUDIT_PAGE_SIZE) params.set("pageSize", String(paging.pageSize));
  const text = params.toString();
  return text ? `?${text}` : "";
}

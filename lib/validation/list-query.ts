import { z } from "zod";

/**
 * Query strings of the lists (shipments, rolls, coupons, specimens, runs), read from the page address.
 * A list is never refused for a bad address: each value that does not read falls back to its default and
 * is named in `ignored`, so the page can say what it left out.
 */
export const LIST_KINDS = ["shipments", "rolls", "coupons", "specimens", "runs"] as const;
export type ListKind = (typeof LIST_KINDS)[number];

export const PAGE_SIZES = [25, 50, 100] as const;
export const DEFAULT_PAGE_SIZE = 50;
// A page number past this is certainly a typing slip; it still gives an (empty) page, not an error.
const MAX_PAGE = 100_000;

export const ITEM_STATES = ["RECEIVED", "STORED", "CUT", "PREPARED", "ASSIGNED", "UNDER_TEST", "TESTED", "RETAINED", "DISPOSED"] as const;
export type ItemStateName = (typeof ITEM_STATES)[number];
export const RUN_STATES = ["SET_UP", "SATURATING", "EQUILIBRATING", "PERMEATING", "TERMINATED", "POST_TEST_RECORDED", "SUBMITTED", "RETURNED", "APPROVED", "ABANDONED"] as const;
export type RunStateFilter = (typeof RUN_STATES)[number];

/** The columns each list can be sorted by; the first is the default, newest first. */
export const LIST_SORTS = {
  shipments: ["received", "labNumber"],
  rolls: ["received", "labNumber", "rollNumber", "state"],
  coupons: ["cut", "labNumber", "state"],
  specimens: ["prepared", "labNumber", "state"],
  runs: ["mounted", "labNumber", "state"],
} as const satisfies Record<ListKind, readonly [string, ...string[]]>;
export type ListSort<K extends ListKind> = (typeof LIST_SORTS)[K][number];
export type SortDirection = "asc" | "desc";

/** Which date the from/to filter and the date column of each list mean. */
export const LIST_DATE_LABELS: Record<ListKind, string> = { shipments: "Received", rolls: "Received", coupons: "Cut", specimens: "Prepared", runs: "Mounted" };

export type ListQuery<K extends ListKind = ListKind> = {
  page: number;
  pageSize: number;
  sort: ListSort<K>;
  dir: SortDirection;
  clientOrganizationId?: string;
  projectId?: string;
  /** An item state; on the runs list, a run state. */
  state?: K extends "runs" ? RunStateFilter : ItemStateName;
  /** Runs only: the cell, the technician performing it, the method. */
  cellId?: string;
  technicianId?: string;
  methodCode?: string;
  /** Shipments only: true for acknowledged receipts, false for those still to acknowledge. */
  acknowledged?: boolean;
  /** Start of the first day, UTC, inclusive. */
  from?: Date;
  /** Start of the day after the last day, UTC, exclusive. */
  to?: Date;
  /** Lab number or roll number prefix, trimmed. */
  q?: string;
};

export type ParsedListQuery<K extends ListKind> = { query: ListQuery<K>; ignored: { key: string; message: string }[] };

// Record ids are uuids in the app and readable ids in fixtures; anything with other characters is not one.
const recordId = z.string().trim().max(64, "That is not a record id.").regex(/^[A-Za-z0-9:_-]+$/, "That is not a record id.");
/** A calendar day typed as YYYY-MM-DD, read as the start of that day in UTC. */
export const calendarDay = z
  .string()
  .trim()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "Enter a date as YYYY-MM-DD.")
  // 2026-02-30 would silently become 2 March; a date must read back as typed.
  .refine((text) => isRealDay(text), "Enter a real date.")
  .transform((text) => new Date(`${text}T00:00:00.000Z`));

function isRealDay(text: string): boolean {
  const date = new Date(`${text}T00:00:00.000Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === text && date.getUTCFullYear() >= 1900 && date.getUTCFullYear() <= 2200;
}

const fieldSchemas = {
  page: z.coerce.number({ message: "The page is a whole number." }).int("The page is a whole number.").min(1, "Pages start at 1.").max(MAX_PAGE, `Pages stop at ${MAX_PAGE}.`),
  pageSize: z.coerce.number().refine((n) => (PAGE_SIZES as readonly number[]).includes(n), `Show ${PAGE_SIZES.join(", ")} rows a page.`),
  dir: z.enum(["asc", "desc"], { message: "Sort asc or desc." }),
  clientOrganizationId: recordId,
  projectId: recordId,
  state: z.enum(ITEM_STATES, { message: "That is not an item state." }),
  runState: z.enum(RUN_STATES, { message: "That is not a run state." }),
  methodCode: z.string().trim().max(16, "That is not a method.").regex(/^[A-Z0-9]+$/, "That is not a method."),
  acknowledged: z.enum(["yes", "no"], { message: "Acknowledged is yes or no." }).transform((v) => v === "yes"),
  from: calendarDay,
  to: calendarDay,
  q: z.string().trim().max(50, "Search for at most 50 characters."),
};

type RawValue = string | string[] | undefined | null;
export type RawSearchParams = Record<string, RawValue> | URLSearchParams;

const DAY_MS = 86_400_000;

/** Reads a list's query string (Next.js searchParams or URLSearchParams); never throws. */
export function parseListQuery<K extends ListKind>(kind: K, raw: RawSearchParams | undefined): ParsedListQuery<K> {
  const value = (key: string): string | undefined => {
    const v = raw instanceof URLSearchParams ? raw.get(key) : raw?.[key];
    const first = Array.isArray(v) ? v[0] : v;
    return first === undefined || first === null || first.trim() === "" ? undefined : first;
  };
  const ignored: { key: string; message: string }[] = [];
  const read = <S extends z.ZodType>(key: string, schema: S): z.output<S> | undefined => {
    const text = value(key);
    if (text === undefined) return undefined;
    const result = schema.safeParse(text);
    if (result.success) return result.data;
    ignored.push({ key, message: result.error.issues[0]?.message ?? "Not understood." });
    return undefined;
  };

  const sorts = LIST_SORTS[kind] as readonly string[];
  const sort = read("sort", z.string().refine((s) => sorts.includes(s), `This list sorts by ${sorts.join(", ")}.`)) ?? sorts[0]!;
  // Dates read newest first, everything else from the start of the alphabet or the chain.
  const dir = read("dir", fieldSchemas.dir) ?? (sort === sorts[0] ? "desc" : "asc");
  const query: ListQuery<K> = {
    page: read("page", fieldSchemas.page) ?? 1,
    pageSize: read("pageSize", fieldSchemas.pageSize) ?? DEFAULT_PAGE_SIZE,
    sort: sort as ListSort<K>,
    dir,
    clientOrganizationId: read("clientOrganizationId", fieldSchemas.clientOrganizationId),
    projectId: read("projectId", fieldSchemas.projectId),
    q: read("q", fieldSchemas.q) || undefined,
  };
  if (kind === "shipments") query.acknowledged = read("acknowledged", fieldSchemas.acknowledged);
  else if (kind === "runs") {
    (query as ListQuery<"runs">).state = read("state", fieldSchemas.runState);
    query.cellId = read("cellId", fieldSchemas.clientOrganizationId);
    query.technicianId = read("technicianId", fieldSchemas.clientOrganizationId);
    query.methodCode = read("methodCode", fieldSchemas.methodCode);
  } else (query as ListQuery<"rolls">).state = read("state", fieldSchemas.state);

  let from = read("from", fieldSchemas.from);
  let to = read("to", fieldSchemas.to);
  // A range typed backwards is still a range.
  if (from && to && from > to) [from, to] = [to, from];
  query.from = from;
  query.to = to ? new Date(to.getTime() + DAY_MS) : undefined;
  return { query, ignored };
}

/** The query string for a list address: defaults are left out so addresses stay short. */
export function listQueryToSearch(kind: ListKind, query: Partial<ListQuery>): string {
  const params = new URLSearchParams();
  const sorts = LIST_SORTS[kind] as readonly string[];
  const sort = query.sort ?? sorts[0]!;
  if (query.clientOrganizationId) params.set("clientOrganizationId", query.clientOrganizationId);
  if (query.projectId) params.set("projectId", query.projectId);
  if (query.state) params.set("state", query.state);
  if (query.cellId) params.set("cellId", query.cellId);
  if (query.technicianId) params.set("technicianId", query.technicianId);
  if (query.methodCode) params.set("methodCode", query.methodCode);
  if (query.acknowledged !== undefined) params.set("acknowledged", query.acknowledged ? "yes" : "no");
  if (query.from) params.set("from", query.from.toISOString().slice(0, 10));
  if (query.to) params.set("to", new Date(query.to.getTime() - DAY_MS).toISOString().slice(0, 10));
  if (query.q) params.set("q", query.q);
  if (sort !== sorts[0]) params.set("sort", sort);
  if (query.dir && query.dir !== (sort === sorts[0] ? "desc" : "asc")) params.set("dir", query.dir);
  if (query.pageSize && query.pageSize !== DEFAULT_PAGE_SIZE) params.set("pageSize", String(query.pageSize));
  if (query.page && query.page > 1) params.set("page", String(query.page));
  const text = params.toString();
  return text ? `?${text}` : "";
}

const FILTER_KEYS = ["clientOrganizationId", "projectId", "state", "cellId", "technicianId", "methodCode", "acknowledged", "from", "to", "q"] as const;

/** For the filter bar: the filters as address strings, and the other settings a filter change keeps (sort, page size). */
export function listQueryToFilterParts(kind: ListKind, query: ListQuery): { values: Partial<Record<(typeof FILTER_KEYS)[number], string>>; keep: Record<string, string> } {
  const params = new URLSearchParams(listQueryToSearch(kind, { ...query, page: 1 }));
  const values: Partial<Record<(typeof FILTER_KEYS)[number], string>> = {};
  const keep: Record<string, string> = {};
  for (const [key, value] of params) {
    if ((FILTER_KEYS as readonly string[]).includes(key)) values[key as (typeof FILTER_KEYS)[number]] = value;
    else keep[key] = value;
  }
  return { values, keep };
}

/** A searchable client or project field's question to the server (GET /api/filter-choices). */
export const filterChoiceQuerySchema = z.object({
  kind: z.enum(["clients", "projects"], { message: "Ask for clients or projects." }).default("projects"),
  q: z.string().trim().max(50, "Search for at most 50 characters.").default(""),
  clientOrganizationId: recordId.optional(),
});

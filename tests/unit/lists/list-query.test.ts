import { describe, expect, it } from "vitest";
import { DEFAULT_PAGE_SIZE, listQueryToFilterParts, listQueryToSearch, parseListQuery } from "@/lib/validation/list-query";

// Expected values follow from the schema's own rules (defaults, whitelists); dates are UTC days (common practice).
describe("list query strings", () => {
  it("gives the defaults for an empty address: page 1 of 50, newest first", () => {
    const { query, ignored } = parseListQuery("rolls", {});
    expect(query).toMatchObject({ page: 1, pageSize: DEFAULT_PAGE_SIZE, sort: "received", dir: "desc" });
    expect(query.state).toBeUndefined();
    expect(ignored).toEqual([]);
  });

  it("reads every filter from Next.js searchParams and from URLSearchParams alike", () => {
    const raw = { page: "3", pageSize: "25", sort: "labNumber", dir: "desc", clientOrganizationId: "org-1", projectId: "prj-1", state: "STORED", from: "2026-01-01", to: "2026-01-31", q: "  R26-001 " };
    for (const input of [raw, new URLSearchParams(raw)]) {
      const { query, ignored } = parseListQuery("rolls", input);
      expect(ignored).toEqual([]);
      expect(query).toMatchObject({ page: 3, pageSize: 25, sort: "labNumber", dir: "desc", clientOrganizationId: "org-1", projectId: "prj-1", state: "STORED", q: "R26-001" });
      expect(query.from?.toISOString()).toBe("2026-01-01T00:00:00.000Z");
      // "to" is the whole last day: the filter stops before the next midnight.
      expect(query.to?.toISOString()).toBe("2026-02-01T00:00:00.000Z");
    }
  });

  it("sorts non-date columns from the start by default, dates from the newest", () => {
    expect(parseListQuery("coupons", { sort: "state" }).query.dir).toBe("asc");
    expect(parseListQuery("coupons", { sort: "cut" }).query.dir).toBe("desc");
    expect(parseListQuery("specimens", {}).query.sort).toBe("prepared");
    expect(parseListQuery("shipments", {}).query.sort).toBe("received");
  });

  it("falls back to the default for each bad value and says which it left out", () => {
    const { query, ignored } = parseListQuery("rolls", { page: "-2", pageSize: "33", sort: "passwordHash", dir: "sideways", state: "LOST", from: "yesterday", to: "2026-02-30", clientOrganizationId: "x'; DROP TABLE", q: "x".repeat(80) });
    expect(query).toMatchObject({ page: 1, pageSize: 50, sort: "received", dir: "desc" });
    expect(query.state).toBeUndefined();
    expect(query.from).toBeUndefined();
    expect(query.clientOrganizationId).toBeUndefined();
    expect(query.q).toBeUndefined();
    expect(ignored.map((i) => i.key).sort()).toEqual(["clientOrganizationId", "dir", "from", "page", "pageSize", "q", "sort", "state", "to"].sort());
    expect(ignored.find((i) => i.key === "sort")?.message).toBe("This list sorts by received, labNumber, rollNumber, state.");
  });

  it("refuses a sort column of another list and page numbers that are not whole", () => {
    expect(parseListQuery("shipments", { sort: "state" }).query.sort).toBe("received");
    expect(parseListQuery("rolls", { page: "2.5" }).query.page).toBe(1);
    expect(parseListQuery("rolls", { page: "1e9" }).query.page).toBe(1);
  });

  it("takes the first of repeated parameters and treats blanks as absent", () => {
    const { query, ignored } = parseListQuery("rolls", { state: ["CUT", "STORED"], q: "   ", projectId: "" });
    expect(query.state).toBe("CUT");
    expect(query.q).toBeUndefined();
    expect(query.projectId).toBeUndefined();
    expect(ignored).toEqual([]);
  });

  it("turns a backwards date range round", () => {
    const { query } = parseListQuery("coupons", { from: "2026-03-10", to: "2026-03-01" });
    expect(query.from?.toISOString()).toBe("2026-03-01T00:00:00.000Z");
    expect(query.to?.toISOString()).toBe("2026-03-11T00:00:00.000Z");
  });

  it("has acknowledged, not state, on shipments", () => {
    const { query } = parseListQuery("shipments", { acknowledged: "no", state: "CUT" });
    expect(query.acknowledged).toBe(false);
    expect(query.state).toBeUndefined();
    expect(parseListQuery("shipments", { acknowledged: "yes" }).query.acknowledged).toBe(true);
    expect(parseListQuery("rolls", { acknowledged: "yes" }).query.acknowledged).toBeUndefined();
  });

  it("writes a query back as a short address that reads the same", () => {
    const { query } = parseListQuery("rolls", { state: "CUT", sort: "labNumber", page: "2", from: "2026-01-01", to: "2026-01-31" });
    const search = listQueryToSearch("rolls", query);
    expect(search).toBe("?state=CUT&from=2026-01-01&to=2026-01-31&sort=labNumber&page=2");
    expect(parseListQuery("rolls", new URLSearchParams(search.slice(1))).query).toEqual(query);
    expect(listQueryToSearch("rolls", parseListQuery("rolls", {}).query)).toBe("");
  });

  it("splits filters from the settings a filter change keeps", () => {
    const { query } = parseListQuery("coupons", { state: "CUT", sort: "labNumber", pageSize: "100", page: "4" });
    expect(listQueryToFilterParts("coupons", query)).toEqual({ values: { state: "CUT" }, keep: { sort: "labNumber", pageSize: "100" } });
  });
});

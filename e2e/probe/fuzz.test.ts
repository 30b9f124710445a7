import http from "node:http";
import { beforeAll, describe, expect, it } from "vitest";
import { can, ROLES, type Action, type RoleName } from "@/lib/policy/permissions";
import { browserAvailable } from "../support/session";
import { discoverPages, discoverRouteHandlers, discoverServerActions } from "./support/app-map";
import { recordFigure } from "./support/figures";
import { generatedObjects, HOSTILE_BODIES, HOSTILE_VALUES } from "./support/fuzz-corpus";
import { appUrl, callAction, isServerFault, request, signIn, type ActionAnswer, type Answer, type Session } from "./support/probe-client";
import { makeProbeUser } from "./support/probe-database";
import { samplePath } from "./support/sample-paths";
import { knownFieldNames } from "./support/schema-fields";

// Path segments and query strings no link of the app produces.
const HOSTILE_SEGMENTS = ["%00", "a%00b", "%ZZ", "%", "%ED%A0%80", "%C0%AF", "..%2F..%2Fetc%2Fpasswd", "x".repeat(3_000), "%3Cscript%3Ealert(1)%3C%2Fscript%3E", encodeURIComponent("💧"), "-1", "0001", "%20", ".", "%27%20OR%201%3D1"];
const HOSTILE_QUERIES = [
  "?page=-1&pageSize=1e9&sort=%3Cx%3E&dir=up", "?page=99999999999999999999", "?from=0001-01-01&to=2026-02-30", "?from=-000001-01-01", "?q=%00", "?q=%ED%A0%80", "?state=%ZZ",
  `?numbers=${"R26-00001,".repeat(400)}`, "?numbers=%00", "?callbackUrl=/%5Cevil.example/", "?callbackUrl=%2F%09%2Fevil.example", "?revision=-1", "?revision=1e309", "?projectId=%27%20OR%201%3D1", "?clientOrganizationId[]=x",
];

/** Runs `work` over `items`, a few at a time (the server has few cores; the order does not matter). */
async function inParallel<T>(items: T[], work: (item: T) => Promise<void>, width = 4): Promise<void> {
  let next = 0;
  await Promise.all(Array.from({ length: width }, async () => {
    while (next < items.length) await work(items[next++]!);
  }));
}

/** A request the fetch API would not send as it is: a body of unknown length, or a raw path. */
function rawRequest(options: { path: string; method?: string; headers?: Record<string, string>; chunks?: string[] }): Promise<Answer> {
  const base = new URL(appUrl());
  return new Promise((resolve, reject) => {
    const req = http.request({ host: base.hostname, port: base.port, path: options.path, method: options.method ?? "GET", headers: options.headers }, (res) => {
      let text = "";
      res.on("data", (chunk) => (text += chunk));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, location: res.headers.location ?? null, text, setCookies: [] }));
    });
    req.on("error", reject);
    for (const chunk of options.chunks ?? []) req.write(chunk);
    req.end();
  });
}

describe.skipIf(!browserAvailable())("probe: hostile input against every server action, page and route handler", () => {
  const tally = { inputs: 0, faults: [] as string[] };
  const sessions = new Map<RoleName, Session>();
  function check(label: string, answer: Answer & { result?: ActionAnswer["result"] }) {
    tally.inputs += 1;
    if (isServerFault(answer)) tally.faults.push(`${label}: ${answer.status} ${answer.result?.message ?? answer.text.slice(0, 160)}`);
  }

  beforeAll(async () => {
    // People of its own, each at an address of its own, so the fuzzer's wrong passwords never slow down
    // the demo accounts or 127.0.0.1, which the other journeys use.
    for (const [index, role] of ROLES.entries()) {
      const person = await makeProbeUser(role, `fuzz-${role.toLowerCase()}`, role === "CLIENT_USER" ? { organizationCode: "MWA" } : {});
      sessions.set(role, await signIn(person.email, person.password, `198.51.100.${10 + index}`));
    }
  });

  it("server actions: raw bodies of the wrong shape, hostile values in every field, generated objects", async () => {
    const fields = await knownFieldNames();
    const actions = discoverServerActions();
    const before = tally.inputs;
    for (const [index, action] of actions.entries()) {
      const role = ROLES.find((r) => can(r, action.permission as Action));
      const session = role ? sessions.get(role)! : null;
      const page = await samplePath(action.pages[0]!);
      const bodies = [
        ...HOSTILE_BODIES,
        ...HOSTILE_VALUES.slice(0, 12).map((v) => JSON.stringify([v])),
        // Every field at once, with values short enough that the body stays under the 1 MB limit however
        // many fields the forms have (a body over it is the front door's test, answered before it is read).
        ...HOSTILE_VALUES.filter((v) => typeof v !== "string" || v.length * fields.length <= 800_000).map((v) => JSON.stringify([Object.fromEntries(fields.map((f) => [f, v]))])),
        ...generatedObjects(fields, 20, 1000 + index).map((o) => JSON.stringify([o])),
      ];
      await inParallel(bodies, async (body) => check(`${action.name} ${body.slice(0, 80)}`, await callAction(action.id, page, body, session)));
    }
    recordFigure("06-fuzz-actions", { label: "fuzz: server actions", values: { actions: actions.length, inputs: tally.inputs - before } });
  }, 900_000);

  it("pages and route handlers: hostile path segments and query strings", async () => {
    const before = tally.inputs;
    const routes = [...discoverPages().map((p) => ({ ...p, declared: p.declared })), ...discoverRouteHandlers().filter((h) => h.methods.includes("GET"))];
    const requests: Array<{ path: string; session: Session | null }> = [];
    for (const route of routes) {
      const role = route.declared ? ROLES.find((r) => can(r, route.declared as Action)) : "LAB_ADMIN";
      const session = role ? sessions.get(role)! : null;
      const concrete = await samplePath(route.pattern);
      for (const query of HOSTILE_QUERIES) requests.push({ path: `${concrete}${query}`, session });
      if (route.params.length > 0) for (const segment of HOSTILE_SEGMENTS) requests.push({ path: route.pattern.replace(/\[\.\.\.[^\]]+\]/g, segment).replace(/\[[^\]]+\]/g, segment), session });
    }
    await inParallel(requests, async ({ path, session }) => check(`GET ${path.slice(0, 120)}`, await request(path, { session })));
    recordFigure("07-fuzz-routes", { label: "fuzz: pages and route handlers", values: { routes: routes.length, inputs: tally.inputs - before } });
  }, 900_000);

  it("the front door: a malformed address 400, a body over 1 MB 413, a body of unknown length 411, a change from another site 403, a redirect off the site refused", async () => {
    const admin = sessions.get("LAB_ADMIN")!;
    const action = discoverServerActions().find((a) => a.permission === "location.manage")!;
    const page = await samplePath(action.pages[0]!);

    const malformed = await rawRequest({ path: "/runs/%ZZ" });
    const nul = await rawRequest({ path: "/runs/a%00b" });
    const surrogate = await rawRequest({ path: "/samples/rolls/%ED%A0%80" });
    const oversized = await callAction(action.id, page, JSON.stringify([{ code: "X", name: "y".repeat(1_600_000) }]), admin);
    const unknownLength = await rawRequest({ path: page, method: "POST", headers: { "next-action": action.id, "content-type": "text/plain;charset=UTF-8", cookie: admin.cookie, "transfer-encoding": "chunked" }, chunks: ['[{"code":"X",', '"name":"y"}]'] });
    const crossSite = await callAction(action.id, page, [{ code: "X", name: "y" }], admin, { origin: "http://evil.example" });
    const nullOrigin = await callAction(action.id, page, [{ code: "X", name: "y" }], admin, { origin: "null" });
    const offSite = await request("/sign-in?callbackUrl=/%5Cevil.example/", { session: admin });
    const offSiteTab = await request("/sign-in?callbackUrl=/%09/evil.example", { session: admin });
    for (const [label, answer] of Object.entries({ malformed, nul, surrogate, oversized, unknownLength, crossSite, nullOrigin, offSite, offSiteTab })) check(`front door: ${label}`, answer);

    expect([malformed.status, nul.status, surrogate.status]).toEqual([400, 400, 400]);
    expect(malformed.text).toMatch(/not well formed/);
    expect(oversized.status).toBe(413);
    expect(oversized.text).toMatch(/larger than 1 MB/);
    expect(unknownLength.status).toBe(411);
    expect([crossSite.status, nullOrigin.status]).toEqual([403, 403]);
    expect(crossSite.text).toMatch(/another site/);
    expect(offSite.status).toBe(307);
    expect(new URL(offSite.location!, appUrl()).origin).toBe(appUrl());
    // A tab has no place in an address: the front door refuses it before the page could redirect anywhere.
    expect(offSiteTab.status).toBe(400);
  });

  it("adds up to no server error for any input", () => {
    recordFigure("08-fuzz", { label: "fuzz, all", values: { "inputs tried": tally.inputs, "server errors": tally.faults.length } });
    expect(tally.faults).toEqual([]);
  });
});

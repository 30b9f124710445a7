import { beforeAll, describe, expect, it } from "vitest";
import { can, ROLES, type Action, type RoleName } from "@/lib/policy/permissions";
import { actionForPath, isPublicPath } from "@/lib/policy/routes";
import { browserAvailable } from "../support/session";
import { discoverDeclaredActions, discoverPages, discoverRouteHandlers, discoverServerActions } from "./support/app-map";
import { recordFigure } from "./support/figures";
import { callAction, isServerFault, request, signIn, type Answer, type Session } from "./support/probe-client";
import { samplePath } from "./support/sample-paths";

// One person of each role in the demo; "anonymous" is nobody signed in.
const PEOPLE: Record<RoleName, string> = {
  INTAKE_CLERK: "clerk@quillfen.test",
  TECHNICIAN: "technician@quillfen.test",
  QA_MANAGER: "qa@quillfen.test",
  LAB_ADMIN: "admin@quillfen.test",
  CLIENT_USER: "portal@marrowdale.test",
};
type Who = RoleName | "anonymous";
const EVERYONE: Who[] = [...ROLES, "anonymous"];

// Route handlers that decide per record (a client's own organisation) rather than by one permission; a new
// handler without requireUser must be added here, or the probe fails and says so.
const HANDLER_POLICY: Record<string, (who: Who) => boolean> = {
  "/api/auth/[...nextauth]": () => true,
  "/api/health": () => true,
  "/api/certificates/[number]/pdf": (who) => who !== "anonymous" && (can(who, "certificate.view") || can(who, "portal.view")),
  "/api/shipments/[labNumber]/receipt": (who) => who !== "anonymous" && (can(who, "shipment.view") || can(who, "portal.view")),
  // The API answers API tokens only (lib/policy/api-tokens.ts): a browser session, whoever's, is 401 there.
  "/api/v1/rolls": () => false,
  "/api/v1/rolls/[labNumber]": () => false,
  "/api/v1/specimens": () => false,
  "/api/v1/specimens/[labNumber]": () => false,
  "/api/v1/runs": () => false,
  "/api/v1/runs/[labNumber]": () => false,
  "/api/v1/runs/[labNumber]/readings": () => false,
  "/api/v1/results": () => false,
  "/api/v1/certificates": () => false,
  "/api/v1/certificates/[number]": () => false,
  "/api/v1/certificates/[number]/pdf": () => false,
  // The API's description is public: it says what the API accepts, nothing of the lab's records.
  "/api/v1/openapi.json": () => true,
};

type Verdict = "allowed" | "refused" | "fault" | "unclear";

/**
 * What an answer to a page or handler request says about access: shown (or 404: the role check passed and
 * the record is not there), or refused (401, 403, or sent elsewhere, such as a client sent to the portal).
 */
function verdictOf(answer: Answer): Verdict {
  if (answer.status >= 500) return "fault";
  if (answer.status === 200 || answer.status === 404) return "allowed";
  if (answer.status === 401 || answer.status === 403 || (answer.status >= 300 && answer.status < 400)) return "refused";
  return "unclear";
}

describe.skipIf(!browserAvailable())("probe: every route and server action, for every role, against the policy", () => {
  const sessions = new Map<Who, Session | null>([["anonymous", null]]);
  beforeAll(async () => {
    for (const role of ROLES) sessions.set(role, await signIn(PEOPLE[role]));
  });

  const tally = { checks: 0, unexpectedAllows: [] as string[], unexpectedRefusals: [] as string[], faults: [] as string[], unclear: [] as string[] };
  function judge(what: string, who: Who, expected: boolean | "public", verdict: Verdict) {
    tally.checks += 1;
    const line = `${what} as ${who}`;
    if (verdict === "fault") tally.faults.push(line);
    // A public page may send a signed-in person on (the sign-in page does); it may not fail.
    else if (expected === "public") return;
    else if (verdict === "unclear") tally.unclear.push(line);
    else if (verdict === "allowed" && !expected) tally.unexpectedAllows.push(line);
    else if (verdict === "refused" && expected) tally.unexpectedRefusals.push(line);
  }

  it("pages: each page asks for the permission lib/policy/routes.ts names for it, and answers each role accordingly", async () => {
    const pages = discoverPages();
    expect(pages.length).toBeGreaterThan(30);
    const outOfStep = pages.filter((p) => !isPublicPath(p.pattern) && p.declared !== actionForPath(p.pattern)).map((p) => `${p.file}: requirePageUser("${p.declared}") but routes.ts says ${actionForPath(p.pattern)}`);
    expect(outOfStep).toEqual([]);
    const before = tally.checks;
    for (const page of pages) {
      const path = await samplePath(page.pattern);
      for (const who of EVERYONE) {
        const expected = isPublicPath(page.pattern) ? "public" : who !== "anonymous" && (page.declared === null || can(who, page.declared as Action));
        judge(`GET ${path}`, who, expected, verdictOf(await request(path, { session: sessions.get(who) })));
      }
    }
    recordFigure("01-pages", { label: "route x role checks (pages)", values: { pages: pages.length, checks: tally.checks - before } });
  });

  it("route handlers: each answers each role as its permission (or its record rule) says", async () => {
    const handlers = discoverRouteHandlers();
    const unknown = handlers.filter((h) => !h.declared && !HANDLER_POLICY[h.pattern]).map((h) => `${h.file} has no requireUser and no entry in HANDLER_POLICY`);
    expect(unknown).toEqual([]);
    const before = tally.checks;
    for (const handler of handlers.filter((h) => h.methods.includes("GET"))) {
      const path = handler.pattern === "/api/auth/[...nextauth]" ? "/api/auth/session" : await samplePath(handler.pattern);
      const query = handler.pattern === "/api/labels" ? "?numbers=R26-00001" : "";
      for (const who of EVERYONE) {
        const expected = handler.declared ? who !== "anonymous" && can(who, handler.declared as Action) : HANDLER_POLICY[handler.pattern]!(who);
        judge(`GET ${path}${query}`, who, expected, verdictOf(await request(`${path}${query}`, { session: sessions.get(who) })));
      }
    }
    recordFigure("02-handlers", { label: "route x role checks (route handlers)", values: { handlers: handlers.length, checks: tally.checks - before } });
  });

  it("server actions: every action in the build asks for a permission, and refuses every role the policy does not give it", async () => {
    const actions = discoverServerActions();
    expect(actions.length).toBeGreaterThan(25);
    expect(actions.filter((a) => !a.permission).map((a) => `${a.file} ${a.name} calls no requireUser("...")`)).toEqual([]);
    const built = new Set(actions.map((a) => `${a.file}:${a.name}`));
    const notExposed = discoverDeclaredActions().filter((d) => !built.has(`${d.file}:${d.name}`));
    const before = tally.checks;
    for (const action of actions) {
      const path = await samplePath(action.pages[0]!);
      for (const who of EVERYONE) {
        const answer = await callAction(action.id, path, [{}], sessions.get(who) ?? null);
        const code = answer.result?.code;
        const verdict: Verdict = isServerFault(answer) ? "fault" : code === "FORBIDDEN" || code === "UNAUTHENTICATED" || verdictOf(answer) === "refused" ? "refused" : answer.result ? "allowed" : "unclear";
        judge(`action ${action.name}`, who, who !== "anonymous" && can(who, action.permission as Action), verdict);
      }
    }
    recordFigure("03-actions", { label: "action x role checks", values: { actions: actions.length, checks: tally.checks - before, "declared but not in the build": notExposed.length } });
  });

  it("adds up to no unexpected allow, no unexpected refusal and no fault", () => {
    recordFigure("04-matrix", {
      label: "route and action x role, all",
      values: { checks: tally.checks, "unexpected allows": tally.unexpectedAllows.length, "unexpected refusals": tally.unexpectedRefusals.length, "server errors": tally.faults.length },
    });
    expect(tally.unexpectedAllows).toEqual([]);
    expect(tally.unexpectedRefusals).toEqual([]);
    expect(tally.faults).toEqual([]);
    expect(tally.unclear).toEqual([]);
  });
});

import type { Action } from "./permissions";

/**
 * Which action a page address needs. The request proxy answers 403 from this table before a page renders;
 * pages check again with fresh user data. Longest prefix wins; addresses not listed need only a session.
 */
const ROUTE_ACTIONS: ReadonlyArray<readonly [prefix: string, action: Action]> = [
  ["/", "workspace.view"], // the staff start page only: "/" matches no longer path
  ["/admin/users", "user.manage"],
  ["/admin/audit", "audit.view"],
  ["/admin/clients", "client.manage"],
  ["/admin/lab", "lab.configure"],
  ["/intake", "shipment.view"],
  ["/intake/new", "shipment.create"],
  ["/search", "workspace.view"],
  ["/samples", "sample.view"],
  ["/projects", "sample.view"],
  ["/index-tests", "run.view"],
  ["/index-tests/new", "run.operate"],
  ["/labels", "sample.view"],
  ["/runs", "run.view"],
  ["/runs/new", "run.operate"],
  ["/cells", "run.view"],
  ["/equipment", "equipment.view"],
  ["/equipment/new", "equipment.manage"],
  ["/review", "run.review"],
  ["/certificates", "certificate.view"],
  ["/specifications", "certificate.view"],
  ["/methods", "run.view"],
  ["/specifications/new", "specification.manage"],
  ["/certificates/new", "certificate.issue"],
  ["/portal", "portal.view"],
  ["/account", "account.self"],
];

/** Addresses anyone may open, signed in or not. */
const PUBLIC_PREFIXES = ["/sign-in", "/verify", "/api/health", "/api/auth", "/forbidden"];

export function isPublicPath(pathname: string): boolean {
  return PUBLIC_PREFIXES.some((prefix) => pathname === prefix || pathname.startsWith(`${prefix}/`));
}

/** The action a path needs, or null when a session is enough. */
export function actionForPath(pathname: string): Action | null {
  let best: readonly [string, Action] | null = null;
  for (const entry of ROUTE_ACTIONS) {
    const [prefix] = entry;
    if ((pathname === prefix || pathname.startsWith(`${prefix}/`)) && (!best || prefix.length > best[0].length)) best = entry;
  }
  return best ? best[1] : null;
}

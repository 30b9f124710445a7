import { inject } from "vitest";

/*
 * Plain HTTP against the app the end-to-end set-up started: signing in as anyone, opening pages and
 * route handlers, and calling server actions the way the browser does (a POST to a page that includes the
 * action, with its id in the Next-Action header and the arguments as JSON).
 */

/** The app's address (on 127.0.0.1). */
export function appUrl(): string {
  const url = new URL(inject("baseUrl"));
  url.hostname = "127.0.0.1";
  return url.toString().replace(/\/$/, "");
}

/*
 * The app under test trusts one reverse proxy (SEEPLINE_TRUSTED_PROXIES=1, e2e/global-setup.ts), so a probe
 * can play a client at any network address by sending X-Forwarded-For as that proxy would. Without one
 * the client is 127.0.0.1, as for every other journey.
 */
const from = (address?: string): Record<string, string> => (address ? { "x-forwarded-for": address } : {});

/** A signed-in client: its cookies, and the network address it comes from (when not 127.0.0.1). */
export type Session = { cookie: string; email: string; address?: string };

function keepCookies(jar: Map<string, string>, response: Response) {
  for (const line of response.headers.getSetCookie()) {
    const [pair] = line.split(";");
    const eq = pair!.indexOf("=");
    jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
  }
}
const cookieHeader = (jar: Map<string, string>) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

/** Tries a sign-in over HTTP; the session when it worked, else next-auth's error text ("Too many ..." when throttled). */
export async function trySignIn(email: string, password: string, address?: string): Promise<{ session: Session | null; error: string | null }> {
  const base = appUrl();
  const jar = new Map<string, string>();
  const csrf = await fetch(`${base}/api/auth/csrf`, { headers: from(address) });
  keepCookies(jar, csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const response = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar), ...from(address) },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keepCookies(jar, response);
  const session = [...jar.keys()].some((name) => name.endsWith("next-auth.session-token")) ? { cookie: cookieHeader(jar), email, address } : null;
  if (session) return { session, error: null };
  // next-auth answers a refused sign-in with the address of its error page, whose ?error= is the sentence.
  const body = await response.text().catch(() => "");
  let target = response.headers.get("location") ?? "";
  try {
    target ||= (JSON.parse(body) as { url?: string }).url ?? "";
  } catch {
    // not JSON: keep the text itself
  }
  const error = target ? new URL(target, "http://x").searchParams.get("error") : body;
  return { session: null, error: error || "unknown" };
}

export async function signIn(email: string, password = "seepline-demo", address?: string): Promise<Session> {
  const { session, error } = await trySignIn(email, password, address);
  if (!session) throw new Error(`signing in as ${email} failed: ${error}`);
  return session;
}

export type Answer = { status: number; location: string | null; text: string; setCookies: string[] };

/** A request to the app, never following redirects. */
export async function request(pathAndQuery: string, options: { session?: Session | null; method?: string; body?: string; headers?: Record<string, string> } = {}): Promise<Answer> {
  const response = await fetch(`${appUrl()}${pathAndQuery}`, {
    method: options.method ?? "GET",
    redirect: "manual",
    headers: { ...(options.session ? { cookie: options.session.cookie } : {}), ...from(options.session?.address), ...options.headers },
    body: options.body,
  });
  return { status: response.status, location: response.headers.get("location"), text: await response.text(), setCookies: response.headers.getSetCookie() };
}

export type ActionAnswer = Answer & { result: { ok: boolean; code?: string; message?: string; data?: unknown } | null };

/** Calls a server action as the browser does; `result` is the ActionResult it returned, when it returned one. */
export async function callAction(actionId: string, pagePath: string, args: unknown[] | string, session: Session | null, headers: Record<string, string> = {}): Promise<ActionAnswer> {
  const answer = await request(pagePath, {
    session,
    method: "POST",
    headers: { "next-action": actionId, "content-type": "text/plain;charset=UTF-8", accept: "text/x-component", ...headers },
    body: typeof args === "string" ? args : JSON.stringify(args),
  });
  return { ...answer, result: actionResultIn(answer.text) };
}

/** The ActionResult in a React Server Components answer (the row "1:{...}"), or null. */
function actionResultIn(text: string): ActionAnswer["result"] {
  for (const line of text.split("\n")) {
    const match = /^1:(\{.*\})$/.exec(line);
    if (!match) continue;
    try {
      const value = JSON.parse(match[1]!) as ActionAnswer["result"];
      if (value && typeof value === "object" && "ok" in value) return value;
    } catch {
      return null;
    }
  }
  return null;
}

/** A fault on the server, however it shows: an HTTP 5xx, or an action that answered "fault on the server". */
export function isServerFault(answer: Answer & { result?: ActionAnswer["result"] }): boolean {
  return answer.status >= 500 || answer.result?.code === "INTERNAL";
}

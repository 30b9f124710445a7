/** Signs in over HTTP (next-auth's credentials callback) and returns the session's cookies. */
export async function signInCookies(baseUrl: string, email: string, password: string): Promise<Array<{ name: string; value: string }>> {
  const jar = new Map<string, string>();
  const keep = (response: Response) => {
    for (const line of response.headers.getSetCookie()) {
      const [pair] = line.split(";");
      const eq = pair!.indexOf("=");
      jar.set(pair!.slice(0, eq), pair!.slice(eq + 1));
    }
  };
  const csrf = await fetch(`${baseUrl}/api/auth/csrf`);
  keep(csrf);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const response = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar) },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  keep(response);
  if (![...jar.keys()].some((name) => name.endsWith("next-auth.session-token"))) throw new Error(`sign-in over HTTP failed for ${email} (status ${response.status})`);
  return [...jar].map(([name, value]) => ({ name, value }));
}

/** The same sign-in, as the Cookie header of the session. */
export async function signInCookie(baseUrl: string, email: string, password: string): Promise<string> {
  return cookieHeader((await signInCookies(baseUrl, email, password)).map((c) => [c.name, c.value] as const));
}

const cookieHeader = (jar: Iterable<readonly [string, string]>) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

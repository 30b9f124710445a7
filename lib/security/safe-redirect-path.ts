// A placeholder origin: a target is resolved against it, and kept only if it stays on it.
const HERE = "http://seepline.invalid";

/**
 * Where to send someone after signing in: the target as a path on this site (path, query and fragment),
 * or "/" when it is missing or points anywhere else. The target is parsed as a URL, as a browser would,
 * so tricks like "/\\evil.example", "//evil.example" or "/\t/evil.example" resolve to another host and
 * are refused.
 */
export function safeRedirectPath(target: unknown): string {
  const value = Array.isArray(target) ? target[0] : target;
  if (typeof value !== "string" || value === "" || value.length > 2000) return "/";
  let url: URL;
  try {
    url = new URL(value, `${HERE}/`);
  } catch {
    return "/";
  }
  if (url.origin !== HERE || url.username || url.password) return "/";
  // What the browser would request must itself start with a single "/" (never "//host").
  const path = `${url.pathname}${url.search}${url.hash}`;
  return path.startsWith("/") && !path.startsWith("//") ? path : "/";
}

/** The same rule for a full address on the app's own origin (next-auth's redirect callback). */
export function safeRedirectUrl(target: string, baseUrl: string): string {
  const base = baseUrl.replace(/\/$/, "");
  if (target.startsWith(`${base}/`) || target === base) return `${base}${safeRedirectPath(target.slice(base.length) || "/")}`;
  return `${base}${safeRedirectPath(target)}`;
}

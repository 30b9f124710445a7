const READS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Whether a request that changes something (any method but GET, HEAD, OPTIONS; server actions are POSTs)
 * comes from a page of another site: its Origin header names a host that is neither the one the request was
 * sent to nor the app's public address. A request without Origin (not from a browser page) passes; an
 * opaque "null" origin does not.
 */
export function isCrossOriginWrite(request: { method: string; origin: string | null; hosts: Array<string | null | undefined> }): boolean {
  if (READS.has(request.method.toUpperCase()) || request.origin === null) return false;
  let originHost: string;
  try {
    originHost = new URL(request.origin).host.toLowerCase();
  } catch {
    return true;
  }
  if (!originHost) return true;
  const allowed = request.hosts.filter((h): h is string => !!h).map((h) => h.split(",")[0]!.trim().toLowerCase());
  return !allowed.includes(originHost);
}

/**
 * The security headers of every response. The front door (scripts/app-server.mjs) sets the baseline on
 * everything it serves, static files included; the request proxy (proxy.ts) sets the same, plus the pages'
 * Content-Security-Policy with a fresh nonce, which Next.js reads from the request and puts on its own
 * scripts. No inline script runs without it; styles may be inline (React style attributes, the charts).
 */

export { baselineSecurityHeaders } from "./baseline-headers.mjs";

/** The Content-Security-Policy of a page: scripts only with the request's nonce (and what they load). */
export function pageContentSecurityPolicy(nonce: string, https: boolean): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** A nonce for one response: 16 random bytes in base64. */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/**
 * The security headers of every response. The front door (scripts/app-server.mjs) sets the baseline on
 * everything it serves, static files included; the request proxy (proxy.ts) sets the same, plus the pages'
 * Content-Security-Policy with a fresh nonce, which Next.js reads from the request and puts on its own
 * scripts. No inline script runs without it; styles may be inline (React style attributes, the charts).
 */

/** Headers for every response; HSTS only when the public address is HTTPS. */
export function baselineSecurityHeaders(https: boolean): Record<string, string> {
  return {
    "X-Content-Type-Options": "nosniff",
    "Referrer-Policy": "same-origin",
    "X-Frame-Options": "DENY",
    "Cross-Origin-Opener-Policy": "same-origin",
    // Not a document (JSON, PDF, script, style): no framing, no base or form tricks. Object embedding is
    // left alone, because Chromium shows a PDF through a plugin that `object-src 'none'` would block.
    "Content-Security-Policy": "frame-ancestors 'none'; base-uri 'none'; form-action 'none'",
    ...(https ? { "Strict-Transport-Security": "max-age=31536000; includeSubDomains" } : {}),
  };
}

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

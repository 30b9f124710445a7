// The security headers of every response, in plain JavaScript so that the front door (scripts/app-server.mjs,
// run by Node as it is) and the request proxy (through lib/security/security-headers.ts) share one list.

/** Headers for every response; HSTS only when the public address is HTTPS. */
export function baselineSecurityHeaders(https) {
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

import { config } from "zod";

/*
 * Runs in the browser before the app's own code. Zod compiles object parsers with `new Function` where it
 * may, and probes for that when a schema is built; the pages' Content-Security-Policy forbids eval
 * (lib/security/security-headers.ts), so the probe is reported as a CSP violation on every page with a form.
 * The interpreted parser gives the same answers; the server keeps the compiled one.
 */
config({ jitless: true });

import "server-only";

/** The address people use to reach the app (NEXTAUTH_URL); http://localhost:3000 when not configured. */
export function publicBaseUrl(): string {
  return (process.env.NEXTAUTH_URL ?? "http://localhost:3000").replace(/\/$/, "");
}

/** Whether the public address is HTTPS: then cookies are Secure and browsers are told to keep to HTTPS (HSTS). */
export function publicAddressIsHttps(): boolean {
  return publicBaseUrl().startsWith("https://");
}

import "server-only";

/**
 * The request header in which the app's front door (scripts/app-server.mjs) passes the client's network
 * address: the socket's peer, or the address the trusted reverse proxies reported. The front door always
 * replaces a value the client sent, so it can be trusted when the app is served through it.
 */
export const CLIENT_ADDRESS_HEADER = "x-seepline-client-address";

/** The client address from a plain header record (next-auth hands its handlers one). */
export function clientAddressFrom(headerValues: Record<string, unknown> | Headers | undefined): string | null {
  const raw = headerValues instanceof Headers ? headerValues.get(CLIENT_ADDRESS_HEADER) : headerValues?.[CLIENT_ADDRESS_HEADER];
  const value = typeof raw === "string" ? raw.trim() : "";
  return value && value.length <= 100 ? value : null;
}

import "server-only";
import { headers } from "next/headers";
import { clientAddressFrom } from "./client-address";

// Apart from client-address.ts so that operations loaded outside Next.js never import next/headers.

/** The client address of the request being handled (server actions and route handlers). */
export async function requestClientAddress(): Promise<string | null> {
  return clientAddressFrom(await headers());
}

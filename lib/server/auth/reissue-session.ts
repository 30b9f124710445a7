import "server-only";
import { cookies } from "next/headers";
import { decode, encode } from "next-auth/jwt";
import { getEnv } from "../env";
import { publicAddressIsHttps } from "../public-address";

/**
 * After the user changed their own password (which raised their session version and so ended every other
 * session), gives the browser they used a session token with the new version, so it stays signed in.
 */
export async function reissueOwnSession(sessionVersion: number): Promise<void> {
  const env = getEnv();
  const secure = publicAddressIsHttps();
  const name = `${secure ? "__Secure-" : ""}next-auth.session-token`;
  const jar = await cookies();
  const current = jar.get(name)?.value;
  if (!current) return;
  const token = await decode({ token: current, secret: env.NEXTAUTH_SECRET });
  if (!token) return;
  const maxAge = env.SEEPLINE_SESSION_HOURS * 3600;
  const value = await encode({ token: { ...token, sv: sessionVersion }, secret: env.NEXTAUTH_SECRET, maxAge });
  jar.set(name, value, { httpOnly: true, sameSite: "lax", path: "/", secure, maxAge });
}

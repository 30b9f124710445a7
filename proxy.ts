import { NextResponse, type NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";
import { isPublicPath } from "@/lib/policy/routes";
import { actionBodyProblem } from "@/lib/security/action-body";
import { isCrossOriginWrite } from "@/lib/security/cross-origin-write";
import { baselineSecurityHeaders, newNonce, pageContentSecurityPolicy } from "@/lib/security/security-headers";

const publicAddress = () => process.env.NEXTAUTH_URL ?? "";
const isHttps = () => publicAddress().startsWith("https://");

/**
 * Every request but static files passes here:
 * - a change sent from another site's page (cross-origin POST, server actions included) is refused with 403,
 *   and a server action's arguments that React could not decode with 400 (lib/security/action-body.ts);
 * - pages get a Content-Security-Policy with a fresh nonce (Next.js reads it from the request header and
 *   marks its own scripts with it), and every response the security headers (lib/security);
 * - a signed-out visitor goes to sign-in, and the path is passed on to the 403 page so it can say which
 *   role the page needs. Permission itself is decided by each page and operation (lib/policy).
 */
export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const https = isHttps();
  const crossOrigin = isCrossOriginWrite({
    method: request.method,
    origin: request.headers.get("origin"),
    hosts: [request.headers.get("host"), request.headers.get("x-forwarded-host"), publicAddress() ? new URL(publicAddress()).host : null],
  });
  if (crossOrigin)
    return secured(
      NextResponse.json({ error: { code: "FORBIDDEN", message: "This change was sent from another site's page, so it was refused; make it from Seepline itself." } }, { status: 403 }),
      https,
    );

  // A server action's arguments: refused with a sentence when React could not decode them (it would fault).
  if (request.method === "POST" && request.headers.has("next-action") && (request.headers.get("content-type") ?? "").startsWith("text/plain")) {
    const problem = actionBodyProblem(await request.clone().text());
    if (problem) return secured(NextResponse.json({ error: { code: "INVALID_INPUT", message: problem } }, { status: 400 }), https);
  }

  const headers = new Headers(request.headers);
  headers.set("x-seepline-path", pathname);
  const page = !pathname.startsWith("/api/");
  const csp = page ? pageContentSecurityPolicy(newNonce(), https) : null;
  if (csp) headers.set("content-security-policy", csp);

  if (page && !isPublicPath(pathname)) {
    const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET, secureCookie: https });
    if (!token) {
      const url = new URL("/sign-in", request.url);
      if (pathname !== "/") url.searchParams.set("callbackUrl", `${pathname}${search}`);
      return secured(NextResponse.redirect(url), https, csp);
    }
  }
  return secured(NextResponse.next({ request: { headers } }), https, csp);
}

function secured(response: NextResponse, https: boolean, csp: string | null = null): NextResponse {
  for (const [name, value] of Object.entries(baselineSecurityHeaders(https))) response.headers.set(name, value);
  if (csp) response.headers.set("Content-Security-Policy", csp);
  return response;
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico|icon.svg|apple-icon.png).*)"],
};

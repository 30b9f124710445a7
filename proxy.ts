import { NextResponse, type NextRequest } from "next/server";
import { getToken } from "next-auth/jwt";
import { isPublicPath } from "@/lib/policy/routes";

/**
 * Sends a signed-out visitor to the sign-in page, and passes the path on to the 403 page so it can say
 * which role the page needs. Permission itself is decided by each page and operation (lib/policy).
 */
export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const headers = new Headers(request.headers);
  headers.set("x-seepline-path", pathname);
  if (!isPublicPath(pathname) && !pathname.startsWith("/api/")) {
    const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
    if (!token) {
      const url = new URL("/sign-in", request.url);
      if (pathname !== "/") url.searchParams.set("callbackUrl", `${pathname}${search}`);
      return NextResponse.redirect(url);
    }
  }
  return NextResponse.next({ request: { headers } });
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.ico|icon.svg).*)"],
};

import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { getAuthOptions } from "@/lib/server/auth/auth-options";

type Context = { params: Promise<{ nextauth: string[] }> };

// next-auth reads its options per request so that configuration is checked at run time, not at build.
async function handler(request: NextRequest, context: Context) {
  return NextAuth(request, { params: await context.params }, getAuthOptions());
}

export { handler as GET, handler as POST };

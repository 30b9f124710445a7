import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { isAppError } from "@/lib/errors/app-error";
import { safeRedirectUrl } from "@/lib/security/safe-redirect-path";
import { getEnv } from "../env";
import { publicAddressIsHttps } from "../public-address";
import { clientAddressFrom } from "./client-address";
import { verifyCredentials } from "./verify-credentials";

/** next-auth configuration: e-mail and password, JWT sessions that expire after a working day by default. */
export function getAuthOptions(): NextAuthOptions {
  const env = getEnv();
  return {
    secret: env.NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: env.SEEPLINE_SESSION_HOURS * 3600 },
    // Secure (and __Secure- prefixed) cookies whenever people reach the app over HTTPS.
    useSecureCookies: publicAddressIsHttps(),
    pages: { signIn: "/sign-in", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(credentials, request) {
          try {
            const user = await verifyCredentials(credentials, undefined, undefined, clientAddressFrom(request?.headers));
            if (!user) throw new Error("That e-mail and password do not match an active account.");
            return { id: user.id, name: user.name, email: user.email, role: user.role, sessionVersion: user.sessionVersion };
          } catch (error) {
            // next-auth passes the message to the sign-in form.
            if (isAppError(error)) throw new Error(error.message);
            throw error;
          }
        },
      }),
    ],
    callbacks: {
      // After sign-in or sign-out, only addresses on this site.
      redirect({ url, baseUrl }) {
        return safeRedirectUrl(url, baseUrl);
      },
      jwt({ token, user }) {
        if (user) {
          token.uid = user.id;
          token.role = user.role;
          token.sv = user.sessionVersion;
        }
        return token;
      },
      session({ session, token }) {
        session.uid = token.uid;
        session.sv = token.sv;
        return session;
      },
    },
  };
}

import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/sign-in-form";
import { Wordmark } from "@/components/shell/wordmark";
import { getCurrentUser } from "@/lib/server/auth/current-user";
import { getLabName } from "@/lib/server/lab/get-lab-name";
import { safeRedirectPath } from "@/lib/security/safe-redirect-path";

export const metadata = { title: "Sign in" };
export const dynamic = "force-dynamic";

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  // Only paths on this site, so a crafted link cannot send people elsewhere after signing in.
  const callbackUrl = safeRedirectPath(params.callbackUrl);
  if (await getCurrentUser()) redirect(callbackUrl);
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <Wordmark />
        <h1>Sign in</h1>
        <p className="muted">{await getLabName()} · sample custody and hydraulic test records</p>
        <SignInForm callbackUrl={callbackUrl} />
      </div>
    </main>
  );
}

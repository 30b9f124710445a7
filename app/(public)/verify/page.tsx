import { redirect } from "next/navigation";
import { Wordmark } from "@/components/shell/wordmark";
import { normaliseVerificationCode } from "@/lib/certificates/verification-code";
import { getLabName } from "@/lib/server/lab/get-lab-name";

export const metadata = { title: "Verify a certificate", robots: { index: false } };
export const dynamic = "force-dynamic";

/** Public: type the code printed on a certificate; a plain GET form, so it works without scripts. */
export default async function VerifyPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const raw = (await searchParams).code;
  const typed = (Array.isArray(raw) ? raw[0] : raw)?.trim() ?? "";
  const code = typed ? normaliseVerificationCode(typed) : null;
  if (code) redirect(`/verify/${code}`);
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <Wordmark />
        <h1>Verify a certificate</h1>
        <p className="muted">{await getLabName()} · check a test certificate against the laboratory's record</p>
        {typed ? <div className="notice notice-error" role="alert">That is not a verification code: it has letters and digits only, like <span className="mono" style={{ whiteSpace: "nowrap" }}>7Q4K-2M9X-HT3B</span>.</div> : null}
        <form className="stack" action="/verify" method="get">
          <div className="field">
            <label htmlFor="code">Verification code</label>
            <input id="code" name="code" defaultValue={typed} placeholder="7Q4K-2M9X-HT3B" autoComplete="off" autoCapitalize="characters" spellCheck={false} required />
            <span className="hint">Printed beside the 2D code on the certificate; capitals, spaces and dashes do not matter.</span>
          </div>
          <div><button className="button" type="submit">Check</button></div>
        </form>
      </div>
    </main>
  );
}

import Link from "next/link";
import { Wordmark } from "@/components/shell/wordmark";

/** An unknown, mistyped or not-yet-issued code: one answer for all, so the page reveals nothing. */
export default function VerificationNotFound() {
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <Wordmark />
        <div className="status-code">404 · not found</div>
        <h1>No certificate has this code</h1>
        <p>Check the code printed beside the 2D code on the certificate: it has twelve letters and digits, like <span className="mono" style={{ whiteSpace: "nowrap" }}>7Q4K-2M9X-HT3B</span>. If it matches and this page still
          appears, the document may not have been issued by this laboratory: please contact us.</p>
        <p><Link href="/verify">Type a code</Link></p>
      </div>
    </main>
  );
}

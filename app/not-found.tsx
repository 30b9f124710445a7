import Link from "next/link";
import { Wordmark } from "@/components/shell/wordmark";

export default function NotFound() {
  return (
    <main className="plain" id="main" tabIndex={-1}>
      <div className="plain-card">
        <Wordmark />
        <div className="status-code">404 · not found</div>
        <h1>There is nothing at this address</h1>
        <p>The page or record does not exist, or it is not yours to see. Check a lab number typed by hand.</p>
        <p><Link href="/">Back to your start page</Link></p>
      </div>
    </main>
  );
}

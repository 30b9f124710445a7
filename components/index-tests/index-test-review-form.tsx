"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { reviewIndexTestAction } from "@/app/(staff)/index-tests/actions";

/** Approve the index test, or return it to the technician with what to change (comments required then). */
export function IndexTestReviewForm({ indexTestId, version }: { indexTestId: string; version: number }) {
  const router = useRouter();
  const [comments, setComments] = useState("");
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const [error, setError] = useState<string | undefined>();
  const [busy, setBusy] = useState(false);
  const decide = async (decision: "APPROVED" | "RETURNED") => {
    setBusy(true);
    const result = await reviewIndexTestAction({ indexTestId, version, decision, comments });
    setBusy(false);
    setNotice({ ok: result.ok, text: result.message });
    setError(result.ok ? undefined : result.fieldErrors.comments);
    if (result.ok) router.refresh();
  };
  return (
    <form className="stack" aria-label="Review the index test" onSubmit={(e) => e.preventDefault()}>
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <div className="field">
        <label htmlFor="index-review-comments">Comments</label>
        <textarea id="index-review-comments" rows={3} value={comments} onChange={(e) => setComments(e.target.value)} aria-invalid={error ? true : undefined} />
        {error ? <span className="field-error">{error}</span> : <span className="hint">Required when returning: say what to change.</span>}
      </div>
      <div className="links">
        <button className="button" type="button" disabled={busy} onClick={() => void decide("APPROVED")}>Approve the test</button>
        <button className="button button-quiet" type="button" disabled={busy} onClick={() => void decide("RETURNED")}>Return to the technician</button>
      </div>
    </form>
  );
}

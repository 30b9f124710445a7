"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { grantOverrideAction } from "@/app/(staff)/runs/actions";

/** A QA manager allows one instrument to be used despite its calibration state, for a few days, with a reason. */
export function OverrideForm({ equipmentId, assetTag }: { equipmentId: string; assetTag: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [reason, setReason] = useState("");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <div className="inline-form">
      <input value={reason} onChange={(e) => setReason(e.target.value)} placeholder="Reason" aria-label={`Override reason for ${assetTag}`} />
      <button type="button" className="button button-quiet" disabled={pending} onClick={() => startTransition(async () => {
        const result = await grantOverrideAction({ equipmentId, reason, validDays: 7 });
        setMessage({ ok: result.ok, text: result.message });
        if (result.ok) router.refresh();
      })}>Allow for 7 days</button>
      {message && <span className={message.ok ? "muted" : "field-error"} role="status">{message.text}</span>}
    </div>
  );
}

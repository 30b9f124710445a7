"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { moveItemAction, retainItemAction } from "@/app/(staff)/samples/actions";

type Props = {
  kind: "roll" | "coupon" | "specimen";
  id: string;
  version: number;
  labNumber: string;
  currentLocationId: string | null;
  locations: Array<{ id: string; code: string; name: string }>;
};

/** Move an item to another storage place, or put it on retention; each is a custody event. */
export function ItemCustodyActions({ kind, id, version, labNumber, currentLocationId, locations }: Props) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [toLocationId, setToLocationId] = useState("");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const run = (work: () => Promise<{ ok: boolean; message: string }>) =>
    startTransition(async () => {
      const result = await work();
      setMessage({ ok: result.ok, text: result.message });
      if (result.ok) router.refresh();
    });

  return (
    <div className="inline-form" aria-label={`Custody actions for ${labNumber}`}>
      <select value={toLocationId} onChange={(e) => setToLocationId(e.target.value)} aria-label="Move to">
        <option value="">Move to…</option>
        {locations.filter((l) => l.id !== currentLocationId).map((l) => <option key={l.id} value={l.id}>{l.code} · {l.name}</option>)}
      </select>
      <button type="button" className="button button-quiet" disabled={pending || !toLocationId} onClick={() => run(() => moveItemAction({ kind, id, version, toLocationId }))}>Move</button>
      <button type="button" className="button button-quiet" disabled={pending} onClick={() => run(() => retainItemAction({ kind, id, version }))}>Put on retention</button>
      {message && <span className={message.ok ? "muted" : "field-error"} role="status" data-testid="custody-action-message">{message.text}</span>}
    </div>
  );
}

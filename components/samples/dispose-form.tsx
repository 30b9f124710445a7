"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { disposeRetainedAction } from "@/app/(staff)/samples/actions";
import { LabNumberLinks } from "@/components/intake/lab-number-links";

type Item = { kind: "roll" | "coupon" | "specimen"; id: string; labNumber: string; retainUntil: Date | null; place: string };

/** Choose retained items whose period has ended and dispose of them together, each recorded. */
export function DisposeForm({ items }: { items: Item[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [chosen, setChosen] = useState<Set<string>>(new Set());
  const [note, setNote] = useState("");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const toggle = (id: string) => setChosen((s) => { const n = new Set(s); if (n.has(id)) n.delete(id); else n.add(id); return n; });
  const submit = () =>
    startTransition(async () => {
      const result = await disposeRetainedAction({ items: items.filter((i) => chosen.has(i.id)).map(({ kind, id }) => ({ kind, id })), note });
      setMessage({ ok: result.ok, text: result.ok ? `Disposed of ${result.data.disposed.join(", ")}.` : result.message });
      if (result.ok) {
        setChosen(new Set());
        router.refresh();
      }
    });
  return (
    <div className="stack-gap">
      {message && <div className={`notice ${message.ok ? "notice-ok" : "notice-error"}`} role="status"><LabNumberLinks text={message.text} /></div>}
      <table className="list" data-testid="retention-due">
        <thead><tr><th><span className="visually-hidden">Choose</span></th><th>Lab number</th><th>Kind</th><th>Retained until</th><th>Where</th></tr></thead>
        <tbody>{items.map((i) => (
          <tr key={i.id}>
            <td><input type="checkbox" checked={chosen.has(i.id)} onChange={() => toggle(i.id)} aria-label={`Dispose of ${i.labNumber}`} /></td>
            <td className="mono">{i.labNumber}</td><td>{i.kind}</td><td>{i.retainUntil?.toISOString().slice(0, 10) ?? "—"}</td><td className="mono">{i.place}</td>
          </tr>
        ))}</tbody>
      </table>
      <div className="inline-form">
        <input value={note} onChange={(e) => setNote(e.target.value)} placeholder="How it was disposed of" aria-label="Disposal note" style={{ width: "22rem" }} />
        <button type="button" className="button button-danger" disabled={pending || chosen.size === 0} onClick={submit}>Dispose of {chosen.size} item{chosen.size === 1 ? "" : "s"}</button>
      </div>
    </div>
  );
}

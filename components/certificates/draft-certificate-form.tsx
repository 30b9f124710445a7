"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { createCertificateDraftAction } from "@/app/(staff)/certificates/actions";

/**
 * limited: the project's specification sets a limit for the result's property (a certificate judges only those);
 * noLimit: otherwise, when the project has a specification, the words signing refuses the result with.
 */
type Choice = { id: string; label: string; limited: boolean; noLimit: string | null; shipment: string };
type Group = { project: { id: string; name: string; code: string; client: string }; results: Choice[]; indexResults: Choice[] };

/** Choose approved results of one project (runs' and index tests') to gather on a new certificate. */
export function DraftCertificateForm({ groups }: { groups: Group[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [chosen, setChosen] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string | null>(null);
  // Every result the specification limits, of the project or of one shipment's rolls.
  const everything = (g: Group, shipment?: string) => [...g.results, ...g.indexResults].filter((r) => r.limited && (!shipment || r.shipment === shipment)).map((r) => r.id);
  const shipments = (g: Group) => [...new Set([...g.results, ...g.indexResults].map((r) => r.shipment))].sort();
  const toggle = (projectId: string, id: string) =>
    setChosen((c) => {
      const list = c[projectId] ?? [];
      return { ...c, [projectId]: list.includes(id) ? list.filter((x) => x !== id) : [...list, id] };
    });
  return (
    <div className="stack-gap">
      {message && <div className="notice notice-error" role="alert">{message}</div>}
      {groups.map((g) => (
        <section key={g.project.id} className="card" aria-label={`Results of ${g.project.name}`}>
          <h2>{g.project.name} <span className="count">{g.project.client} · {g.project.code}</span></h2>
          <p>
            <button type="button" className="button button-quiet" onClick={() => setChosen((c) => ({ ...c, [g.project.id]: everything(g) }))}>Choose every result the specification limits</button>
            {shipments(g).length > 1 && shipments(g).map((shipment) => (
              <button key={shipment} type="button" className="button button-quiet" onClick={() => setChosen((c) => ({ ...c, [g.project.id]: everything(g, shipment) }))}>
                Only shipment {shipment}
              </button>
            ))}
          </p>
          {g.results.length > 0 && <h3>Hydraulic tests</h3>}
          {g.results.map((r) => (
            <label key={r.id} style={{ display: "block", margin: "0.25rem 0" }}>
              <input type="checkbox" checked={(chosen[g.project.id] ?? []).includes(r.id)} onChange={() => toggle(g.project.id, r.id)} /> {r.label}
              {r.noLimit && <span className="field-error" style={{ display: "block" }} data-testid="no-limit">Signing will refuse it: {r.noLimit}</span>}
            </label>
          ))}
          {g.indexResults.length > 0 && <h3>Index tests</h3>}
          {g.indexResults.map((r) => (
            <label key={r.id} style={{ display: "block", margin: "0.25rem 0" }}>
              <input type="checkbox" checked={(chosen[g.project.id] ?? []).includes(r.id)} onChange={() => toggle(g.project.id, r.id)} /> {r.label}
              {r.noLimit && <span className="field-error" style={{ display: "block" }} data-testid="no-limit">Signing will refuse it: {r.noLimit}</span>}
            </label>
          ))}
          <button
            type="button"
            className="button"
            disabled={pending || !(chosen[g.project.id] ?? []).length}
            onClick={() => startTransition(async () => {
              const picked = new Set(chosen[g.project.id]);
              const result = await createCertificateDraftAction({
                projectId: g.project.id,
                resultIds: g.results.filter((r) => picked.has(r.id)).map((r) => r.id),
                indexResultIds: g.indexResults.filter((r) => picked.has(r.id)).map((r) => r.id),
              });
              if (result.ok) router.push(`/certificates/${result.data.number}`);
              else setMessage(result.message);
            })}
          >
            Draft a certificate with these results
          </button>
        </section>
      ))}
    </div>
  );
}

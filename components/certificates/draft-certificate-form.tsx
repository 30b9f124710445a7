"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { createCertificateDraftAction } from "@/app/(staff)/certificates/actions";

type Group = { project: { id: string; name: string; code: string; client: string }; results: Array<{ id: string; label: string }> };

/** Choose approved results of one project to gather on a new certificate. */
export function DraftCertificateForm({ groups }: { groups: Group[] }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [chosen, setChosen] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string | null>(null);
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
          {g.results.map((r) => (
            <label key={r.id} style={{ display: "block", margin: "0.25rem 0" }}>
              <input type="checkbox" checked={(chosen[g.project.id] ?? []).includes(r.id)} onChange={() => toggle(g.project.id, r.id)} /> {r.label}
            </label>
          ))}
          <button
            type="button"
            className="button"
            disabled={pending || !(chosen[g.project.id] ?? []).length}
            onClick={() => startTransition(async () => {
              const result = await createCertificateDraftAction({ projectId: g.project.id, resultIds: chosen[g.project.id] });
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

"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { changeUserRoleAction } from "@/app/(staff)/admin/users/actions";
import { ROLE_LABELS, ROLES, type RoleName } from "@/lib/policy/permissions";

type Props = { userId: string; version: number; name: string; role: RoleName; clientOrganizationId: string | null; organizations: Array<{ id: string; name: string }> };

/** Gives a person another role (a client user: with their organisation); their open sessions end. */
export function ChangeRoleForm({ userId, version, name, role, clientOrganizationId, organizations }: Props) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [next, setNext] = useState<RoleName>(role);
  const [org, setOrg] = useState(clientOrganizationId ?? "");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const change = () =>
    startTransition(async () => {
      const result = await changeUserRoleAction({ userId, version, role: next, clientOrganizationId: next === "CLIENT_USER" ? org : "" });
      setMessage({ ok: result.ok, text: result.ok ? result.message : [result.message, ...Object.values(result.fieldErrors)].filter((t, i, all) => all.indexOf(t) === i).join(" ") });
      if (result.ok) router.refresh();
    });
  return (
    <details className="row-more">
      <summary>Change role</summary>
      <div className="inline-form">
        <select value={next} onChange={(e) => setNext(e.target.value as RoleName)} aria-label={`New role for ${name}`}>
          {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
        </select>
        {next === "CLIENT_USER" && (
          <select value={org} onChange={(e) => setOrg(e.target.value)} aria-label={`Organisation of ${name}`}>
            <option value="">Organisation…</option>
            {organizations.map((o) => <option key={o.id} value={o.id}>{o.name}</option>)}
          </select>
        )}
        <button type="button" className="button button-quiet" disabled={pending} onClick={change}>Change</button>
      </div>
      {message && <div className={message.ok ? "muted" : "field-error"} role="status">{message.text}</div>}
    </details>
  );
}

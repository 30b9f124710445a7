"use client";

import { useState, useTransition } from "react";
import { formatDateTime } from "@/lib/format/dates";
import { API_TOKEN_SCOPE_LABELS } from "@/lib/policy/api-tokens";
import type { ActionResult } from "@/lib/server/actions/action-result";
import type { ApiTokenRow } from "@/lib/server/api-tokens/list-api-tokens";
import { ScrollArea } from "@/components/ui/scroll-area";

function standing(token: ApiTokenRow, zone: string): string {
  if (token.revokedAt) return `revoked ${formatDateTime(token.revokedAt, zone)}`;
  if (token.expiresAt && token.expiresAt.getTime() <= Date.now()) return `expired ${formatDateTime(token.expiresAt, zone)}`;
  return `valid until ${formatDateTime(token.expiresAt, zone)}`;
}

/** Tokens with their scope, cells, standing and last use; each live one can be revoked. */
export function ApiTokenList({ tokens, zone, showOwner, revoke }: { tokens: ApiTokenRow[]; zone: string; showOwner: boolean; revoke: (input: { tokenId: string }) => Promise<ActionResult> }) {
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  if (!tokens.length) return <p className="muted">No API tokens yet.</p>;
  return (
    <ScrollArea>
      {message && <div className={message.ok ? "notice notice-ok" : "notice notice-error"} role="status">{message.text}</div>}
      <table className="list" data-testid="api-token-list">
        <thead><tr><th>Name</th>{showOwner && <th>Owner</th>}<th>May</th><th>Standing</th><th>Last used</th><th>Revoke</th></tr></thead>
        <tbody>
          {tokens.map((t) => (
            <tr key={t.id} data-token-name={t.name}>
              <td>{t.name}<div className="muted"><code>{t.prefix}…</code></div></td>
              {showOwner && <td>{t.owner.name}<div className="muted">{t.owner.email}</div></td>}
              <td>{API_TOKEN_SCOPE_LABELS[t.scope]}{t.cells.length > 0 && <div className="muted">{t.cells.join(", ")}</div>}</td>
              <td>{standing(t, zone)}</td>
              <td>{t.lastUsedAt ? `${formatDateTime(t.lastUsedAt, zone)} (${t.requests} requests)` : "never"}</td>
              <td>
                {!t.revokedAt && (
                  <button type="button" className="button button-danger" disabled={pending} aria-label={`Revoke ${t.name}`}
                    onClick={() => startTransition(async () => { const r = await revoke({ tokenId: t.id }); setMessage({ ok: r.ok, text: r.message }); })}>
                    Revoke
                  </button>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}

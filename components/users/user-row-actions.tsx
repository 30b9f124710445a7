"use client";

import { useState, useTransition } from "react";
import { resetPasswordAction, setUserActiveAction } from "@/app/(staff)/admin/users/actions";
import { newPasswordSchema } from "@/lib/validation/account";

/** Deactivate or reactivate an account, and set a new password for it. */
export function UserRowActions({ userId, active, version, name }: { userId: string; active: boolean; version: number; name: string }) {
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [password, setPassword] = useState("");

  const toggle = () =>
    startTransition(async () => {
      const result = await setUserActiveAction({ userId, active: !active, version });
      setMessage({ ok: result.ok, text: result.message });
    });

  const reset = () => {
    const checked = newPasswordSchema.safeParse(password);
    if (!checked.success) return setMessage({ ok: false, text: checked.error.issues[0]?.message ?? "Not a valid password." });
    startTransition(async () => {
      const result = await resetPasswordAction({ userId, password });
      setMessage({ ok: result.ok, text: result.message });
      if (result.ok) setPassword("");
    });
  };

  return (
    <div>
      <button type="button" className={`button ${active ? "button-danger" : "button-quiet"}`} disabled={pending} onClick={toggle} aria-label={`${active ? "Deactivate" : "Reactivate"} ${name}`}>
        {active ? "Deactivate" : "Reactivate"}
      </button>
      <details className="row-more">
        <summary>Reset password</summary>
        <div className="inline-form">
          <input type="password" placeholder="New password" value={password} onChange={(e) => setPassword(e.target.value)} aria-label={`New password for ${name}`} autoComplete="new-password" />
          <button type="button" className="button button-quiet" disabled={pending} onClick={reset}>Set</button>
        </div>
      </details>
      {message && <div className={message.ok ? "muted" : "field-error"} role="status">{message.text}</div>}
    </div>
  );
}

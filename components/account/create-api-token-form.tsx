"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { createApiTokenAction } from "@/app/(account)/account/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { API_TOKEN_DEFAULT_DAYS, API_TOKEN_MAX_DAYS, API_TOKEN_SCOPE_LABELS, type ApiTokenScopeName } from "@/lib/policy/api-tokens";
import { createApiTokenSchema, type CreateApiTokenInput } from "@/lib/validation/api-tokens";

/** Names, scopes and creates a token, then shows it once with a note that it cannot be shown again. */
export function CreateApiTokenForm({ scopes }: { scopes: ApiTokenScopeName[] }) {
  const router = useRouter();
  const [created, setCreated] = useState<{ name: string; token: string } | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<CreateApiTokenInput>({ resolver: zodResolver(createApiTokenSchema), defaultValues: { name: "", scope: scopes[0], cells: "", expiresInDays: API_TOKEN_DEFAULT_DAYS } });
  const { register, handleSubmit, formState, reset, control } = form;
  const scope = useWatch({ control, name: "scope" });

  const onSubmit = handleSubmit(async (values) => {
    const result = await createApiTokenAction(values);
    if (!result.ok) {
      setNotice(result.message);
      applyServerErrors(form, result.fieldErrors);
      return;
    }
    setNotice(null);
    setCreated({ name: result.data.name, token: result.data.token });
    reset({ name: "", scope: scopes[0], cells: "", expiresInDays: API_TOKEN_DEFAULT_DAYS });
    router.refresh();
  });

  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="New API token">
      {created && (
        <div className="notice notice-ok" role="status" data-testid="new-token">
          <strong>{created.name}</strong>: copy this token now. Seepline keeps only a fingerprint of it and cannot show it again.
          <pre className="token-once" style={{ whiteSpace: "pre-wrap", wordBreak: "break-all", userSelect: "all" }}>{created.token}</pre>
        </div>
      )}
      {notice && <div className="notice notice-error" role="status">{notice}</div>}
      <Field label="Token name" hint="Where it is used, e.g. “Cell 3 logger” or “QA register”." error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="What it may do" error={formState.errors.scope?.message}>
        <select {...register("scope")}>{scopes.map((s) => <option key={s} value={s}>{API_TOKEN_SCOPE_LABELS[s]}</option>)}</select>
      </Field>
      {scope === "READINGS_POST" && (
        <Field label="Cells" hint="Asset tags of the permeameter cells whose runs it may post readings to, separated by commas." error={formState.errors.cells?.message}><input {...register("cells")} placeholder="CELL-01, CELL-02" /></Field>
      )}
      <Field label="Lasts (days)" hint={`1 to ${API_TOKEN_MAX_DAYS} days.`} error={formState.errors.expiresInDays?.message}><input type="number" min={1} max={API_TOKEN_MAX_DAYS} {...register("expiresInDays")} /></Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Create token</button>
    </form>
  );
}

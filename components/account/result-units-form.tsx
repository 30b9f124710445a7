"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { setOwnResultUnitsAction } from "@/app/(account)/account/actions";
import { UNIT_SYSTEM_LABELS, UNIT_SYSTEMS, type UnitSystem } from "@/lib/format/result-numbers";
import { resultUnitsSchema, type ResultUnitsInput } from "@/lib/validation/account";
import { applyServerErrors } from "@/components/ui/apply-server-errors";

/** The units the person's own screens show results in; certificates use the units their draft names. */
export function ResultUnitsForm({ current }: { current: UnitSystem }) {
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<ResultUnitsInput>({ resolver: zodResolver(resultUnitsSchema), defaultValues: { resultUnits: current } });
  const onSubmit = form.handleSubmit(async (values) => {
    const result = await setOwnResultUnitsAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (!result.ok) applyServerErrors(form, result.fieldErrors);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Units of results">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="result-units-message">{notice.text}</div>}
      <fieldset>
        <legend>Show results in</legend>
        {UNIT_SYSTEMS.map((u) => (
          <label key={u} style={{ display: "block", margin: "0.25rem 0" }}><input type="radio" value={u} {...form.register("resultUnits")} /> {UNIT_SYSTEM_LABELS[u]}</label>
        ))}
      </fieldset>
      <button className="button button-quiet" type="submit" disabled={form.formState.isSubmitting}>Save units</button>
    </form>
  );
}

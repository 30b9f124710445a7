"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { editCertificateDraftAction } from "@/app/(staff)/certificates/actions";
import { Field } from "@/components/ui/field";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { UNIT_SYSTEM_LABELS, UNIT_SYSTEMS, type UnitSystem } from "@/lib/format/result-numbers";
import { editCertificateDraftSchema, type EditCertificateDraftInput } from "@/lib/validation/certificates";

type Props = {
  revisionId: string;
  content: { version: number; resultIds: string[]; indexResultIds: string[]; specificationId: string | null; remarks: string; signatoryId: string | null; unitSystem: UnitSystem };
  /** noLimit: by specification id, the words signing refuses the result with when that specification sets no limit for it. */
  results: Array<{ id: string; label: string; noLimit: Record<string, string> }>;
  indexResults: Array<{ id: string; label: string; noLimit: Record<string, string> }>;
  specifications: Array<{ id: string; label: string }>;
  signatories: Array<{ id: string; name: string }>;
};

/** The draft's content: results (runs' and index tests') included, specification, remarks, signatory, units. Each save is a new version. */
export function EditDraftForm({ revisionId, content, results, indexResults, specifications, signatories }: Props) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<EditCertificateDraftInput>({
    resolver: zodResolver(editCertificateDraftSchema),
    defaultValues: {
      revisionId, baseVersion: content.version, resultIds: content.resultIds, indexResultIds: content.indexResultIds, specificationId: content.specificationId ?? "",
      remarks: content.remarks, signatoryId: content.signatoryId ?? "", unitSystem: content.unitSystem,
    },
  });
  const { register, formState } = form;
  // Said beside each result before saving, for the specification chosen now.
  const specificationId = useWatch({ control: form.control, name: "specificationId" });
  const noLimitNote = (r: { noLimit: Record<string, string> }) => {
    const words = specificationId ? r.noLimit[specificationId] : undefined;
    return words ? <span className="field-error" style={{ display: "block" }} data-testid="no-limit">Signing will refuse it: {words}</span> : null;
  };
  const onSubmit = form.handleSubmit(async (values) => {
    const outcome = await editCertificateDraftAction(values);
    setNotice({ ok: outcome.ok, text: outcome.message });
    if (outcome.ok) router.refresh();
    else applyServerErrors(form, outcome.fieldErrors);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Edit the draft">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status" data-testid="draft-message">{notice.text}</div>}
      <fieldset>
        <legend>Results on the certificate</legend>
        {results.map((r) => (
          <label key={r.id} style={{ display: "block", margin: "0.25rem 0" }}><input type="checkbox" value={r.id} {...register("resultIds")} /> {r.label}{noLimitNote(r)}</label>
        ))}
        {results.length === 0 && <p className="muted">This project has no approved result free for a certificate.</p>}
        {formState.errors.resultIds?.message && <span className="field-error">{formState.errors.resultIds.message}</span>}
      </fieldset>
      <fieldset data-testid="draft-index-results">
        <legend>Index-test results on the certificate</legend>
        {indexResults.map((r) => (
          <label key={r.id} style={{ display: "block", margin: "0.25rem 0" }}><input type="checkbox" value={r.id} {...register("indexResultIds")} /> {r.label}{noLimitNote(r)}</label>
        ))}
        {indexResults.length === 0 && <p className="muted">This project has no approved index-test result free for a certificate.</p>}
        {formState.errors.indexResultIds?.message && <span className="field-error">{formState.errors.indexResultIds.message}</span>}
      </fieldset>
      <Field label="Specification" error={formState.errors.specificationId?.message} hint="Results are judged against its limits; none: no conformance is stated.">
        <select {...register("specificationId")}>
          <option value="">No specification</option>
          {specifications.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
        </select>
      </Field>
      <Field label="Remarks printed on the certificate" error={formState.errors.remarks?.message}>
        <textarea rows={3} {...register("remarks")} />
      </Field>
      <Field label="Signatory" error={formState.errors.signatoryId?.message} hint="Only the QA manager named here may sign; none: whoever signs.">
        <select {...register("signatoryId")}>
          <option value="">Whoever signs it</option>
          {signatories.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
      </Field>
      <Field label="Units of the results" error={formState.errors.unitSystem?.message}>
        <select {...register("unitSystem")}>{UNIT_SYSTEMS.map((u) => <option key={u} value={u}>{UNIT_SYSTEM_LABELS[u]}</option>)}</select>
      </Field>
      <button className="button button-quiet" type="submit" disabled={formState.isSubmitting}>Save the draft</button>
    </form>
  );
}

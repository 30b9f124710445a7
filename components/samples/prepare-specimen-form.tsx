"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { prepareSpecimenAction } from "@/app/(staff)/samples/actions";
import { checklistFor, TEST_METHOD_CODES } from "@/lib/custody/preparation-checklists";
import { prepareSpecimenSchema } from "@/lib/validation/samples";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { LabNumberLinks } from "@/components/intake/lab-number-links";
import { nowForDateTimeInput } from "@/components/ui/now-for-input";

type Locations = Array<{ id: string; code: string; name: string }>;
type Input = Omit<z.input<typeof prepareSpecimenSchema>, "checklist"> & { answers: Record<string, "yes" | "no" | ""> };

/** Recording a specimen cut from a coupon, with the method's preparation checklist answered item by item. */
export function PrepareSpecimenForm({ couponId, locations }: { couponId: string; locations: Locations }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<Input>({
    defaultValues: {
      couponId, dieDiameterMm: "100", initialThicknessMm: "", initialMassG: "", moistureContentPct: "", bentoniteDryMassG: "", bentoniteMassPerAreaKgPerM2: "", specificGravity: "", intendedMethodCode: "D5887",
      preparedAt: nowForDateTimeInput(), storageLocationId: locations[0]?.id ?? "", answers: {},
    },
    // The checklist is kept as yes/no radio answers in the form and turned into booleans for the schema.
    resolver: async (values, context, options) => {
      const checklist = Object.fromEntries(Object.entries(values.answers ?? {}).filter(([, a]) => a !== "").map(([k, a]) => [k, a === "yes"]));
      const result = await zodResolver(prepareSpecimenSchema)({ ...values, checklist } as never, context, options as never);
      const missing = checklistFor(String(values.intendedMethodCode)).filter((item) => !values.answers?.[item.key]);
      const errors: Record<string, unknown> = { ...result.errors };
      if (missing.length) errors.answers = Object.fromEntries(missing.map((i) => [i.key, { type: "required", message: "Answer yes or no." }]));
      return Object.keys(errors).length ? { values: {}, errors: errors as never } : { values: values, errors: {} };
    },
  });
  const { register, handleSubmit, formState, control } = form;
  const method = useWatch({ control, name: "intendedMethodCode" });
  const items = checklistFor(String(method));

  const onSubmit = handleSubmit(async (values) => {
    const checklist = Object.fromEntries(items.map((i) => [i.key, values.answers[i.key] === "yes"]));
    const { answers: _answers, ...rest } = values;
    const result = await prepareSpecimenAction({ ...rest, checklist });
    setNotice({ ok: result.ok, text: result.ok ? `Specimen ${result.data.labNumber} recorded.` : result.message });
    if (result.ok) {
      form.reset({ ...values, initialThicknessMm: "", initialMassG: "", moistureContentPct: "", bentoniteDryMassG: "", bentoniteMassPerAreaKgPerM2: "", answers: {} });
      router.refresh();
    } else applyServerErrors(form as never, result.fieldErrors);
  });

  const answerErrors = formState.errors.answers as Record<string, { message?: string }> | undefined;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Prepare a specimen">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status"><LabNumberLinks text={notice.text} /></div>}
      <Field label="Intended method" error={formState.errors.intendedMethodCode?.message}>
        <select {...register("intendedMethodCode")}>{TEST_METHOD_CODES.map((c) => <option key={c} value={c}>ASTM {c}</option>)}</select>
      </Field>
      <Field label="Die diameter (mm)" error={formState.errors.dieDiameterMm?.message}><input inputMode="decimal" {...register("dieDiameterMm")} /></Field>
      <Field label="Initial thickness (mm)" error={formState.errors.initialThicknessMm?.message}><input inputMode="decimal" {...register("initialThicknessMm")} /></Field>
      <Field label="Initial mass (g)" error={formState.errors.initialMassG?.message}><input inputMode="decimal" {...register("initialMassG")} /></Field>
      <Field label="Moisture content (%)" hint="Optional." error={formState.errors.moistureContentPct?.message}><input inputMode="decimal" {...register("moistureContentPct")} /></Field>
      <fieldset className="stack">
        <legend><strong>For pore volumes of flow</strong> <span className="muted">({method === "D6766" ? "ASTM D6766 needs one of the first two" : "optional"})</span></legend>
        <Field label="Dry bentonite mass (g)" hint="Of this specimen, oven-dry." error={formState.errors.bentoniteDryMassG?.message}><input inputMode="decimal" {...register("bentoniteDryMassG")} /></Field>
        <Field label="Bentonite mass per unit area (kg/m²)" hint="At the moisture content above; made dry with it." error={formState.errors.bentoniteMassPerAreaKgPerM2?.message}><input inputMode="decimal" {...register("bentoniteMassPerAreaKgPerM2")} /></Field>
        <Field label="Specific gravity of the solids" hint="Optional; blank takes the method settings' value (2.75 by default, from memory)." error={formState.errors.specificGravity?.message}><input inputMode="decimal" {...register("specificGravity")} /></Field>
      </fieldset>
      <Field label="Prepared at" error={formState.errors.preparedAt?.message}><input type="datetime-local" {...register("preparedAt")} /></Field>
      <Field label="Kept at" error={formState.errors.storageLocationId?.message}>
        <select {...register("storageLocationId")}>{locations.map((l) => <option key={l.id} value={l.id}>{l.code} · {l.name}</option>)}</select>
      </Field>
      <fieldset className="card" data-testid="preparation-checklist">
        <legend><strong>Preparation checklist</strong></legend>
        {items.map((item) => (
          <div key={item.key} className="field" role="radiogroup" aria-label={item.question}>
            <span>{item.question}</span>
            <span className="inline-form">
              <label><input type="radio" value="yes" {...register(`answers.${item.key}`)} /> yes</label>
              <label><input type="radio" value="no" {...register(`answers.${item.key}`)} /> no</label>
            </span>
            {answerErrors?.[item.key]?.message && <span className="field-error">{answerErrors[item.key]!.message}</span>}
          </div>
        ))}
      </fieldset>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record specimen</button>
    </form>
  );
}

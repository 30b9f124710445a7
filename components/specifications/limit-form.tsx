"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { setSpecificationLimitAction } from "@/app/(staff)/specifications/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { formatUnit } from "@/lib/results/format-result";
import { PROPERTY_UNITS, TEST_PROPERTIES, TEST_PROPERTY_LABELS, type TestProperty } from "@/lib/results/property-units";
import {
  CONFORMANCE_METHOD_LABELS, CONFORMANCE_METHODS, LIMIT_DIRECTION_LABELS, LIMIT_DIRECTIONS, limitTextSchema, setSpecificationLimitSchema, significantDigitsOf,
} from "@/lib/validation/specifications";
import type { LimitRow } from "./limits-table";
import styles from "./specifications.module.css";

type FormValues = z.input<typeof setSpecificationLimitSchema>;

// The usual sense of each property's limit (GRI-GCL3 as cited in shared/DOMAIN.md); the form only suggests it.
const USUAL_DIRECTION: Record<TestProperty, "MAXIMUM" | "MINIMUM"> = {
  INDEX_FLUX: "MAXIMUM", HYDRAULIC_CONDUCTIVITY: "MAXIMUM", SWELL_INDEX: "MINIMUM", FLUID_LOSS: "MAXIMUM", BENTONITE_MASS_PER_AREA: "MINIMUM", MOISTURE_CONTENT: "MAXIMUM",
  GCL_MASS_PER_AREA: "MINIMUM", TENSILE_STRENGTH: "MINIMUM", PEEL_STRENGTH: "MINIMUM",
};
const USUAL_METHOD: Partial<Record<TestProperty, string>> = {
  INDEX_FLUX: "D5887", HYDRAULIC_CONDUCTIVITY: "D5084", SWELL_INDEX: "D5890", FLUID_LOSS: "D5891", BENTONITE_MASS_PER_AREA: "D5993",
  GCL_MASS_PER_AREA: "D5993", MOISTURE_CONTENT: "D2216", TENSILE_STRENGTH: "D6768", PEEL_STRENGTH: "D6496",
};

function valuesFor(specificationId: string, property: TestProperty, limits: LimitRow[]): FormValues {
  const existing = limits.find((l) => l.property === property);
  if (existing)
    return {
      specificationId, limitId: existing.id, property, limitText: existing.limitText, unit: existing.unit, direction: existing.direction,
      significantDigits: String(existing.significantDigits), conformanceMethod: existing.conformanceMethod, testMethodCode: existing.testMethodCode ?? "",
      testingFrequencyAreaM2: existing.testingFrequencyAreaM2 === null ? "" : String(existing.testingFrequencyAreaM2), testingFrequencyPerLot: existing.testingFrequencyPerLot,
    };
  return {
    specificationId, limitId: "", property, limitText: "", unit: PROPERTY_UNITS[property][0]!, direction: USUAL_DIRECTION[property],
    significantDigits: "", conformanceMethod: "ROUNDING", testMethodCode: USUAL_METHOD[property] ?? "", testingFrequencyAreaM2: "", testingFrequencyPerLot: false,
  };
}

/**
 * Adds a limit, or changes the one the specification already has for the chosen property (one per
 * property): choosing a property that is limited fills the form with its limit.
 */
export function LimitForm({ specificationId, limits }: { specificationId: string; limits: LimitRow[] }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const first = TEST_PROPERTIES.find((p) => !limits.some((l) => l.property === p)) ?? TEST_PROPERTIES[0];
  const form = useForm<FormValues, unknown, z.output<typeof setSpecificationLimitSchema>>({
    resolver: zodResolver(setSpecificationLimitSchema),
    defaultValues: valuesFor(specificationId, first, limits),
  });
  const { register, handleSubmit, formState, reset, control } = form;
  const property = useWatch({ control, name: "property" }) as TestProperty;
  const limitText = useWatch({ control, name: "limitText" });
  const editing = Boolean(useWatch({ control, name: "limitId" }));
  const writtenDigits = limitTextSchema.safeParse(limitText).success ? significantDigitsOf(String(limitText)) : null;

  const onSubmit = handleSubmit(async (values) => {
    const result = await setSpecificationLimitAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (!result.ok) {
      applyServerErrors(form, result.fieldErrors);
      return;
    }
    // A limit just added is now the one this property has; saving again changes it.
    form.setValue("limitId", result.data.id);
    router.refresh();
  });
  const errors = formState.errors;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Add or change a limit">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label="Property" hint={editing ? "Already limited here: saving changes this limit." : "Not limited yet: saving adds it."} error={errors.property?.message}>
        <select {...register("property", { onChange: (e) => { reset(valuesFor(specificationId, e.target.value as TestProperty, limits)); setNotice(null); } })}>
          {TEST_PROPERTIES.map((p) => <option key={p} value={p}>{TEST_PROPERTY_LABELS[p]}{limits.some((l) => l.property === p) ? " (limited)" : ""}</option>)}
        </select>
      </Field>
      <div className={styles.formRow}>
        <Field label="Limit, as the specification writes it" hint="e.g. 5e-11, 1e-8, 24, 3.66; its last digit decides the rounding." error={errors.limitText?.message}>
          <input className="mono" inputMode="decimal" autoComplete="off" {...register("limitText")} />
        </Field>
        <Field label="Unit" error={errors.unit?.message}>
          <select {...register("unit")}>{PROPERTY_UNITS[property].map((u) => <option key={u} value={u}>{formatUnit(u)}</option>)}</select>
        </Field>
      </div>
      <div className={styles.formRow}>
        <Field label="Direction" error={errors.direction?.message}>
          <select {...register("direction")}>{LIMIT_DIRECTIONS.map((d) => <option key={d} value={d}>{LIMIT_DIRECTION_LABELS[d]}</option>)}</select>
        </Field>
        <Field label="Significant digits" hint={writtenDigits !== null ? `As written: ${writtenDigits}. Leave blank to use that.` : "Leave blank to take them from the limit."} error={errors.significantDigits?.message}>
          <input inputMode="numeric" autoComplete="off" {...register("significantDigits")} />
        </Field>
      </div>
      <div className={styles.formRow}>
        <Field label="Conformance" hint="Rounding: the result is rounded to the limit's last place (ASTM E29). Absolute: any excursion fails." error={errors.conformanceMethod?.message}>
          <select {...register("conformanceMethod")}>{CONFORMANCE_METHODS.map((m) => <option key={m} value={m}>{CONFORMANCE_METHOD_LABELS[m]}</option>)}</select>
        </Field>
        <Field label="Test method" hint="e.g. D5887; optional." error={errors.testMethodCode?.message}>
          <input className="mono" autoComplete="off" {...register("testMethodCode")} />
        </Field>
      </div>
      <div className={styles.formRow}>
        <Field label="Testing frequency, one test per" hint="Square metres delivered (e.g. 4000); blank: every roll." error={errors.testingFrequencyAreaM2?.message}>
          <input inputMode="decimal" autoComplete="off" {...register("testingFrequencyAreaM2")} />
        </Field>
        <Field label="Also one test per lot" error={errors.testingFrequencyPerLot?.message}>
          <input type="checkbox" {...register("testingFrequencyPerLot")} />
        </Field>
      </div>
      <p className="hint">Certificates already issued keep the limit they stated; a change applies to certificates issued from now on.</p>
      <button className="button" type="submit" disabled={formState.isSubmitting}>{editing ? "Change limit" : "Add limit"}</button>
    </form>
  );
}

"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { assignSpecimenAction } from "@/app/(staff)/runs/actions";
import { assignSpecimenSchema } from "@/lib/validation/runs";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";

type Instrument = { id: string; assetTag: string; name: string; kind: string; calibration: { usable: boolean; message: string }; overrideUntil: Date | null; busyWith: string | null };
type Specimen = { id: string; labNumber: string; intendedMethodCode: string; coupon: { roll: { labNumber: string; project: { name: string } } } };

function optionLabel(i: Instrument): string {
  const note = i.busyWith ? ` — holding ${i.busyWith}` : !i.calibration.usable ? (i.overrideUntil ? " — calibration due, QA override in force" : " — not usable: calibration") : "";
  return `${i.assetTag} · ${i.name}${note}`;
}

/** Mount a waiting specimen in a free cell with the instruments the run will use; the run starts here. */
export function AssignForm({ specimens, instruments, pressureUnit, preselectedSpecimenId }: { specimens: Specimen[]; instruments: Instrument[]; pressureUnit: "KPA" | "PSI"; preselectedSpecimenId?: string }) {
  const router = useRouter();
  const [failure, setFailure] = useState<string | null>(null);
  const first = specimens.find((s) => s.id === preselectedSpecimenId) ?? specimens[0];
  const form = useForm<z.input<typeof assignSpecimenSchema>, unknown, z.output<typeof assignSpecimenSchema>>({
    resolver: zodResolver(assignSpecimenSchema),
    defaultValues: { specimenId: first?.id ?? "", cellId: "", burettePanelId: "", transducerId: "", thermometerId: "", thicknessGaugeId: "", timerId: "", methodCode: (first?.intendedMethodCode as "D5887") ?? "D5887", pressureUnit, effectiveStress: "" },
  });
  const { register, handleSubmit, formState, control } = form;
  const method = useWatch({ control, name: "methodCode" });
  const of = (kind: string) => instruments.filter((i) => i.kind === kind && (kind !== "PERMEAMETER_CELL" || !i.busyWith));
  const onSubmit = handleSubmit(async (values) => {
    setFailure(null);
    const result = await assignSpecimenAction(values);
    if (result.ok) router.push(`/runs/${result.data.labNumber}`);
    else {
      setFailure(result.message);
      applyServerErrors(form, result.fieldErrors);
    }
  });
  const unit = pressureUnit === "PSI" ? "psi" : "kPa";
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Assign a specimen to a cell">
      {failure && <div className="notice notice-error" role="alert" data-testid="assign-error">{failure}</div>}
      <Field label="Specimen" error={formState.errors.specimenId?.message}>
        <select {...register("specimenId")}>{specimens.map((s) => <option key={s.id} value={s.id}>{s.labNumber} · roll {s.coupon.roll.labNumber} · {s.coupon.roll.project.name} · ASTM {s.intendedMethodCode}</option>)}</select>
      </Field>
      <Field label="Method" error={formState.errors.methodCode?.message}>
        <select {...register("methodCode")}><option value="D5887">ASTM D5887 index flux</option><option value="D5084">ASTM D5084 hydraulic conductivity</option><option value="D6766">ASTM D6766 with a test liquid</option></select>
      </Field>
      <Field label="Cell" error={formState.errors.cellId?.message}>
        <select {...register("cellId")}><option value="">Choose a free cell…</option>{of("PERMEAMETER_CELL").map((i) => <option key={i.id} value={i.id}>{optionLabel(i)}</option>)}</select>
      </Field>
      <Field label="Burette panel" error={formState.errors.burettePanelId?.message}>
        <select {...register("burettePanelId")}><option value="">Choose…</option>{of("BURETTE_PANEL").map((i) => <option key={i.id} value={i.id}>{optionLabel(i)}</option>)}</select>
      </Field>
      <Field label="Pressure transducer" error={formState.errors.transducerId?.message}>
        <select {...register("transducerId")}><option value="">Choose…</option>{of("PRESSURE_TRANSDUCER").map((i) => <option key={i.id} value={i.id}>{optionLabel(i)}</option>)}</select>
      </Field>
      <Field label="Thermometer" hint="Optional." error={formState.errors.thermometerId?.message}>
        <select {...register("thermometerId")}><option value="">None</option>{of("THERMOMETER").map((i) => <option key={i.id} value={i.id}>{optionLabel(i)}</option>)}</select>
      </Field>
      <Field label="Thickness gauge" hint="Optional; for the post-test thickness. Its calibration gives that uncertainty." error={formState.errors.thicknessGaugeId?.message}>
        <select {...register("thicknessGaugeId")}><option value="">None</option>{of("THICKNESS_GAUGE").map((i) => <option key={i.id} value={i.id}>{optionLabel(i)}</option>)}</select>
      </Field>
      <Field label="Timer or logger clock" hint="Optional. Its calibration gives the uncertainty of the time stamps." error={formState.errors.timerId?.message}>
        <select {...register("timerId")}><option value="">None</option>{of("TIMER").map((i) => <option key={i.id} value={i.id}>{optionLabel(i)}</option>)}</select>
      </Field>
      <Field label={`Effective stress (${unit})`} hint="Optional; as the project specification sets it." error={formState.errors.effectiveStress?.message}><input inputMode="decimal" {...register("effectiveStress")} /></Field>
      {method === "D6766" && (
        <fieldset className="card">
          <legend><strong>Permeant</strong></legend>
          <Field label="Solution or leachate" error={formState.errors.permeantName?.message}><input {...register("permeantName")} /></Field>
          <Field label="Salt" error={formState.errors.permeantSalt?.message}><input {...register("permeantSalt")} /></Field>
          <Field label="Molarity (mol/L)" error={formState.errors.permeantMolarityMolPerL?.message}><input inputMode="decimal" {...register("permeantMolarityMolPerL")} /></Field>
          <Field label="Influent EC (mS/m)" error={formState.errors.permeantEcMsPerM?.message}><input inputMode="decimal" {...register("permeantEcMsPerM")} /></Field>
          <Field label="Influent pH" error={formState.errors.permeantPh?.message}><input inputMode="decimal" {...register("permeantPh")} /></Field>
        </fieldset>
      )}
      <button className="button" type="submit" disabled={formState.isSubmitting}>Start the run</button>
    </form>
  );
}

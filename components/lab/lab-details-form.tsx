"use client";

import { updateLabDetailsAction } from "@/app/(staff)/admin/lab/actions";
import { Field } from "@/components/ui/field";
import { FormNotice, useActionForm } from "@/components/ui/use-action-form";
import { labDetailsSchema } from "@/lib/validation/lab-details";

type Props = { lab: { name: string; address: string; accreditation: string; timeZone: string }; zones: Array<{ zone: string; label: string }> };

/** The lab's name, address, accreditation and time zone, as its documents print them. */
export function LabDetailsForm({ lab, zones }: Props) {
  const { form, onSubmit, notice } = useActionForm({ schema: labDetailsSchema, defaultValues: lab, action: updateLabDetailsAction });
  const { register, formState } = form;
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Lab details">
      <FormNotice notice={notice} />
      <Field label="Laboratory name" error={formState.errors.name?.message}><input {...register("name")} /></Field>
      <Field label="Address" hint="As printed under the name; line breaks are kept." error={formState.errors.address?.message}><textarea rows={3} {...register("address")} /></Field>
      <Field label="Accreditation" hint="e.g. the accreditation body and number; leave blank if none." error={formState.errors.accreditation?.message}><input {...register("accreditation")} /></Field>
      <Field label="Time zone" hint="Where the lab is: times are shown, typed and printed in this zone." error={formState.errors.timeZone?.message}>
        <select {...register("timeZone")}>{zones.map((z) => <option key={z.zone} value={z.zone}>{z.label}</option>)}</select>
      </Field>
      <div><button className="button" type="submit" disabled={formState.isSubmitting}>Save the lab's details</button></div>
    </form>
  );
}

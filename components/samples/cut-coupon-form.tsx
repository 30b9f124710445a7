"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { cutCouponAction } from "@/app/(staff)/samples/actions";
import { cutCouponSchema } from "@/lib/validation/samples";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { LabNumberLinks } from "@/components/intake/lab-number-links";
import { nowToTheMinute } from "@/components/ui/now-for-input";
import { ZonedDateTimeInput } from "@/components/ui/zoned-date-time-input";
import { INDEX_METHODS } from "@/lib/index-tests/index-test-methods";

type Locations = Array<{ id: string; code: string; name: string }>;

export function CutCouponForm({ rollId, rollVersion, locations, zone }: { rollId: string; rollVersion: number; locations: Locations; zone: string }) {
  const router = useRouter();
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<z.input<typeof cutCouponSchema>, unknown, z.output<typeof cutCouponSchema>>({
    resolver: zodResolver(cutCouponSchema),
    defaultValues: { rollId, rollVersion, positionInSample: "", lengthMm: "", widthMm: "", cutAt: nowToTheMinute(), storageLocationId: locations[0]?.id ?? "", intendedMethodCode: "" },
  });
  const { register, handleSubmit, formState, control } = form;
  const onSubmit = handleSubmit(async (values) => {
    const result = await cutCouponAction(values);
    setNotice({ ok: result.ok, text: result.ok ? `Coupon ${result.data.labNumber} recorded.` : result.message });
    if (result.ok) router.refresh();
    else applyServerErrors(form, result.fieldErrors);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label="Cut a coupon">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status"><LabNumberLinks text={notice.text} /></div>}
      <Field label="Position in the roll sample" hint="e.g. centre, 300 mm from the leading edge" error={formState.errors.positionInSample?.message}><input {...register("positionInSample")} /></Field>
      <Field label="Length (mm)" error={formState.errors.lengthMm?.message}><input inputMode="decimal" {...register("lengthMm")} /></Field>
      <Field label="Width (mm)" error={formState.errors.widthMm?.message}><input inputMode="decimal" {...register("widthMm")} /></Field>
      <Field label="Cut at" error={formState.errors.cutAt?.message}><ZonedDateTimeInput control={control} name="cutAt" zone={zone} /></Field>
      <Field label="Kept at" error={formState.errors.storageLocationId?.message}>
        <select {...register("storageLocationId")}>{locations.map((l) => <option key={l.id} value={l.id}>{l.code} · {l.name}</option>)}</select>
      </Field>
      <Field label="Cut for" hint="An index test done on the coupon itself (strips, squares), or specimens for a hydraulic test." error={formState.errors.intendedMethodCode?.message}>
        <select {...register("intendedMethodCode")}>
          <option value="">Specimens for a hydraulic test</option>
          {Object.values(INDEX_METHODS).map((m) => <option key={m.code} value={m.code}>{m.title}: {m.couponWhat}</option>)}
        </select>
      </Field>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record coupon</button>
    </form>
  );
}

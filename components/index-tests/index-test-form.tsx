"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { get, useForm } from "react-hook-form";
import { recordIndexTestAction } from "@/app/(staff)/index-tests/actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { nowToTheMinute } from "@/components/ui/now-for-input";
import { ZonedDateTimeInput } from "@/components/ui/zoned-date-time-input";
import { INDEX_TEST_FIELDS } from "@/lib/index-tests/index-test-fields";
import { INDEX_METHODS, type IndexMethodCode } from "@/lib/index-tests/index-test-methods";
import { recordIndexTestSchema } from "@/lib/validation/index-tests";
import { ScrollArea } from "@/components/ui/scroll-area";

type Option = { id: string; label: string };

/**
 * The entry form of one index test on one roll: the coupon, the instruments (only those in calibration are
 * offered), the observations and the specimen rows. Checked in the browser with the server's own schema
 * and the lab's settings; the server checks again and says which field is wrong.
 */
export function IndexTestForm(props: {
  methodCode: IndexMethodCode; rollId: string; rollLabNumber: string; settings: Record<string, unknown>; zone: string;
  coupons: Option[]; defaultCouponId: string; instruments: Record<string, Option[]>; correctsId?: string;
}) {
  const { methodCode, settings } = props;
  const router = useRouter();
  const method = INDEX_METHODS[methodCode];
  const layout = INDEX_TEST_FIELDS[methodCode];
  const rows = Math.max(Number(settings.minSpecimens ?? 1), layout.specimenColumns.length ? 3 : 0) + (layout.specimenColumns.length ? 1 : 0);
  const schema = useMemo(() => recordIndexTestSchema(methodCode, settings), [methodCode, settings]);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const setting = (key?: string) => (key && settings[key] !== null && settings[key] !== undefined ? String(settings[key]) : "");
  const observations: Record<string, unknown> = { methodCode };
  for (const f of layout.fields) observations[f.key] = setting(f.fromSetting);
  if (layout.choice) observations[layout.choice.key] = layout.choice.options[0]!.value;
  // The method's fixed values (strip width) fill the rows the method asks for; spare rows stay blank, so they are left out.
  const asked = Number(settings.minSpecimens ?? 1);
  if (layout.specimenColumns.length) observations.specimens = Array.from({ length: rows }, (_, n) => Object.fromEntries(layout.specimenColumns.map((c) => [c.key, n < asked ? setting(c.fromSetting) : ""])));
  const form = useForm<Record<string, unknown>>({
    resolver: zodResolver(schema as never),
    defaultValues: {
      rollId: props.rollId, methodCode, couponId: props.defaultCouponId, testedAt: nowToTheMinute(), correctsId: props.correctsId ?? "",
      instruments: Object.fromEntries(method.instruments.map((i) => [i.key, props.instruments[i.key]?.[0]?.id ?? ""])), observations,
    },
  });
  const { register, handleSubmit, formState, control } = form;
  const error = (path: string) => (get(formState.errors, path) as { message?: string } | undefined)?.message;
  const onSubmit = handleSubmit(async (values) => {
    const result = await recordIndexTestAction(values);
    setNotice({ ok: result.ok, text: result.message });
    if (!result.ok) return applyServerErrors(form, result.fieldErrors);
    router.push(`/index-tests/${result.data.id}`);
  });
  return (
    <form className="stack" onSubmit={onSubmit} noValidate aria-label={`Record ${method.title}`}>
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      <Field label={method.needsCoupon ? `Coupon (${method.couponWhat})` : "Coupon the clay came from (optional)"} error={error("couponId")}>
        <select {...register("couponId")}>
          {!method.needsCoupon && <option value="">From the roll sample</option>}
          {props.coupons.map((c) => <option key={c.id} value={c.id}>{c.label}</option>)}
        </select>
      </Field>
      <Field label="Tested at" error={error("testedAt")}><ZonedDateTimeInput control={control} name="testedAt" zone={props.zone} /></Field>
      <fieldset className="stack">
        <legend>Instruments</legend>
        {method.instruments.map((i) => (
          <Field key={i.key} label={i.label} hint={props.instruments[i.key]?.length ? undefined : "None in calibration: record a calibration or ask QA for an override."} error={error(`instruments.${i.key}`)}>
            <select {...register(`instruments.${i.key}`)}>
              {(props.instruments[i.key] ?? []).length === 0 && <option value="">None usable</option>}
              {(props.instruments[i.key] ?? []).map((o) => <option key={o.id} value={o.id}>{o.label}</option>)}
            </select>
          </Field>
        ))}
      </fieldset>
      <fieldset className="stack">
        <legend>Observations</legend>
        {layout.choice && (
          <Field label={layout.choice.label} error={error(`observations.${layout.choice.key}`)}>
            <select {...register(`observations.${layout.choice.key}`)}>{layout.choice.options.map((o) => <option key={o.value} value={o.value}>{o.label}</option>)}</select>
          </Field>
        )}
        {layout.fields.map((f) => (
          <Field key={f.key} label={f.label} hint={f.hint} error={error(`observations.${f.key}`)}>
            <input inputMode="decimal" autoComplete="off" {...register(`observations.${f.key}`)} />
          </Field>
        ))}
        {layout.specimenColumns.length > 0 && (
          <ScrollArea>
            <p className="hint">At least {String(settings.minSpecimens)} specimen{Number(settings.minSpecimens) === 1 ? "" : "s"} (the lab&apos;s settings); leave spare rows blank.</p>
            {error("observations.specimens") && <p className="field-error" role="alert">{error("observations.specimens")}</p>}
            <table className="list" data-testid="specimen-rows">
              <thead><tr><th>#</th>{layout.specimenColumns.map((c) => <th key={c.key}>{c.label}</th>)}</tr></thead>
              <tbody>
                {Array.from({ length: rows }, (_, n) => (
                  <tr key={n}>
                    <td>{n + 1}</td>
                    {layout.specimenColumns.map((c) => (
                      <td key={c.key}>
                        <input aria-label={`Specimen ${n + 1} ${c.label}`} inputMode="decimal" autoComplete="off" {...register(`observations.specimens.${n}.${c.key}`)} />
                        {error(`observations.specimens.${n}.${c.key}`) && <div className="field-error">{error(`observations.specimens.${n}.${c.key}`)}</div>}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
        )}
      </fieldset>
      <button className="button" type="submit" disabled={formState.isSubmitting}>Record the test for review</button>
    </form>
  );
}

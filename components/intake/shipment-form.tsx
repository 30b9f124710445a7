"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, useWatch } from "react-hook-form";
import type { z } from "zod";
import { logShipmentAction } from "@/app/(staff)/intake/actions";
import { readPastedRolls, ROLL_COLUMN_TITLES } from "@/lib/custody/pasted-rolls";
import { YES_NO_HINT } from "@/lib/custody/yes-no";
import { logShipmentSchema } from "@/lib/validation/intake";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { Field } from "@/components/ui/field";
import { nowToTheMinute } from "@/components/ui/now-for-input";
import { ZonedDateTimeInput } from "@/components/ui/zoned-date-time-input";
import { LabNumberLinks } from "./lab-number-links";
import styles from "./shipment-form.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

type FormInput = z.input<typeof logShipmentSchema>;
type FormOutput = z.output<typeof logShipmentSchema>;
type Options = { clients: Array<{ id: string; name: string; projects: Array<{ id: string; name: string; code: string }> }>; locations: Array<{ id: string; code: string; name: string }> };

const EMPTY_ROLL = { rollNumber: "", lotNumber: "", product: "", manufacturer: "", sampleLengthMm: "", sampleWidthMm: "", machineDirectionMarked: false, conditionNotes: "", deliveredLengthM: "", deliveredWidthM: "" };
const COLUMN_TITLES = Object.values(ROLL_COLUMN_TITLES);

/** Logging a shipment: its details, then its rolls typed in or pasted from a spreadsheet, checked row by row. */
export function ShipmentForm({ options, zone }: { options: Options; zone: string }) {
  const router = useRouter();
  const [pasted, setPasted] = useState("");
  const [notice, setNotice] = useState<string | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(logShipmentSchema),
    defaultValues: { clientOrganizationId: "", projectId: "", deliveredBy: "", receivedAt: nowToTheMinute(), conditionNotes: "", storageLocationId: "", rolls: [] },
  });
  const { register, handleSubmit, formState, control, trigger } = form;
  const rolls = useFieldArray({ control, name: "rolls" });
  const clientId = useWatch({ control, name: "clientOrganizationId" });
  const projects = options.clients.find((c) => c.id === clientId)?.projects ?? [];
  const rowErrors = formState.errors.rolls;

  const addPasted = async () => {
    const { rolls: rows, problems } = readPastedRolls(pasted);
    if (rows.length === 0) return setNotice("Nothing to read: paste rows copied from a spreadsheet, one roll per row.");
    // A cell that is not a clear yes or no refuses the paste: nothing is added until it is put right.
    if (problems.length > 0) return setNotice(`Nothing was added. ${problems.join(" ")}`);
    rolls.append(rows.map((r) => ({ ...EMPTY_ROLL, ...r })));
    setPasted("");
    setNotice(`${rows.length} row${rows.length === 1 ? "" : "s"} read. Check the rows marked in red before saving.`);
    await trigger("rolls");
  };

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const result = await logShipmentAction(values);
    if (result.ok) {
      router.push(`/intake/shipments/${result.data.labNumber}`);
      return;
    }
    setNotice(result.message);
    applyServerErrors(form, result.fieldErrors);
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log a shipment" className={styles.form}>
      {notice && <div className={`notice ${formState.isSubmitSuccessful ? "notice-ok" : "notice-caution"}`} role="status">{notice}</div>}
      <section className="card">
        <h2>Shipment</h2>
        <div className={styles.columns}>
          <Field label="Client" error={formState.errors.clientOrganizationId?.message}>
            <select {...register("clientOrganizationId")}>
              <option value="">Choose…</option>
              {options.clients.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
            </select>
          </Field>
          <Field label="Project" error={formState.errors.projectId?.message}>
            <select {...register("projectId")} disabled={!clientId}>
              <option value="">{clientId ? "Choose…" : "Choose the client first"}</option>
              {projects.map((p) => <option key={p.id} value={p.id}>{p.name} ({p.code})</option>)}
            </select>
          </Field>
          <Field label="Delivered by" hint="Carrier and driver, courier reference, or the person who brought it." error={formState.errors.deliveredBy?.message}>
            <input {...register("deliveredBy")} />
          </Field>
          <Field label="Received at" error={formState.errors.receivedAt?.message}>
            <ZonedDateTimeInput control={control} name="receivedAt" zone={zone} />
          </Field>
          <Field label="Stored at" error={formState.errors.storageLocationId?.message}>
            <select {...register("storageLocationId")}>
              <option value="">Choose…</option>
              {options.locations.map((l) => <option key={l.id} value={l.id}>{l.code} · {l.name}</option>)}
            </select>
          </Field>
        </div>
        <Field label="Condition on arrival" hint="Wrapping, damage, wetness, labels: what the client will see on the receipt. A roll's own condition goes in its row." error={formState.errors.conditionNotes?.message}>
          <textarea rows={3} {...register("conditionNotes")} />
        </Field>
      </section>

      <section className="card">
        <h2>Rolls <span className="count">{rolls.fields.length} in this shipment</span></h2>
        <div className={styles.paste}>
          <Field label="Paste rows from a spreadsheet" hint={`Columns: ${COLUMN_TITLES.join(", ")}. A header row lets the columns come in any order. MD marked: ${YES_NO_HINT} (blank is no).`}>
            <textarea rows={4} value={pasted} onChange={(e) => setPasted(e.target.value)} className="mono" spellCheck={false} />
          </Field>
          <div className={styles.pasteButtons}>
            <button type="button" className="button button-quiet" onClick={() => void addPasted()} disabled={!pasted.trim()}>Read pasted rows</button>
            <button type="button" className="button button-quiet" onClick={() => rolls.append({ ...EMPTY_ROLL })}>Add a row</button>
          </div>
        </div>
        {typeof rowErrors?.message === "string" && <p className="field-error">{rowErrors.message}</p>}
        {rolls.fields.length > 0 && (
          <ScrollArea>
            <table className={`list ${styles.grid}`} data-testid="roll-grid">
              <thead><tr><th>#</th>{COLUMN_TITLES.map((t) => <th key={t}>{t}</th>)}<th><span className="visually-hidden">Remove</span></th></tr></thead>
              <tbody>
                {rolls.fields.map((field, index) => {
                  const errors = rowErrors?.[index];
                  const messages = errors ? Object.values(errors).map((e) => (e as { message?: string })?.message).filter(Boolean) as string[] : [];
                  return (
                    <tr key={field.id} className={messages.length ? styles.badRow : undefined} data-row={index + 1}>
                      <td>{index + 1}</td>
                      <td><input aria-label={`Row ${index + 1} roll number`} {...register(`rolls.${index}.rollNumber`)} /></td>
                      <td><input aria-label={`Row ${index + 1} lot number`} {...register(`rolls.${index}.lotNumber`)} /></td>
                      <td><input aria-label={`Row ${index + 1} product`} {...register(`rolls.${index}.product`)} /></td>
                      <td><input aria-label={`Row ${index + 1} manufacturer`} {...register(`rolls.${index}.manufacturer`)} /></td>
                      <td><input aria-label={`Row ${index + 1} length`} inputMode="decimal" className={styles.narrow} {...register(`rolls.${index}.sampleLengthMm`)} /></td>
                      <td><input aria-label={`Row ${index + 1} width`} inputMode="decimal" className={styles.narrow} {...register(`rolls.${index}.sampleWidthMm`)} /></td>
                      <td><input type="checkbox" aria-label={`Row ${index + 1} machine direction marked`} {...register(`rolls.${index}.machineDirectionMarked`)} /></td>
                      <td><input aria-label={`Row ${index + 1} condition`} placeholder="as the shipment" {...register(`rolls.${index}.conditionNotes`)} /></td>
                      <td><input aria-label={`Row ${index + 1} roll length`} inputMode="decimal" className={styles.narrow} {...register(`rolls.${index}.deliveredLengthM`)} /></td>
                      <td><input aria-label={`Row ${index + 1} roll width`} inputMode="decimal" className={styles.narrow} {...register(`rolls.${index}.deliveredWidthM`)} /></td>
                      <td>
                        <button type="button" className="button button-quiet" onClick={() => rolls.remove(index)} aria-label={`Remove row ${index + 1}`}>×</button>
                        {messages.length > 0 && <div className={`field-error ${styles.rowMessages}`} data-testid={`row-${index + 1}-errors`}>{messages.map((m) => <div key={m}><LabNumberLinks text={m} /></div>)}</div>}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </ScrollArea>
        )}
      </section>
      <div>
        <button className="button" type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? "Saving…" : "Log shipment and rolls"}</button>
        <span className="muted"> Nothing is saved unless every row is valid.</span>
      </div>
    </form>
  );
}

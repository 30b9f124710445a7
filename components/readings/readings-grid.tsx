"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { useFieldArray, useForm, type Path } from "react-hook-form";
import type { z } from "zod";
import { recordReadingsAction } from "@/app/(staff)/runs/[labNumber]/readings-actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { nowToTheMinute } from "@/components/ui/now-for-input";
import { ZonedDateTimeInput } from "@/components/ui/zoned-date-time-input";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { recordReadingsSchema } from "@/lib/validation/readings";
import { entryColumns, type EntryRow } from "./entry-columns";
import styles from "./readings.module.css";
import { ScrollArea } from "@/components/ui/scroll-area";

type FormInput = z.input<typeof recordReadingsSchema>;
type FormOutput = z.output<typeof recordReadingsSchema>;
type Row = EntryRow;

export type ReadingsGridProps = {
  runId: string;
  pressureUnit: PressureUnit;
  /** Show EC and pH columns (ASTM D6766). */
  withChemistry: boolean;
  /** Values a new row starts with (pressures and temperature rarely change between readings), in the person's unit. */
  carryOver: Partial<Row>;
  /** The lab's time zone: the time column is typed as wall-clock time there. */
  zone: string;
};

const blankRow = (from: Partial<Row>): Row => ({
  takenAt: nowToTheMinute(), inflowLevelMm: "", outflowLevelMm: "",
  influentPressure: from.influentPressure ?? "", effluentPressure: from.effluentPressure ?? "", cellPressure: from.cellPressure ?? "", temperatureC: from.temperatureC ?? "",
  influentEcMsPerM: "", effluentEcMsPerM: "", influentPh: from.influentPh ?? "", effluentPh: "", afterRefill: false,
});

/**
 * The keyboard-fast entry grid: Tab or Enter moves to the next cell, Shift+Enter back, Enter on the last
 * cell adds a row (pressures and temperature carried over), Ctrl+Enter saves. "After refill" marks the
 * reading taken just after a refill or drain (the row before holds the levels just before it). Rows are
 * checked with the shared schema before sending; the server adds the checks across rows, and saves all
 * rows or none.
 */
export function ReadingsGrid({ runId, pressureUnit, withChemistry, carryOver, zone }: ReadingsGridProps) {
  const router = useRouter();
  const columns = entryColumns(pressureUnit, withChemistry);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const form = useForm<FormInput, unknown, FormOutput>({
    resolver: zodResolver(recordReadingsSchema),
    defaultValues: { runId, pressureUnit, readings: [blankRow(carryOver)] },
  });
  const { register, handleSubmit, formState, control, getValues, reset } = form;
  const rows = useFieldArray({ control, name: "readings" });
  const tableRef = useRef<HTMLTableElement>(null);
  const pendingFocus = useRef<[number, number] | null>(null);

  const focusCell = (row: number, col: number) => tableRef.current?.querySelector<HTMLInputElement>(`input[data-row="${row}"][data-col="${col}"]`)?.focus();
  useEffect(() => {
    if (!pendingFocus.current) return;
    focusCell(...pendingFocus.current);
    pendingFocus.current = null;
  });

  const addRow = () => {
    const last = getValues("readings").at(-1) as Partial<Row> | undefined;
    rows.append(blankRow(last ?? carryOver));
    pendingFocus.current = [rows.fields.length, 1];
  };

  const onSubmit = handleSubmit(async (values) => {
    setNotice(null);
    const result = await recordReadingsAction(values);
    if (!result.ok) {
      setNotice({ ok: false, text: result.message });
      applyServerErrors(form, result.fieldErrors);
      return;
    }
    const last = getValues("readings").at(-1) as Partial<Row> | undefined;
    reset({ runId, pressureUnit, readings: [blankRow(last ?? carryOver)] });
    setNotice({ ok: true, text: `${result.data.saved} reading${result.data.saved === 1 ? "" : "s"} saved.` });
    router.refresh();
  });

  const onKeyDown = (e: React.KeyboardEvent<HTMLTableElement>) => {
    if (e.key !== "Enter") return;
    const target = e.target as HTMLInputElement;
    const row = Number(target.dataset.row);
    const col = Number(target.dataset.col);
    if (!Number.isInteger(row) || !Number.isInteger(col)) return;
    e.preventDefault();
    if (e.ctrlKey || e.metaKey) return void onSubmit();
    if (e.shiftKey) return col > 0 ? focusCell(row, col - 1) : focusCell(row - 1, columns.length - 1);
    if (col < columns.length - 1) focusCell(row, col + 1);
    else if (row < rows.fields.length - 1) focusCell(row + 1, 0);
    else addRow();
  };

  const rowErrors = formState.errors.readings;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Enter readings">
      {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      {typeof rowErrors?.message === "string" && <p className="field-error">{rowErrors.message}</p>}
      <ScrollArea>
        <table className={`list ${styles.grid}`} data-testid="readings-grid" ref={tableRef} onKeyDown={onKeyDown}>
          <thead><tr><th>#</th>{columns.map((c) => <th key={c.key}>{c.title}</th>)}<th /></tr></thead>
          <tbody>
            {rows.fields.map((field, index) => {
              const errors = rowErrors?.[index] as Record<string, { message?: string } | undefined> | undefined;
              const messages = errors ? columns.map((c) => errors[c.key]?.message).filter((m): m is string => Boolean(m)) : [];
              return (
                <tr key={field.id} className={messages.length ? styles.badRow : undefined} data-row={index + 1}>
                  <td>{index + 1}</td>
                  {columns.map((c, col) => {
                    const cell = { "aria-label": `Row ${index + 1} ${c.title}`, "aria-invalid": errors?.[c.key] ? true : undefined, "data-row": index, "data-col": col, autoComplete: "off" };
                    return (
                      <td key={c.key}>
                        {c.kind === "time"
                          ? <ZonedDateTimeInput control={control} name={`readings.${index}.${c.key}` as Path<FormInput>} zone={zone} {...cell} />
                          : <input {...register(`readings.${index}.${c.key}` as Path<FormInput>)} type={c.kind === "check" ? "checkbox" : "text"} inputMode={c.kind === "number" ? "decimal" : undefined} {...cell} />}
                      </td>
                    );
                  })}
                  <td>
                    {rows.fields.length > 1 && <button type="button" className="button button-quiet" onClick={() => rows.remove(index)} aria-label={`Remove row ${index + 1}`}>×</button>}
                    {messages.length > 0 && <div className={`field-error ${styles.rowMessages}`} data-testid={`reading-row-${index + 1}-errors`}>{messages.map((m) => <div key={m}>{m}</div>)}</div>}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollArea>
      <div className={styles.actions}>
        <button className="button" type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? "Saving…" : `Save ${rows.fields.length} reading${rows.fields.length === 1 ? "" : "s"}`}</button>
        <button type="button" className="button button-quiet" onClick={addRow}>Add a row</button>
        <span className="muted">Enter moves to the next cell and adds a row at the end; Ctrl+Enter saves. Nothing is saved unless every row is valid.</span>
      </div>
    </form>
  );
}

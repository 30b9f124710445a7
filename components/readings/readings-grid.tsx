"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { Controller, useFieldArray, useForm, useWatch, type FieldErrors, type Path, type Resolver } from "react-hook-form";
import type { z } from "zod";
import { recordReadingsAction } from "@/app/(staff)/runs/[labNumber]/readings-actions";
import { applyServerErrors } from "@/components/ui/apply-server-errors";
import { nowToTheMinute } from "@/components/ui/now-for-input";
import { ScrollArea } from "@/components/ui/scroll-area";
import type { PressureUnit } from "@/lib/units/pressure-entry";
import { nextReadingTime, withoutTrailingBlankRows } from "@/lib/readings/entry-grid-rows";
import { recordReadingsSchema } from "@/lib/validation/readings";
import { entryColumns, type EntryColumn, type EntryRow } from "./entry-columns";
import styles from "./readings.module.css";
import { TimeCell } from "./time-cell";

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
  /** The times of the run's last two saved readings (ISO text), oldest first: a new row continues their interval. */
  lastTimes?: string[];
};

const cellId = (row: number, key: string) => `reading-${row}-${key}`;

const blankRow = (from: Partial<Row>, takenAt: string): Row => ({
  takenAt, inflowLevelMm: "", outflowLevelMm: "",
  influentPressure: from.influentPressure ?? "", effluentPressure: from.effluentPressure ?? "", cellPressure: from.cellPressure ?? "", temperatureC: from.temperatureC ?? "",
  influentEcMsPerM: "", effluentEcMsPerM: "", influentPh: from.influentPh ?? "", effluentPh: "", afterRefill: false,
});

/** The shared schema, on the rows the person filled: a trailing row left blank is not a reading. */
const resolver: Resolver<FormInput, unknown, FormOutput> = (values, context, options) =>
  zodResolver(recordReadingsSchema)({ ...values, readings: withoutTrailingBlankRows(values.readings as Row[]) }, context, options);

/**
 * The keyboard-fast entry grid. Tab or Enter moves to the next cell and selects what it holds, so typing
 * replaces it; Shift+Enter goes back; Enter on the last cell adds a row whose time continues the run's
 * interval and whose pressures and temperature carry over; Ctrl+Enter saves from anywhere in the form. A
 * time is typed as "14:30" or "2026-11-30 14:30" in the lab's zone. "After refill" marks the reading taken
 * just after a refill or drain. Rows are checked with the shared schema before sending (a trailing blank
 * row is left out); the server adds the checks across rows and saves all rows or none. Each refused cell
 * names its problem beside it (aria-describedby) and the summary above links to each; refusals are
 * announced through a live region that is always on the page.
 */
export function ReadingsGrid({ runId, pressureUnit, withChemistry, carryOver, zone, lastTimes = [] }: ReadingsGridProps) {
  const router = useRouter();
  const columns = entryColumns(pressureUnit, withChemistry);
  const [notice, setNotice] = useState<{ ok: boolean; text: string } | null>(null);
  const [triedToSave, setTriedToSave] = useState(false);
  const firstRow = () => blankRow(carryOver, nextReadingTime(lastTimes) ?? nowToTheMinute());
  const form = useForm<FormInput, unknown, FormOutput>({ resolver, defaultValues: { runId, pressureUnit, readings: [firstRow()] } });
  const { register, handleSubmit, formState, control, getValues, reset } = form;
  const rows = useFieldArray({ control, name: "readings" });
  const watched = (useWatch({ control, name: "readings" }) ?? []) as Row[];
  const filled = withoutTrailingBlankRows(watched).length;
  const tableRef = useRef<HTMLTableElement>(null);
  const pendingFocus = useRef<[number, number] | null>(null);

  const focusCell = (row: number, col: number) => {
    const input = tableRef.current?.querySelector<HTMLInputElement>(`input[data-row="${row}"][data-col="${col}"]`);
    input?.focus();
    if (input?.type === "text") input.select();
  };
  useEffect(() => {
    if (!pendingFocus.current) return;
    focusCell(...pendingFocus.current);
    pendingFocus.current = null;
  });

  /** The time before row `index`: the row above, or the last saved reading for the first row. */
  const timeAbove = (index: number): Date | null => {
    const text = index > 0 ? (watched[index - 1]?.takenAt ?? "") : (lastTimes.at(-1) ?? "");
    return /Z$/.test(text) ? new Date(text) : null;
  };

  const addRow = () => {
    const all = getValues("readings") as Row[];
    const times = [...lastTimes, ...all.map((r) => r.takenAt)].filter((t) => /Z$/.test(t));
    rows.append(blankRow(all.at(-1) ?? carryOver, nextReadingTime(times) ?? nowToTheMinute()));
    pendingFocus.current = [all.length, 0];
  };

  const onSubmit = handleSubmit(
    async (values) => {
      setNotice(null);
      const result = await recordReadingsAction(values);
      if (!result.ok) {
        setTriedToSave(true);
        setNotice({ ok: false, text: result.message });
        applyServerErrors(form, result.fieldErrors);
        return;
      }
      setTriedToSave(false);
      const saved = getValues("readings") as Row[];
      const last = saved.at(-1);
      const times = [...lastTimes, ...saved.map((r) => r.takenAt)].filter((t) => /Z$/.test(t));
      reset({ runId, pressureUnit, readings: [blankRow(last ?? carryOver, nextReadingTime(times) ?? nowToTheMinute())] });
      setNotice({ ok: true, text: `${result.data.saved} reading${result.data.saved === 1 ? "" : "s"} saved.` });
      router.refresh();
    },
    (errors) => {
      setTriedToSave(true);
      const count = problemsOf(errors, columns, watched.length).length;
      const whole = errors.readings?.message ?? errors.readings?.root?.message;
      setNotice({ ok: false, text: count ? `Nothing was saved: ${count} cell${count === 1 ? " needs" : "s need"} attention; the list above the grid links to each.` : `Nothing was saved: ${whole ?? "check the rows."}` });
    },
  );

  const onKeyDown = (e: React.KeyboardEvent<HTMLFormElement>) => {
    if (e.key !== "Enter") return;
    if (e.ctrlKey || e.metaKey) {
      e.preventDefault();
      return void onSubmit();
    }
    const target = e.target as HTMLInputElement;
    const row = Number(target.dataset.row);
    const col = Number(target.dataset.col);
    if (!target.dataset.row || !Number.isInteger(row) || !Number.isInteger(col)) return;
    e.preventDefault();
    if (e.shiftKey) return col > 0 ? focusCell(row, col - 1) : focusCell(row - 1, columns.length - 1);
    if (col < columns.length - 1) focusCell(row, col + 1);
    else if (row < rows.fields.length - 1) focusCell(row + 1, 0);
    else addRow();
  };

  // Tab lands in a cell with its text selected too (Enter does it in focusCell), so typing replaces a carried-over value.
  const onFocus = (e: React.FocusEvent<HTMLTableElement>) => {
    const target = e.target;
    if (target instanceof HTMLInputElement && target.dataset.row && target.type === "text") target.select();
  };

  const problems = triedToSave ? problemsOf(formState.errors, columns, rows.fields.length) : [];
  const listMessage = formState.errors.readings?.message ?? formState.errors.readings?.root?.message ?? null;
  return (
    <form onSubmit={onSubmit} onKeyDown={onKeyDown} noValidate aria-label="Enter readings">
      {/* Present from the start, so that what is put in it later is announced. */}
      <div aria-live="polite" aria-atomic="true" data-testid="readings-announcer">
        {notice && <div className={`notice ${notice.ok ? "notice-ok" : "notice-error"}`} role="status">{notice.text}</div>}
      </div>
      {listMessage && <p className="field-error">{listMessage}</p>}
      {problems.length > 0 && (
        <nav className={`notice notice-error ${styles.summary}`} aria-label="Cells to correct" data-testid="readings-problems">
          <p>{problems.length === 1 ? "One cell needs" : `${problems.length} cells need`} attention before anything is saved:</p>
          <ul>
            {problems.map((p) => (
              <li key={p.id}>
                <a href={`#${p.id}`} onClick={(e) => { e.preventDefault(); focusCell(p.row, p.col); }}>{/^Row \d+/.test(p.message) ? p.message : `Row ${p.row + 1}, ${p.title}: ${p.message}`}</a>
              </li>
            ))}
          </ul>
        </nav>
      )}
      <ScrollArea label="Readings to enter">
        <table className={`list wrap-heads ${styles.grid}`} data-testid="readings-grid" ref={tableRef} onFocus={onFocus}>
          <thead><tr><th>#</th>{columns.map((c) => <th key={c.key}>{c.title}</th>)}<th><span className="visually-hidden">Remove and problems</span></th></tr></thead>
          <tbody>
            {rows.fields.map((field, index) => {
              const errors = formState.errors.readings?.[index] as Record<string, { message?: string } | undefined> | undefined;
              const messages = errors ? columns.flatMap((c) => (errors[c.key]?.message ? [{ key: c.key, text: errors[c.key]!.message! }] : [])) : [];
              return (
                <tr key={field.id} className={messages.length ? styles.badRow : undefined} data-row={index + 1}>
                  <td>{index + 1}</td>
                  {columns.map((c, col) => {
                    const error = errors?.[c.key]?.message;
                    const id = cellId(index, c.key);
                    const cell = { id, "aria-invalid": error ? true : undefined, "aria-describedby": error ? `${id}-error` : undefined, "data-row": index, "data-col": col, autoComplete: "off" };
                    const label = `Row ${index + 1} ${c.title}`;
                    return (
                      <td key={c.key}>
                        {c.kind === "time" ? (
                          <Controller
                            control={control}
                            name={`readings.${index}.takenAt` as Path<FormInput>}
                            render={({ field: f }) => <TimeCell {...cell} label={label} value={String(f.value ?? "")} onChange={f.onChange} onBlur={f.onBlur} inputRef={f.ref} zone={zone} after={timeAbove(index)} />}
                          />
                        ) : (
                          <input {...register(`readings.${index}.${c.key}` as Path<FormInput>)} aria-label={label} type={c.kind === "check" ? "checkbox" : "text"} inputMode={c.kind === "number" ? "decimal" : undefined} {...cell} />
                        )}
                      </td>
                    );
                  })}
                  <td>
                    {rows.fields.length > 1 && <button type="button" className="button button-quiet" onClick={() => rows.remove(index)} aria-label={`Remove row ${index + 1}`}>×</button>}
                    {messages.length > 0 && (
                      <div className={`field-error ${styles.rowMessages}`} data-testid={`reading-row-${index + 1}-errors`}>
                        {messages.map((m) => <div key={m.key} id={`${cellId(index, m.key)}-error`}>{m.text}</div>)}
                      </div>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollArea>
      <div className={styles.actions}>
        <button className="button" type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? "Saving…" : `Save ${filled} reading${filled === 1 ? "" : "s"}`}</button>
        <button type="button" className="button button-quiet" onClick={addRow}>Add a row</button>
        <span className="muted">Type a time as 14:30 or 2026-11-30 14:30 (the lab&apos;s clock). Enter moves to the next cell and, on the last cell, adds a row; Tab moves on without adding one; Ctrl+Enter saves; a last row left blank is not saved. Nothing is saved unless every row is valid.</span>
      </div>
    </form>
  );
}

type Problem = { id: string; row: number; col: number; title: string; message: string };

/** Every refused cell, in reading order, for the summary. */
function problemsOf(errors: FieldErrors<FormInput>, columns: EntryColumn[], rowCount: number): Problem[] {
  const out: Problem[] = [];
  for (let row = 0; row < rowCount; row++) {
    const rowErrors = errors.readings?.[row] as Record<string, { message?: string } | undefined> | undefined;
    columns.forEach((c, col) => {
      const message = rowErrors?.[c.key]?.message;
      if (message) out.push({ id: cellId(row, c.key), row, col, title: c.title, message });
    });
  }
  return out;
}

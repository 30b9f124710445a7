"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { usePathname, useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { useForm } from "react-hook-form";
import { Field } from "@/components/ui/field";
import { AUDIT_PAGE_SIZES, auditFilterSchema, auditSearch, type AuditFilter, type AuditFilterInput, type AuditFilterText } from "@/lib/validation/audit";
import styles from "./audit.module.css";

type Props = {
  /** The filter as the address has it. */
  values: AuditFilterText;
  pageSize: number;
  /** Messages from the server for the filter as it stands (an unknown lab number, for one). */
  serverErrors: Record<string, string>;
  tables: { slug: string; plural: string }[];
  people: { id: string; label: string }[];
};

/**
 * The audit trail's filter: checked here with the shared schema (an end date before the start is refused
 * before anything is asked), then put in the address, so the server renders the page and the address can
 * be kept or sent to someone.
 */
export function AuditFilterForm({ values, pageSize, serverErrors, tables, people }: Props) {
  const router = useRouter();
  const pathname = usePathname();
  const [pending, startTransition] = useTransition();
  // How many rows a page shows is not part of the filter (the export takes every row), so it lives beside it.
  const [size, setSize] = useState(pageSize);
  const empty = { record: "", table: "", person: "", from: "", to: "" };
  const form = useForm<AuditFilterInput, unknown, AuditFilter>({ resolver: zodResolver(auditFilterSchema), defaultValues: { ...empty, ...values } });
  const { register, handleSubmit, formState, reset, getValues } = form;
  const error = (key: keyof AuditFilterText) => formState.errors[key]?.message ?? (formState.isSubmitted ? undefined : serverErrors[key]);
  const go = (filter: AuditFilterText) => startTransition(() => router.push(`${pathname}${auditSearch(filter, { pageSize: size })}`));

  return (
    <form
      className={styles.filters}
      role="search"
      aria-label="Filter the audit trail"
      aria-busy={pending}
      noValidate
      onSubmit={handleSubmit((filter) => {
        // The address holds the filter as checked: the lab number in capitals, days as YYYY-MM-DD.
        const day = (d: Date | undefined) => d?.toISOString().slice(0, 10);
        reset(getValues(), { keepValues: true });
        go({ record: filter.record, table: filter.table, person: filter.person, from: day(filter.from), to: day(filter.to) });
      })}
    >
      <Field label="Lab number" hint="The record and its parts: a run's stages and readings, a roll's custody events." error={error("record")}>
        <input {...register("record")} placeholder="T26-00004" autoComplete="off" spellCheck={false} />
      </Field>
      <Field label="Kind of record" error={error("table")}>
        <select {...register("table")}>
          <option value="">Any kind</option>
          {tables.map((t) => <option key={t.slug} value={t.slug}>{t.plural}</option>)}
        </select>
      </Field>
      <Field label="Person" error={error("person")}>
        <select {...register("person")}>
          <option value="">Anyone</option>
          {people.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}
        </select>
      </Field>
      <Field label="From (UTC day)" error={error("from")}>
        <input type="date" {...register("from")} />
      </Field>
      <Field label="To (UTC day)" error={error("to")}>
        <input type="date" {...register("to")} />
      </Field>
      <div className="field">
        <label htmlFor="audit-page-size">Rows a page</label>
        <select id="audit-page-size" value={size} onChange={(e) => setSize(Number(e.target.value))}>
          {AUDIT_PAGE_SIZES.map((n) => <option key={n} value={n}>{n}</option>)}
        </select>
      </div>
      <div className={styles.buttons}>
        <button type="submit" className="button">Show</button>
        <button
          type="button"
          className="button button-quiet"
          onClick={() => {
            reset(empty);
            go({});
          }}
        >
          Clear
        </button>
      </div>
    </form>
  );
}

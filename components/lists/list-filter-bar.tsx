"use client";

import { usePathname, useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { ITEM_STATE_LABELS } from "@/lib/format/states";
import { ITEM_STATES } from "@/lib/validation/list-query";
import styles from "./lists.module.css";
import { SearchableChoice, type Choice } from "./searchable-choice";

export type FilterValues = { clientOrganizationId?: string; projectId?: string; state?: string; acknowledged?: string; from?: string; to?: string; q?: string };

type Props = {
  /** The filters as the address has them now (strings as typed), plus the list's sort and page size. */
  values: FilterValues;
  keep: Record<string, string>;
  /** The client and project the list is filtered by now (searchable fields: no page carries every project). */
  client: Choice | null;
  project: Choice | null;
  show: "state" | "acknowledged";
  dateLabel: string;
  searchHint: string;
};

/**
 * Client, project, state and date filters and the search box of a list. Each change replaces the address
 * (back to page 1), so the server renders the filtered page and the address can be shared or bookmarked.
 */
export function ListFilterBar({ values, keep, client, project, show, dateLabel, searchHint }: Props) {
  const router = useRouter();
  const pathname = usePathname();
  const [pending, startTransition] = useTransition();
  const [q, setQ] = useState(values.q ?? "");

  const go = (changes: FilterValues) => {
    const next = { ...values, ...changes };
    const params = new URLSearchParams(keep);
    for (const [key, value] of Object.entries(next)) if (value) params.set(key, value);
    const search = params.toString();
    startTransition(() => router.replace(search ? `${pathname}?${search}` : pathname));
  };
  const any = Object.values(values).some(Boolean);

  return (
    <form
      className={styles.filters}
      role="search"
      aria-label="Filter the list"
      aria-busy={pending}
      onSubmit={(event) => {
        event.preventDefault();
        go({ q: q.trim() });
      }}
    >
      <SearchableChoice key={`client-${client?.id ?? ""}`} id="filter-client" label="Client" kind="clients" allLabel="All clients" value={client} onChange={(c) => go({ clientOrganizationId: c?.id ?? "", projectId: "" })} />
      <SearchableChoice
        key={`project-${values.clientOrganizationId ?? ""}-${project?.id ?? ""}`}
        id="filter-project" label="Project" kind="projects" allLabel="All projects" value={project}
        {...(values.clientOrganizationId && { clientOrganizationId: values.clientOrganizationId })}
        onChange={(p) => go({ projectId: p?.id ?? "" })}
      />
      {show === "state" ? (
        <div className="field">
          <label htmlFor="filter-state">State</label>
          <select id="filter-state" value={values.state ?? ""} onChange={(e) => go({ state: e.target.value })}>
            <option value="">Any state</option>
            {ITEM_STATES.map((s) => <option key={s} value={s}>{ITEM_STATE_LABELS[s] ?? s}</option>)}
          </select>
        </div>
      ) : (
        <div className="field">
          <label htmlFor="filter-ack">Receipt</label>
          <select id="filter-ack" value={values.acknowledged ?? ""} onChange={(e) => go({ acknowledged: e.target.value })}>
            <option value="">Any</option>
            <option value="no">To acknowledge</option>
            <option value="yes">Acknowledged</option>
          </select>
        </div>
      )}
      <div className="field">
        <label htmlFor="filter-from">{dateLabel} from</label>
        <input id="filter-from" type="date" value={values.from ?? ""} onChange={(e) => go({ from: e.target.value })} />
      </div>
      <div className="field">
        <label htmlFor="filter-to">{dateLabel} to</label>
        <input id="filter-to" type="date" value={values.to ?? ""} onChange={(e) => go({ to: e.target.value })} />
      </div>
      <div className="field">
        <label htmlFor="filter-q">Lab or roll number</label>
        <input id="filter-q" type="search" value={q} placeholder={searchHint} onChange={(e) => setQ(e.target.value)} onBlur={() => q.trim() !== (values.q ?? "") && go({ q: q.trim() })} />
      </div>
      <button type="submit" className="button button-quiet">Search</button>
      {any && (
        <button
          type="button"
          className={`button button-quiet ${styles.reset}`}
          onClick={() => {
            setQ("");
            go({ clientOrganizationId: "", projectId: "", state: "", acknowledged: "", from: "", to: "", q: "" });
          }}
        >
          Clear filters
        </button>
      )}
    </form>
  );
}

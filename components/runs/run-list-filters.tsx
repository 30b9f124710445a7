import Link from "next/link";
import { RUN_STATE_LABELS } from "@/lib/format/states";
import { RUN_STATES } from "@/lib/validation/list-query";
import styles from "@/components/lists/lists.module.css";
import { SearchableChoice, type Choice } from "@/components/lists/searchable-choice";

type Choices = {
  cells: { id: string; assetTag: string }[];
  technicians: { id: string; name: string }[];
  methods: string[];
};

/**
 * The runs list's filters as a plain GET form: the server reads the address and renders the page, so the
 * short choices (cells, technicians, methods) are sent once, as HTML; the client is a field that searches on the
 * server. Sort and page size ride along.
 */
export function RunListFilters({ values, keep, choices, client, basePath }: { values: Record<string, string | undefined>; keep: Record<string, string>; choices: Choices; client: Choice | null; basePath: string }) {
  const any = Object.values(values).some(Boolean);
  return (
    <form className={styles.filters} role="search" method="get" action={basePath} data-testid="run-filters">
      {Object.entries(keep).map(([key, value]) => <input key={key} type="hidden" name={key} value={value} />)}
      <div className="field">
        <label htmlFor="run-filter-state">State</label>
        <select id="run-filter-state" name="state" defaultValue={values.state ?? ""}>
          <option value="">Any state</option>
          {RUN_STATES.map((s) => <option key={s} value={s}>{RUN_STATE_LABELS[s] ?? s}</option>)}
        </select>
      </div>
      <div className="field">
        <label htmlFor="run-filter-cell">Cell</label>
        <select id="run-filter-cell" name="cellId" defaultValue={values.cellId ?? ""}>
          <option value="">Any cell</option>
          {choices.cells.map((c) => <option key={c.id} value={c.id}>{c.assetTag}</option>)}
        </select>
      </div>
      <div className="field">
        <label htmlFor="run-filter-technician">Technician</label>
        <select id="run-filter-technician" name="technicianId" defaultValue={values.technicianId ?? ""}>
          <option value="">Anyone</option>
          {choices.technicians.map((t) => <option key={t.id} value={t.id}>{t.name}</option>)}
        </select>
      </div>
      <div className="field">
        <label htmlFor="run-filter-method">Method</label>
        <select id="run-filter-method" name="methodCode" defaultValue={values.methodCode ?? ""}>
          <option value="">Any method</option>
          {choices.methods.map((m) => <option key={m} value={m}>ASTM {m}</option>)}
        </select>
      </div>
      <SearchableChoice id="run-filter-client" name="clientOrganizationId" label="Client" kind="clients" allLabel="All clients" value={client} />
      <div className="field">
        <label htmlFor="run-filter-from">Mounted from</label>
        <input id="run-filter-from" name="from" type="date" defaultValue={values.from ?? ""} />
      </div>
      <div className="field">
        <label htmlFor="run-filter-to">Mounted to</label>
        <input id="run-filter-to" name="to" type="date" defaultValue={values.to ?? ""} />
      </div>
      <div className="field">
        <label htmlFor="run-filter-q">Run or specimen number</label>
        <input id="run-filter-q" name="q" type="search" defaultValue={values.q ?? ""} placeholder="T26-00042 or P26-00107" />
      </div>
      <button type="submit" className="button button-quiet">Show runs</button>
      {any && <Link className={`button button-quiet ${styles.reset}`} href={basePath}>Clear filters</Link>}
    </form>
  );
}

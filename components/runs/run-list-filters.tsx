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
      <FilterSelect id="run-filter-state" name="state" label="State" anyLabel="Any state" value={values.state} options={RUN_STATES.map((s) => [s, RUN_STATE_LABELS[s] ?? s])} />
      <FilterSelect id="run-filter-cell" name="cellId" label="Cell" anyLabel="Any cell" value={values.cellId} options={choices.cells.map((c) => [c.id, c.assetTag])} />
      <FilterSelect id="run-filter-technician" name="technicianId" label="Technician" anyLabel="Anyone" value={values.technicianId} options={choices.technicians.map((t) => [t.id, t.name])} />
      <FilterSelect id="run-filter-method" name="methodCode" label="Method" anyLabel="Any method" value={values.methodCode} options={choices.methods.map((m) => [m, `ASTM ${m}`])} />
      <SearchableChoice id="run-filter-client" name="clientOrganizationId" label="Client" kind="clients" allLabel="All clients" value={client} />
      <DateFilter id="run-filter-from" name="from" label="Mounted from" value={values.from} />
      <DateFilter id="run-filter-to" name="to" label="Mounted to" value={values.to} />
      <div className="field">
        <label htmlFor="run-filter-q">Run or specimen number</label>
        <input id="run-filter-q" name="q" type="search" defaultValue={values.q ?? ""} placeholder="T26-00042 or P26-00107" />
      </div>
      <button type="submit" className="button button-quiet">Show runs</button>
      {any && <Link className={`button button-quiet ${styles.reset}`} href={basePath}>Clear filters</Link>}
    </form>
  );
}

/** One choice of the filter form: "any" first, then the options as [value, label]. */
function FilterSelect({ id, name, label, anyLabel, value, options }: { id: string; name: string; label: string; anyLabel: string; value: string | undefined; options: ReadonlyArray<readonly [string, string]> }) {
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <select id={id} name={name} defaultValue={value ?? ""}>
        <option value="">{anyLabel}</option>
        {options.map(([v, text]) => <option key={v} value={v}>{text}</option>)}
      </select>
    </div>
  );
}

function DateFilter({ id, name, label, value }: { id: string; name: string; label: string; value: string | undefined }) {
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <input id={id} name={name} type="date" defaultValue={value ?? ""} />
    </div>
  );
}

import { AuditFilterForm } from "@/components/audit/audit-filter-form";
import { AuditPager } from "@/components/audit/audit-pager";
import { AuditTable } from "@/components/audit/audit-table";
import styles from "@/components/audit/audit.module.css";
import { AUDIT_TABLE_CHOICES } from "@/lib/audit/audit-tables";
import { isAppError } from "@/lib/errors/app-error";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { findAuditEntries, type AuditEntryPage } from "@/lib/server/audit/find-audit-entries";
import { listAuditPeople } from "@/lib/server/audit/list-audit-people";
import { AUDIT_PAGE_SIZE, auditSearch, readAuditFilterText, readAuditPaging } from "@/lib/validation/audit";
import { ScrollArea } from "@/components/ui/scroll-area";

export const metadata = { title: "Audit trail" };

type SearchParams = Record<string, string | string[] | undefined>;

export default async function AuditPage({ searchParams }: { searchParams: Promise<SearchParams> }) {
  const actor = await requirePageUser("audit.view");
  const raw = await searchParams;
  const filter = readAuditFilterText(raw);
  const paging = readAuditPaging(raw);
  const pageSize = paging.pageSize ?? AUDIT_PAGE_SIZE;
  const people = await listAuditPeople({ actor });
  // A refused filter shows its sentence and no rows: nothing else is searched.
  let page: AuditEntryPage | null = null;
  let refusal: { message: string; fieldErrors: Record<string, string> } | null = null;
  try {
    page = await findAuditEntries({ actor, input: { ...filter, ...paging } });
  } catch (error) {
    if (!isAppError(error) || error.code !== "INVALID_INPUT") throw error;
    const messages = [...new Set(Object.values(error.fieldErrors))];
    refusal = { message: messages.length ? messages.join(" ") : error.message, fieldErrors: error.fieldErrors };
  }
  const filtered = Object.keys(filter).length > 0;
  return (
    <>
      <h1>Audit trail</h1>
      <p className="muted">
        Every change to the laboratory's records, written by the database itself as it happens; these rows cannot be changed or removed.
        Values are shown in words and in your units; times are UTC.
      </p>
      <AuditFilterForm values={filter} pageSize={pageSize} serverErrors={refusal?.fieldErrors ?? {}} tables={AUDIT_TABLE_CHOICES} people={people} />
      {refusal && <div className="notice notice-error" role="alert" data-testid="audit-refusal">{refusal.message}</div>}
      {page && (
        <section className="card" data-testid="audit-list">
          <div className={styles.head}>
            <h2>{filtered ? "Changes that match" : "All changes"} <span className="count">{page.entries.length === 0 ? "none" : `${page.entries.length} on this page`}</span></h2>
            {page.entries.length > 0 && <a className="button button-quiet" href={`/api/audit/export${auditSearch(filter)}`} download data-testid="audit-csv">Download all that match (CSV)</a>}
            {page.entries.length > 0 && <a className="button button-quiet" href={`/api/audit/export/xlsx${auditSearch(filter)}`} download data-testid="audit-xlsx">(XLSX)</a>}
          </div>
          {page.entries.length === 0 ? <p className="empty">No change matches this filter.</p> : <ScrollArea><AuditTable entries={page.entries} /></ScrollArea>}
          <AuditPager filter={filter} pageSize={pageSize} newer={page.newer} older={page.older} paged={Boolean(paging.before || paging.after)} />
        </section>
      )}
    </>
  );
}

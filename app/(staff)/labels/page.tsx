import { LabelSheet } from "@/components/labels/label-sheet";
import styles from "@/components/labels/label-sheet.module.css";
import { PrintButton } from "@/components/labels/print-button";
import { requirePageUser } from "@/lib/server/auth/require-page-user";
import { getLetterhead } from "@/lib/server/lab/get-letterhead";
import { getPrintableLabels } from "@/lib/server/labels/get-printable-labels";

export const metadata = { title: "Labels" };

// /labels?numbers=R26-00001,R26-00002: the print sheet for those rolls, coupons or specimens.
export default async function LabelsPage({ searchParams }: { searchParams: Promise<{ numbers?: string | string[] }> }) {
  const actor = await requirePageUser("sample.view");
  const asked = [(await searchParams).numbers ?? []].flat();
  const [{ labels, unknown }, lab] = await Promise.all([getPrintableLabels({ actor, labNumbers: asked }), getLetterhead()]);
  const pdfHref = `/api/labels?numbers=${encodeURIComponent(labels.map((l) => l.labNumber).join(","))}`;
  return (
    <>
      <div className={styles.toolbar}>
        <h1 style={{ flexBasis: "100%" }}>Labels</h1>
        <form method="get" className="inline-form">
          <input name="numbers" defaultValue={asked.join(", ")} placeholder="R26-00001, C26-00002, ..." aria-label="Lab numbers" style={{ width: "24rem" }} />
          <button type="submit" className="button button-quiet">Show</button>
        </form>
        {labels.length > 0 ? <><PrintButton label={`Print ${labels.length} label${labels.length === 1 ? "" : "s"}`} /><a className="button button-quiet" href={pdfHref}>PDF</a></> : null}
        {unknown.length > 0 ? <div className="notice notice-caution" style={{ flexBasis: "100%" }} data-testid="unknown-numbers">Not a roll, coupon or specimen on record, so no label: {unknown.join(", ")}</div> : null}
        {labels.length === 0 ? <p className="muted" style={{ flexBasis: "100%" }}>Type or scan lab numbers of rolls, coupons or specimens; 21 labels print on each A4 sheet (63.5 × 38.1 mm).</p> : null}
      </div>
      {labels.length > 0 ? <div className={styles.preview}><LabelSheet labels={labels} labName={lab.name} /></div> : null}
    </>
  );
}

import type { PrintableLabel } from "@/lib/server/labels/get-printable-labels";
import { DocumentFrame } from "../documents/document-frame";
import { LabelSheet } from "./label-sheet";

/** The label sheets as a whole HTML page, for printing to PDF. */
export function LabelSheetDocument({ labels, labName }: { labels: PrintableLabel[]; labName: string }) {
  return (
    <DocumentFrame title={`Labels · ${labName}`}>
      <LabelSheet labels={labels} labName={labName} />
    </DocumentFrame>
  );
}

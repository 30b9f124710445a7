import { formatDateTime } from "./dates";

/** The receipt's correctable fields as a person reads them. */
export const RECEIPT_FIELD_LABELS: Record<string, string> = {
  deliveredBy: "Delivered by", receivedAt: "Received at", conditionNotes: "Condition on arrival",
  rollNumber: "Roll number", lotNumber: "Lot number", product: "Product", manufacturer: "Manufacturer",
  sampleLengthMm: "Sample length (mm)", sampleWidthMm: "Sample width (mm)", machineDirectionMarked: "Machine direction marked",
  deliveredLengthM: "Delivered roll length (m)", deliveredWidthM: "Delivered roll width (m)",
};

/** A corrected value as stored (text) for print: times in the lab's zone, yes/no for flags, "—" for blank. */
export function receiptFieldValue(field: string, value: string, zone: string): string {
  if (value === "") return "—";
  if (field === "receivedAt") {
    const date = new Date(value);
    return Number.isNaN(date.getTime()) ? value : formatDateTime(date, zone);
  }
  if (field === "machineDirectionMarked") return value === "true" ? "yes" : value === "false" ? "no" : value;
  return value;
}

import { parseLabNumber, type LabNumberKind } from "./lab-number";

const ADDRESS: Record<LabNumberKind, string> = {
  shipment: "/intake/shipments/", roll: "/samples/rolls/", coupon: "/samples/coupons/", specimen: "/samples/specimens/", run: "/runs/", certificate: "/certificates/",
};

/** The page of the item a lab number names (R26-00042 -> /samples/rolls/R26-00042), or null when it is not one. */
export function labNumberAddress(text: string): string | null {
  const parsed = parseLabNumber(text);
  return parsed ? `${ADDRESS[parsed.kind]}${text.trim().toUpperCase()}` : null;
}

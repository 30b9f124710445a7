import "server-only";
import type { CurrentUser } from "../auth/current-user";
import { findLabelItems, type LabelItem } from "../samples/find-label-items";
import { qrCodeSvg } from "./qr-code-svg";

export type PrintableLabel = LabelItem & { qrSvg: string };

/** The labels to print for the lab numbers asked (needs sample.view), each with its QR code as SVG. */
export async function getPrintableLabels(options: { actor: CurrentUser; labNumbers: readonly string[] }): Promise<{ labels: PrintableLabel[]; unknown: string[] }> {
  const { items, unknown } = await findLabelItems(options);
  const labels = await Promise.all(items.map(async (item) => ({ ...item, qrSvg: await qrCodeSvg(item.labNumber) })));
  return { labels, unknown };
}

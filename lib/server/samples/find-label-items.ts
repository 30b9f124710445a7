import "server-only";
import { AppError } from "@/lib/errors/app-error";
import { MAX_LABELS, parseLabelNumbers, type LabelKind } from "@/lib/labels/parse-label-numbers";
import type { CurrentUser } from "../auth/current-user";
import { requirePermission } from "../auth/require-permission";
import { getDb } from "../db/client";

export type LabelItem = { kind: LabelKind; labNumber: string; description: string };

/**
 * The rolls, coupons and specimens to print labels for, in the order asked, each with a one-line
 * description. Numbers that are not such an item, or not found, come back in `unknown`, not as an error.
 */
export async function findLabelItems(options: { actor: CurrentUser; labNumbers: readonly string[] }): Promise<{ items: LabelItem[]; unknown: string[] }> {
  requirePermission(options.actor, "sample.view");
  const { numbers, rejected } = parseLabelNumbers(options.labNumbers);
  if (numbers.length > MAX_LABELS)
    throw new AppError("INVALID_INPUT", `At most ${MAX_LABELS} labels at a time; ${numbers.length} were asked for.`, { fieldErrors: { numbers: `At most ${MAX_LABELS}.` } });
  const wanted = (kind: LabelKind) => numbers.filter((n) => n.kind === kind).map((n) => n.labNumber);

  const db = getDb();
  const [rolls, coupons, specimens] = await Promise.all([
    db.roll.findMany({
      where: { labNumber: { in: wanted("roll") } },
      select: { labNumber: true, rollNumber: true, lotNumber: true, project: { select: { code: true, clientOrganization: { select: { code: true } } } } },
    }),
    db.coupon.findMany({ where: { labNumber: { in: wanted("coupon") } }, select: { labNumber: true, positionInSample: true, roll: { select: { labNumber: true } } } }),
    db.specimen.findMany({ where: { labNumber: { in: wanted("specimen") } }, select: { labNumber: true, intendedMethodCode: true, coupon: { select: { labNumber: true } } } }),
  ]);

  const found = new Map<string, LabelItem>();
  for (const r of rolls)
    found.set(r.labNumber, { kind: "roll", labNumber: r.labNumber, description: `${r.project.clientOrganization.code} · ${r.project.code} · roll ${r.rollNumber} · lot ${r.lotNumber}` });
  for (const c of coupons) found.set(c.labNumber, { kind: "coupon", labNumber: c.labNumber, description: `from roll ${c.roll.labNumber} · ${c.positionInSample}` });
  for (const s of specimens) found.set(s.labNumber, { kind: "specimen", labNumber: s.labNumber, description: `from coupon ${s.coupon.labNumber} · ${s.intendedMethodCode}` });

  const items: LabelItem[] = [];
  const unknown = [...rejected];
  for (const { labNumber } of numbers) {
    const item = found.get(labNumber);
    if (item) items.push(item);
    else unknown.push(labNumber);
  }
  return { items, unknown };
}

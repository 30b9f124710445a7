import "server-only";
import { formatDateTime } from "@/lib/format/dates";
import { calibrationsDueNotice } from "@/lib/notices/notice-texts";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";
import { readLabTimeZone } from "../lab/read-lab-time-zone";
import { publicBaseUrl } from "../public-address";
import { readMailConfig } from "./mail-config";
import { sendNotice, type NoticeOutcome } from "./send-notice";

const DAY_MS = 86_400_000;

/**
 * Tells the lab's administrators which instruments in service have their latest calibration due within the
 * configured number of days (SEEPLINE_CALIBRATION_NOTICE_DAYS, 14 unless set), or already overdue. Each
 * calibration is reported once (the notice's key names them), so a daily check or a restart repeats nothing.
 */
export async function notifyCalibrationsDue(options: { now?: Date; withinDays?: number } = {}): Promise<{ outcome: NoticeOutcome | "nothing-due"; due: number }> {
  const now = options.now ?? new Date();
  const withinDays = options.withinDays ?? readMailConfig().calibrationNoticeDays;
  const db = getDb();
  const equipment = await db.equipment.findMany({
    where: { status: "IN_SERVICE" },
    select: { assetTag: true, name: true, calibrations: { orderBy: [{ calibratedAt: "desc" }, { createdAt: "desc" }], take: 1, select: { id: true, reference: true, dueAt: true } } },
  });
  const horizon = now.getTime() + withinDays * DAY_MS;
  const due = equipment
    .flatMap((e) => e.calibrations.map((c) => ({ ...c, assetTag: e.assetTag, name: e.name })))
    .filter((c) => c.dueAt.getTime() <= horizon)
    .sort((a, b) => a.dueAt.getTime() - b.dueAt.getTime() || a.assetTag.localeCompare(b.assetTag));
  if (!due.length) return { outcome: "nothing-due", due: 0 };
  // Only calibrations not reported before: one notice names them all, keyed by their ids.
  const told = new Set((await db.noticeDelivery.findMany({ where: { kind: "calibration-due", key: { in: due.map((c) => `calibration-due:${c.id}`) } }, select: { key: true } })).map((n) => n.key));
  const fresh = due.filter((c) => !told.has(`calibration-due:${c.id}`));
  if (!fresh.length) return { outcome: "already-sent", due: due.length };
  const [lab, zone, admins] = await Promise.all([
    db.laboratory.findUnique({ where: { id: "lab" }, select: { name: true } }),
    readLabTimeZone(db),
    db.user.findMany({ where: { role: "LAB_ADMIN", active: true }, select: { email: true } }),
  ]);
  const text = calibrationsDueNotice({
    labName: lab?.name ?? "the laboratory",
    withinDays,
    due: fresh.map((c) => ({ assetTag: c.assetTag, equipmentName: c.name, reference: c.reference, dueAtText: formatDateTime(c.dueAt, zone), overdue: c.dueAt.getTime() < now.getTime() })),
    equipmentUrl: `${publicBaseUrl()}/equipment`,
  });
  // The first calibration's key stands for the notice; the others are marked told by rows of their own.
  const outcome = await sendNotice({ ...text, key: `calibration-due:${fresh[0]!.id}`, kind: "calibration-due", to: admins.map((a) => a.email) });
  if (outcome === "sent" || outcome === "logged") {
    for (const c of fresh.slice(1))
      await sendMarker(`calibration-due:${c.id}`, text.subject, admins.map((a) => a.email));
  }
  return { outcome, due: fresh.length };
}

/** Marks a calibration as told (it was in the notice just sent) without sending anything more. */
async function sendMarker(key: string, subject: string, recipients: string[]) {
  await withActor({ id: "system:notices" }, (tx) =>
    tx.$executeRaw`INSERT INTO "NoticeDelivery" ("id", "key", "kind", "recipients", "subject", "transport", "deliveredAt")
      VALUES (gen_random_uuid()::text, ${key}, 'calibration-due', ${recipients}, ${subject}, 'with another notice', (CURRENT_TIMESTAMP AT TIME ZONE 'UTC'))
      ON CONFLICT ("key") DO NOTHING`,
  );
}

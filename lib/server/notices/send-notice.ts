import "server-only";
import nodemailer from "nodemailer";
import type { NoticeText } from "@/lib/notices/notice-texts";
import { getDb } from "../db/client";
import { withActor } from "../db/transaction";
import { readMailConfig } from "./mail-config";

/** The audit actor of notices the app sends by itself. */
const NOTICES = { id: "system:notices" };

export type NoticeOutcome = "sent" | "logged" | "already-sent" | "failed" | "no-recipients";

/**
 * Sends one notice once: its key is claimed in NoticeDelivery first (a second instance, a restart or a retry
 * finds it claimed and sends nothing), then it goes to the SMTP server in the settings, or to the log when
 * there is none. A failure is recorded on the row and logged; it never undoes what the notice reports.
 */
export async function sendNotice(notice: NoticeText & { key: string; kind: string; to: string[]; attachments?: Array<{ filename: string; content: Buffer; contentType: string }> }): Promise<NoticeOutcome> {
  const to = [...new Set(notice.to.map((t) => t.trim()).filter(Boolean))];
  if (!to.length) {
    console.info(`[notice] ${notice.kind}: nobody to send “${notice.subject}” to; add a contact with an e-mail address.`);
    return "no-recipients";
  }
  const config = readMailConfig();
  const transport = config.smtp ? "smtp" : "log";
  const claimed = await withActor(NOTICES, async (tx) => {
    const rows = await tx.$queryRaw<Array<{ id: string }>>`
      INSERT INTO "NoticeDelivery" ("id", "key", "kind", "recipients", "subject", "transport")
      VALUES (gen_random_uuid()::text, ${notice.key}, ${notice.kind}, ${to}, ${notice.subject}, ${transport})
      ON CONFLICT ("key") DO NOTHING RETURNING "id"`;
    return rows[0]?.id ?? null;
  });
  if (!claimed) return "already-sent";
  try {
    if (config.smtp) {
      const mailer = nodemailer.createTransport({ ...config.smtp, connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 20_000 });
      await mailer.sendMail({ from: config.from, to, subject: notice.subject, text: notice.text, attachments: notice.attachments });
    } else {
      console.info(`[notice] ${notice.kind} to ${to.join(", ")}: ${notice.subject}\n${notice.text}`);
    }
    await withActor(NOTICES, (tx) => tx.noticeDelivery.update({ where: { id: claimed }, data: { deliveredAt: new Date() } }));
    return config.smtp ? "sent" : "logged";
  } catch (error) {
    const failure = error instanceof Error ? error.message : String(error);
    console.error(`[notice] ${notice.kind} “${notice.subject}” could not be sent: ${failure}`);
    await withActor(NOTICES, (tx) => tx.noticeDelivery.update({ where: { id: claimed }, data: { failure: failure.slice(0, 500) } }), { db: getDb() }).catch(() => undefined);
    return "failed";
  }
}

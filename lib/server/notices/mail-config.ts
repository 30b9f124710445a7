import "server-only";
import { z } from "zod";

const schema = z.object({
  SEEPLINE_SMTP_HOST: z.string().min(1).optional(),
  SEEPLINE_SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(587),
  SEEPLINE_SMTP_SECURE: z.enum(["true", "false"]).default("false"),
  SEEPLINE_SMTP_USER: z.string().optional(),
  SEEPLINE_SMTP_PASSWORD: z.string().optional(),
  SEEPLINE_MAIL_FROM: z.string().min(3).default("Seepline <no-reply@seepline.invalid>"),
  SEEPLINE_CALIBRATION_NOTICE_DAYS: z.coerce.number().int().min(1).max(365).default(14),
});

export type MailConfig = {
  smtp: { host: string; port: number; secure: boolean; auth?: { user: string; pass: string } } | null;
  from: string;
  calibrationNoticeDays: number;
};

/**
 * The e-mail settings from the environment, read at each use (so a changed setting needs no rebuild). Without
 * SEEPLINE_SMTP_HOST there is no server: notices are written to the log instead.
 */
export function readMailConfig(env: NodeJS.ProcessEnv = process.env): MailConfig {
  const parsed = schema.safeParse(env);
  if (!parsed.success) throw new Error(`The e-mail settings are not valid: ${parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}`);
  const c = parsed.data;
  return {
    smtp: c.SEEPLINE_SMTP_HOST
      ? { host: c.SEEPLINE_SMTP_HOST, port: c.SEEPLINE_SMTP_PORT, secure: c.SEEPLINE_SMTP_SECURE === "true", ...(c.SEEPLINE_SMTP_USER ? { auth: { user: c.SEEPLINE_SMTP_USER, pass: c.SEEPLINE_SMTP_PASSWORD ?? "" } } : {}) }
      : null,
    from: c.SEEPLINE_MAIL_FROM,
    calibrationNoticeDays: c.SEEPLINE_CALIBRATION_NOTICE_DAYS,
  };
}

// `DATABASE_URL=... npm run notices:calibrations`: tells the lab's administrators which calibrations fall due
// within SEEPLINE_CALIBRATION_NOTICE_DAYS (14 unless set), by e-mail with SEEPLINE_SMTP_HOST set, otherwise in
// the log. The running app does the same a minute after it starts and daily; a calibration is reported once.
import { randomBytes } from "node:crypto";

async function main() {
  if (!process.env.DATABASE_URL) throw new Error("Set DATABASE_URL to the app's database (the running app checks by itself a minute after it starts and daily).");
  // No session is signed here; the configuration check still asks for a secret.
  process.env.NEXTAUTH_SECRET ||= randomBytes(32).toString("hex");
  const { notifyCalibrationsDue } = await import("../lib/server/notices/notify-calibrations-due");
  const result = await notifyCalibrationsDue();
  console.log(result.due ? `${result.due} calibration(s) due: ${result.outcome}.` : "No calibration falls due.");
}

main().then(
  () => process.exit(0),
  (error) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  },
);

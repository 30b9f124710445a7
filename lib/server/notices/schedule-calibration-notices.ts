import "server-only";
import { notifyCalibrationsDue } from "./notify-calibrations-due";

const DAY_MS = 86_400_000;

/**
 * Checks for calibrations falling due a minute after the server starts and then once a day. Each instance
 * may run it: the notice's key lets only one of them send it. SEEPLINE_CALIBRATION_NOTICES=off switches it off.
 */
export function scheduleCalibrationNotices(): void {
  if (process.env.SEEPLINE_CALIBRATION_NOTICES === "off") return;
  const check = () =>
    notifyCalibrationsDue()
      .then((r) => r.due && console.info(`[notice] calibration check: ${r.due} due, ${r.outcome}`))
      .catch((error) => console.error("[notice] the calibration check failed", error));
  setTimeout(check, 60_000).unref();
  setInterval(check, DAY_MS).unref();
}

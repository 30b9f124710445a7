/** Next.js calls this once when a server starts: the daily check for calibrations falling due begins here. */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { scheduleCalibrationNotices } = await import("./lib/server/notices/schedule-calibration-notices");
  scheduleCalibrationNotices();
}

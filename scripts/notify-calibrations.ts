// `npm run notices:calibrations`: tells the lab's administrators which calibrations fall due within
// SEEPLINE_CALIBRATION_NOTICE_DAYS (14 unless set), by e-mail with SEEPLINE_SMTP_HOST set, otherwise in the log.
// The running app does the same a minute after it starts and daily; a calibration is reported once either way.
import { notifyCalibrationsDue } from "../lib/server/notices/notify-calibrations-due";

notifyCalibrationsDue()
  .then((result) => {
    console.log(result.due ? `${result.due} calibration(s) due: ${result.outcome}.` : "No calibration falls due.");
    process.exit(0);
  })
  .catch((error) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });

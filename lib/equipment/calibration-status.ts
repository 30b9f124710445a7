/**
 * Whether an instrument may be used for a new run: in service, with a passed calibration that is not
 * past its due date. "Due soon" is shown as a warning only. Pure; dates are passed in.
 */
export type CalibrationRecord = { calibratedAt: Date; dueAt: Date; passed: boolean };
export type CalibrationStatus =
  | { usable: true; state: "current" | "due-soon"; dueAt: Date; message: string }
  | { usable: false; state: "never" | "overdue" | "failed" | "out-of-service"; dueAt: Date | null; message: string };

export const DUE_SOON_DAYS = 30;

/** The status from the latest calibration (by date) and the equipment's service status. */
export function calibrationStatus(options: { assetTag: string; inService: boolean; calibrations: CalibrationRecord[]; now: Date }): CalibrationStatus {
  const { assetTag, now } = options;
  if (!options.inService) return { usable: false, state: "out-of-service", dueAt: null, message: `${assetTag} is out of service.` };
  const latest = [...options.calibrations].sort((a, b) => b.calibratedAt.getTime() - a.calibratedAt.getTime())[0];
  if (!latest) return { usable: false, state: "never", dueAt: null, message: `${assetTag} has no calibration on record.` };
  const day = latest.dueAt.toISOString().slice(0, 10);
  if (!latest.passed) return { usable: false, state: "failed", dueAt: latest.dueAt, message: `${assetTag} failed its last calibration.` };
  if (latest.dueAt.getTime() < now.getTime()) return { usable: false, state: "overdue", dueAt: latest.dueAt, message: `${assetTag} was due for calibration on ${day}.` };
  const soon = latest.dueAt.getTime() - now.getTime() < DUE_SOON_DAYS * 86_400_000;
  return { usable: true, state: soon ? "due-soon" : "current", dueAt: latest.dueAt, message: soon ? `${assetTag} is due for calibration on ${day}.` : `${assetTag} is calibrated until ${day}.` };
}

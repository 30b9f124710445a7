/**
 * The words of the e-mail notices the lab sends: to a client's contacts when a certificate or a revision is
 * issued, and to the lab when calibrations fall due. Plain text, the lab's name and time zone given. Pure.
 */
export type NoticeText = { subject: string; text: string };

export function certificateIssuedNotice(input: {
  labName: string;
  clientName: string;
  number: string;
  revision: number;
  reason: string;
  projectCode: string;
  projectName: string;
  issuedAtText: string;
  verifyUrl: string;
  portalUrl: string;
}): NoticeText {
  const revised = input.revision > 1;
  const what = revised ? `Revision ${input.revision} of certificate ${input.number}` : `Certificate ${input.number}`;
  const lines = [
    `${input.clientName},`,
    "",
    `${what} for project ${input.projectCode} (${input.projectName}) was issued by ${input.labName} on ${input.issuedAtText}.`,
    ...(revised ? ["", `It replaces revision ${input.revision - 1}${input.reason ? `, because: ${input.reason}` : ""}. The earlier revision is superseded and should no longer be relied on.`] : []),
    "",
    `The signed PDF is attached and can be downloaded from the client portal: ${input.portalUrl}`,
    `Anyone holding a copy can check that it is genuine and still valid at: ${input.verifyUrl}`,
    "",
    "The results apply only to the specimens tested. Design decisions rest with the responsible engineer under local codes and licensed practice.",
    "",
    input.labName,
  ];
  return { subject: `${what} issued: project ${input.projectCode}`, text: lines.join("\n") };
}

export type DueCalibration = { assetTag: string; equipmentName: string; reference: string; dueAtText: string; overdue: boolean };

export function calibrationsDueNotice(input: { labName: string; withinDays: number; due: readonly DueCalibration[]; equipmentUrl: string }): NoticeText {
  const overdue = input.due.filter((d) => d.overdue).length;
  const lines = [
    `These instruments of ${input.labName} are due for calibration within ${input.withinDays} days${overdue ? ` (${overdue} already overdue)` : ""}:`,
    "",
    ...input.due.map((d) => `- ${d.assetTag} ${d.equipmentName}: calibration ${d.reference} ${d.overdue ? "was due" : "is due"} ${d.dueAtText}`),
    "",
    "A run cannot be assigned to an instrument that is out of calibration without a QA manager's recorded override.",
    `Record new calibrations in the equipment register: ${input.equipmentUrl}`,
  ];
  return { subject: `${input.due.length} calibration${input.due.length === 1 ? "" : "s"} due within ${input.withinDays} days`, text: lines.join("\n") };
}

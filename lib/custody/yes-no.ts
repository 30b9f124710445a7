/**
 * A yes-or-no cell as people type it in a spreadsheet: yes/no, y/n, true/false, 1/0 (any case). A blank
 * cell means no. Anything else is refused rather than guessed, so "no" can never be stored as yes. Pure.
 */
const YES = ["yes", "y", "true", "1"];
const NO = ["no", "n", "false", "0", ""];

/** true or false for a recognised word, null for anything else. */
export function readYesNo(value: unknown): boolean | null {
  if (typeof value === "boolean") return value;
  if (value === undefined || value === null) return false;
  if (typeof value !== "string") return null;
  const word = value.trim().toLowerCase();
  if (YES.includes(word)) return true;
  if (NO.includes(word)) return false;
  return null;
}

export const YES_NO_HINT = "yes/no, y/n, true/false or 1/0";

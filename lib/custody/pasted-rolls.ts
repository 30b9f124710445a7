/**
 * Rolls pasted from a spreadsheet into the shipment form: the rows read by parsePastedRows, with the
 * yes-or-no column turned into true/false. A cell that is not a recognised yes or no refuses the whole
 * paste, naming the pasted row and the column, so nothing is guessed. Pure.
 */
import { ROLL_PASTE_COLUMNS } from "../validation/intake";
import { parsePastedRows } from "./paste-grid";
import { readYesNo, YES_NO_HINT } from "./yes-no";

/** The title each pasted column goes by in messages (and in the form's grid). */
export const ROLL_COLUMN_TITLES: Record<(typeof ROLL_PASTE_COLUMNS)[number]["key"], string> = {
  rollNumber: "Roll number", lotNumber: "Lot number", product: "Product", manufacturer: "Manufacturer",
  sampleLengthMm: "Length (mm)", sampleWidthMm: "Width (mm)", machineDirectionMarked: "MD marked", conditionNotes: "Condition",
  deliveredLengthM: "Roll length (m)", deliveredWidthM: "Roll width (m)",
};

export type PastedRoll = Record<string, string | boolean> & { machineDirectionMarked: boolean };

export function readPastedRolls(text: string): { rolls: PastedRoll[]; problems: string[] } {
  const { rows } = parsePastedRows(text, ROLL_PASTE_COLUMNS);
  const problems: string[] = [];
  const rolls = rows.map(({ line, cells }) => {
    const marked = readYesNo(cells.machineDirectionMarked ?? "");
    if (marked === null)
      problems.push(`Pasted row ${line}, column "${ROLL_COLUMN_TITLES.machineDirectionMarked}": "${cells.machineDirectionMarked}" is not a yes or no; write ${YES_NO_HINT}.`);
    return { ...cells, machineDirectionMarked: marked ?? false };
  });
  return { rolls, problems };
}

/**
 * Reads rows pasted from a spreadsheet (tab-separated, as spreadsheets copy them; a comma-separated
 * paste works too when there is no tab) into records keyed by column. Pure: validation of each row is
 * done by the caller's schema, so the form and the server judge rows the same way.
 */
export type PastedRow = { line: number; cells: Record<string, string> };

function splitLine(line: string, separator: string): string[] {
  if (separator === "\t") return line.split("\t").map((c) => c.trim());
  // Comma-separated, with double-quoted cells that may hold commas.
  const cells: string[] = [];
  let cell = "";
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i]!;
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ",") {
      cells.push(cell.trim());
      cell = "";
    }
    else cell += ch;
  }
  cells.push(cell.trim());
  return cells;
}

/**
 * Splits pasted text into rows of named cells. A first row whose cells match column labels (case and
 * spacing ignored) is taken as a header and may put the columns in any order; otherwise the columns are
 * read in the given order. Blank lines are skipped; line numbers count from 1 as the person sees them.
 */
export function parsePastedRows(text: string, columns: ReadonlyArray<{ key: string; labels: readonly string[] }>): { rows: PastedRow[]; headerUsed: boolean } {
  const lines = text.replace(/\r\n?/g, "\n").split("\n");
  const separator = lines.some((l) => l.includes("\t")) ? "\t" : ",";
  const normal = (s: string) => s.toLowerCase().replace(/[^a-z0-9]/g, "");
  let order = columns.map((c) => c.key);
  let headerUsed = false;
  const rows: PastedRow[] = [];
  lines.forEach((raw, index) => {
    if (raw.trim() === "") return;
    const cells = splitLine(raw, separator);
    if (!headerUsed && rows.length === 0) {
      const keys = cells.map((cell) => columns.find((c) => c.labels.some((label) => normal(label) === normal(cell)))?.key);
      if (keys.filter(Boolean).length >= 2 && keys.every(Boolean)) {
        order = keys as string[];
        headerUsed = true;
        return;
      }
    }
    const record: Record<string, string> = {};
    order.forEach((key, i) => (record[key] = cells[i] ?? ""));
    rows.push({ line: index + 1, cells: record });
  });
  return { rows, headerUsed };
}

/**
 * A CSV splitter that takes its text in pieces (a file read as a stream), so a long data-logger file is never
 * held as one string: comma, semicolon or tab separated (detected from the first non-blank line), optionally
 * quoted cells that may hold the separator, doubled quotes and line breaks, CRLF, CR or LF line ends, a
 * leading byte-order mark. Blank lines are counted (row numbers are as a spreadsheet shows them) but not
 * returned. Pure.
 */
export type CsvSeparator = "," | ";" | "\t";
export type CsvRecord = { line: number; cells: string[] };

export function detectSeparator(line: string): CsvSeparator {
  const unquoted = line.replace(/"[^"]*"/g, "");
  const count = (ch: string) => unquoted.split(ch).length - 1;
  const tabs = count("\t");
  const semis = count(";");
  const commas = count(",");
  if (tabs > 0 && tabs >= semis && tabs >= commas) return "\t";
  if (semis > 0 && semis >= commas) return ";";
  return ",";
}

export class CsvRecordReader {
  separator: CsvSeparator | null = null;
  private waiting = "";
  private first = true;
  private cells: string[] = [];
  private cell = "";
  private quoted = false;
  private afterCr = false;
  // A quote ending a piece inside a quoted cell: the next piece says whether it was doubled or closed the cell.
  private quoteAtEnd = false;
  private line = 1;
  private startLine = 1;

  /** Takes the next piece of text; returns the records it completed. */
  push(text: string): CsvRecord[] {
    let piece = text;
    if (this.first && piece.length) {
      piece = piece.replace(/^\uFEFF/, "");
      this.first = false;
    }
    if (this.separator === null) {
      // The separator comes from the first non-blank line, so wait until one is whole.
      this.waiting += piece;
      const lines = this.waiting.split(/\r\n|\r|\n/);
      const complete = lines.slice(0, -1).find((l) => l.trim() !== "");
      if (complete === undefined) return [];
      this.separator = detectSeparator(complete);
      piece = this.waiting;
      this.waiting = "";
    }
    return this.split(piece);
  }

  /** The last record, when the text does not end with a line break. */
  end(): CsvRecord[] {
    const out: CsvRecord[] = [];
    if (this.separator === null) {
      const rest = this.waiting;
      this.waiting = "";
      if (rest.trim() === "") return [];
      this.separator = detectSeparator(rest.split(/\r\n|\r|\n/).find((l) => l.trim() !== "") ?? "");
      out.push(...this.split(rest));
    }
    if (this.quoteAtEnd) {
      this.quoteAtEnd = false;
      this.quoted = false;
    }
    if (this.cell !== "" || this.cells.length > 0) {
      this.cells.push(this.cell);
      this.emit(out);
    }
    return out;
  }

  private emit(out: CsvRecord[]) {
    if (!(this.cells.length === 1 && this.cells[0]!.trim() === "")) out.push({ line: this.startLine, cells: this.cells });
    this.cells = [];
    this.cell = "";
  }

  private split(text: string): CsvRecord[] {
    const out: CsvRecord[] = [];
    const separator = this.separator!;
    let i = 0;
    if (this.quoteAtEnd && text.length) {
      this.quoteAtEnd = false;
      if (text[0] === '"') {
        this.cell += '"';
        i = 1;
      } else this.quoted = false;
    }
    for (; i < text.length; i++) {
      let ch = text[i]!;
      if (ch === "\n" && this.afterCr) {
        this.afterCr = false;
        continue;
      }
      this.afterCr = ch === "\r";
      if (ch === "\r") ch = "\n";
      if (this.quoted) {
        if (ch === '"' && i + 1 === text.length) this.quoteAtEnd = true;
        else if (ch === '"' && text[i + 1] === '"') {
          this.cell += '"';
          i++;
        } else if (ch === '"') this.quoted = false;
        else {
          if (ch === "\n") this.line++;
          this.cell += ch;
        }
      } else if (ch === '"' && this.cell.trim() === "") {
        this.quoted = true;
        this.cell = "";
      } else if (ch === separator) {
        this.cells.push(this.cell);
        this.cell = "";
      } else if (ch === "\n") {
        this.cells.push(this.cell);
        this.emit(out);
        this.line++;
        this.startLine = this.line;
      } else this.cell += ch;
    }
    return out;
  }
}

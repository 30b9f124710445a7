"use client";
import Link from "next/link";

/**
 * How one column of a list draws its cells: a link to `href` + the cell's text, a second line (linked to
 * `subHref` + that line's text), monospaced, or a state tag whose second value is its tone's class.
 */
export type ListColumn = { href?: string; subHref?: string; mono?: boolean; tag?: boolean };

/** A cell's text, or its text and second line (a tag's label and tone); null draws a dash. */
export type ListCellValue = string | null | readonly [string, string | null];

/**
 * A list's rows, drawn from plain strings the page has already formatted. Why a client component: a server
 * component's table goes to the browser twice, once as HTML and once as React's description of every
 * element for hydration (about 1 KB a row); from here the browser gets the HTML and the rows' strings only.
 */
export function ListRows({ columns, rows }: { columns: readonly ListColumn[]; rows: readonly (readonly ListCellValue[])[] }) {
  return (
    <tbody>
      {rows.map((row, i) => (
        <tr key={typeof row[0] === "string" ? row[0] : i}>
          {columns.map((column, c) => <ListCell key={c} column={column} value={row[c] ?? null} />)}
        </tr>
      ))}
    </tbody>
  );
}

function ListCell({ column, value }: { column: ListColumn; value: ListCellValue }) {
  const [text, sub] = typeof value === "string" || value === null ? [value, null] : value;
  if (column.tag) return <td><span className={`state ${sub ?? ""}`}>{text}</span></td>;
  const main = text === null ? "—" : column.href ? <Link href={`${column.href}${text}`}>{text}</Link> : text;
  return (
    <td className={column.mono ? "mono" : undefined}>
      {main}
      {sub !== null && <div className="muted">{column.subHref ? <Link href={`${column.subHref}${sub}`}>{sub}</Link> : sub}</div>}
    </td>
  );
}

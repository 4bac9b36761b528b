import Papa from "papaparse";

/** CSV downloads (lesson exports, the department overview): every cell made safe to open in a spreadsheet. */

export type CsvCell = string | number | null;

/**
 * Characters that make a spreadsheet read a text cell as a formula (or, for tab and carriage
 * return, hide one after them): common practice per OWASP "CSV Injection". Tested at the
 * start of the cell only, across line breaks too (papaparse's own option misses "=1+1\n…").
 */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * Makes one cell safe to open in a spreadsheet. Our choice: numbers stay numbers. A cell that
 * holds a JavaScript number is written as that number ("-0.5"), never prefixed: it was made
 * by our code from a finite number, so it can only be digits, a sign, a point and an exponent,
 * and a spreadsheet reads "-0.5" as minus a half, not a formula. Only text cells (names,
 * reasons, explanations, labels, anything a person typed) that start with = + - @ tab or CR get
 * a leading apostrophe, so "=1+1" arrives as the text '=1+1 and "-5 cm" as '-5 cm. Non-finite
 * numbers and null become empty cells.
 */
export function neutraliseCell(cell: CsvCell): string | number {
  if (cell === null) return "";
  if (typeof cell === "number") return Number.isFinite(cell) ? cell : "";
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/**
 * CSV text: header row, CRLF line ends (RFC 4180), quoting by papaparse's `unparse`, every cell
 * neutralised first. Starts with a UTF-8 byte order mark: without it Excel on Windows reads a
 * download as the local code page and garbles names such as "Zoë"; LibreOffice, Google Sheets
 * and papaparse all skip the mark.
 */
export function toCsv(header: string[], rows: CsvCell[][]): string {
  return (
    "\ufeff" +
    Papa.unparse(
      { fields: header.map((h) => neutraliseCell(h) as string), data: rows.map((r) => r.map(neutraliseCell)) },
      { newline: "\r\n", escapeFormulae: false },
    ) +
    "\r\n"
  );
}

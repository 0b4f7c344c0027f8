/**
 * CSV writing and reading for the paperwork exports, through papaparse (its quoting handles commas,
 * quotes, line breaks and any Unicode text). Files start with a UTF-8 byte order mark so
 * spreadsheet programs read non-Latin names correctly; `parseCsv` drops it again.
 *
 * Formula cells (OWASP "CSV injection"): a cell is escaped by the JS type of its value. A string
 * (names, purpose, notes, filter, type… which may come from someone else's plot file) that starts
 * with = + - @ tab or carriage return is written with a leading apostrophe, so a spreadsheet shows
 * it as text instead of running it as a formula: "-1/2 CTO" is written "'-1/2 CTO". A number is
 * written as it is and never escaped, so −0.5 stays -0.5: give figures as numbers, not as
 * pre-formatted strings.
 */
import Papa from 'papaparse';

export interface CsvColumn<Row> {
  readonly header: string;
  /**
   * The cell's value; null writes an empty cell. Numbers are written as they are (no rounding here)
   * and never escaped; strings starting with = + - @ tab or CR get a leading apostrophe.
   */
  readonly value: (row: Row) => string | number | null;
}

const BOM = '\uFEFF';
/** A string cell starting with one of these could run as a formula in a spreadsheet. */
const FORMULA_START = /^[=+\-@\t\r]/;

/** Rows as CSV text with a header line, CRLF line ends, and a byte order mark. */
export function toCsv<Row>(rows: readonly Row[], columns: readonly CsvColumn<Row>[]): string {
  const data = rows.map((row) => columns.map((column) => column.value(row) ?? ''));
  return (
    BOM +
    Papa.unparse(
      { fields: columns.map((column) => column.header), data },
      // papaparse escapes only values of type string, so numbers (e.g. -0.5) are written bare.
      { newline: '\r\n', quotes: false, escapeFormulae: FORMULA_START },
    )
  );
}

/** CSV text back to rows of cells (header row first); throws with the line for malformed quoting. */
export function parseCsv(text: string): string[][] {
  const result = Papa.parse<string[]>(text.startsWith(BOM) ? text.slice(1) : text, {
    skipEmptyLines: true,
  });
  const problem = result.errors[0];
  if (problem) throw new Error(`CSV row ${(problem.row ?? 0) + 1}: ${problem.message}`);
  return result.data;
}

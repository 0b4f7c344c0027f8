/**
 * CSV writing and reading for the paperwork exports, through papaparse (its quoting handles commas,
 * quotes, line breaks and any Unicode text). Files start with a UTF-8 byte order mark so
 * spreadsheet programs read non-Latin names correctly; `parseCsv` drops it again. A cell that
 * starts with = + or @ is written with a leading apostrophe so a spreadsheet shows it as text
 * instead of running it as a formula ("-1/2 CTO" and other leading minus signs are left alone).
 */
import Papa from 'papaparse';

export interface CsvColumn<Row> {
  readonly header: string;
  /** The cell's value; null writes an empty cell. Numbers are written as they are (no rounding here). */
  readonly value: (row: Row) => string | number | null;
}

const BOM = '\uFEFF';

/** Rows as CSV text with a header line, CRLF line ends, and a byte order mark. */
export function toCsv<Row>(rows: readonly Row[], columns: readonly CsvColumn<Row>[]): string {
  const data = rows.map((row) =>
    columns.map((column) => {
      const value = column.value(row);
      return value === null ? '' : String(value);
    }),
  );
  return (
    BOM +
    Papa.unparse(
      { fields: columns.map((column) => column.header), data },
      { newline: '\r\n', quotes: false, escapeFormulae: /^[=+@\t\r]/ },
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

import { stringify } from "csv-stringify/sync";

/** A column of a spreadsheet export: text is guarded against formulas; numbers and ISO dates are written as they are. */
export type CsvColumn<T> = { header: string; kind?: "text" | "number" | "date"; value: (row: T) => string | number | null };

// A cell beginning with one of these is run as a formula by common spreadsheet programs (CSV injection,
// OWASP "CSV Injection"); a leading apostrophe makes them show the text instead.
const FORMULA_START = /^[=+\-@\t\r]/;

function cell(value: string | number | null, kind: CsvColumn<unknown>["kind"]): string {
  if (value === null) return "";
  const text = String(value);
  return kind === "text" || kind === undefined ? (FORMULA_START.test(text) ? `'${text}` : text) : text;
}

/**
 * RFC 4180 CSV with a header row and CRLF line ends, led by a UTF-8 byte-order mark so spreadsheet
 * programs read accented names as UTF-8. Fields holding a comma, a quote or a line break are quoted.
 */
export function toCsv<T>(columns: readonly CsvColumn<T>[], rows: readonly T[]): string {
  return stringify(
    rows.map((row) => columns.map((c) => cell(c.value(row), c.kind))),
    // csv-stringify quotes a field holding its own record delimiter (CRLF) but not a lone LF or CR: quote those too.
    { header: true, columns: columns.map((c) => c.header), bom: true, record_delimiter: "windows", quoted_match: /[\r\n]/ },
  );
}

import Papa from "papaparse";

/** The most data rows one import reads; a larger file is refused whole rather than cut short. */
export const IMPORT_ROW_LIMIT = 1000;

export type CsvSheet = { headers: string[]; rows: string[][]; problem: string | null };

/**
 * A spreadsheet's text as a header row and data rows of trimmed cells: a byte-order mark is dropped,
 * blank lines skipped, the delimiter found by papaparse (comma, semicolon, tab). `problem` names what
 * makes the file unusable as a whole.
 */
export function readCsv(text: string): CsvSheet {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const [head = [], ...body] = parsed.data;
  const headers = head.map((h) => h.trim());
  const rows = body.map((r) => r.map((c) => c.trim()));
  const broken = parsed.errors.find((e) => e.type === "Quotes");
  let problem: string | null = null;
  if (headers.filter(Boolean).length === 0) problem = "The file has no header row: its first line must name the columns.";
  else if (rows.length === 0) problem = "The file has a header row but no projects under it.";
  else if (rows.length > IMPORT_ROW_LIMIT) problem = `The file has ${rows.length} rows; import at most ${IMPORT_ROW_LIMIT} at a time.`;
  // papaparse counts rows from 0 with the header as row 0: row r is the file's line r + 1.
  else if (broken) problem = `Line ${(broken.row ?? 0) + 1} has a quotation mark that is never closed.`;
  return { headers, rows, problem };
}

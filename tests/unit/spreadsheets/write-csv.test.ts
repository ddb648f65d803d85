// CSV as RFC 4180 writes it (IETF RFC 4180 §2: quotes doubled inside quoted fields; fields with commas,
// quotes or line breaks quoted; CRLF between records), led by the UTF-8 byte-order mark (Unicode 15 §23.8).
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { toCsv, type CsvColumn } from "@/lib/spreadsheets/write-csv";

type Row = { name: string; amount: number | null; day: string };
const COLUMNS: CsvColumn<Row>[] = [
  { header: "Name", value: (r) => r.name },
  { header: "Amount", kind: "number", value: (r) => r.amount },
  { header: "Day", kind: "date", value: (r) => r.day },
];

describe("toCsv", () => {
  it("starts with the byte-order mark and the header row, and ends records with CRLF", () => {
    const text = toCsv(COLUMNS, [{ name: "Ana", amount: 1.5, day: "2026-03-02" }]);
    expect(text.charCodeAt(0)).toBe(0xfeff);
    expect(text.slice(1)).toBe("Name,Amount,Day\r\nAna,1.5,2026-03-02\r\n");
  });

  it.each([
    ["a comma", "Okafor, Dana", '"Okafor, Dana"'],
    ["a quote", 'The "Mesa" house', '"The ""Mesa"" house"'],
    ["a line break", "Unit 4\nRear", '"Unit 4\nRear"'],
    ["accented letters", "José Núñez", "José Núñez"],
  ])("quotes a field with %s only as RFC 4180 asks", (_, name, written) => {
    expect(toCsv(COLUMNS, [{ name, amount: null, day: "" }]).split("\r\n")[1]).toBe(`${written},,`);
  });

  it.each([["=SUM(A1:A9)"], ["+1 555"], ["-2"], ["@cmd"]])("keeps text %s from running as a formula, and reads back", (name) => {
    const text = toCsv(COLUMNS, [{ name, amount: -12.5, day: "2026-01-01" }]);
    const [, row] = Papa.parse<string[]>(text.slice(1)).data;
    expect(row).toEqual([`'${name}`, "-12.5", "2026-01-01"]);
  });
});

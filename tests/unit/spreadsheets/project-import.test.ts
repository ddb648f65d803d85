// Importing projects from a company's own spreadsheet: columns found by their headers, each row checked
// with the project form's own schema (lib/schemas/project.ts), references resolved by name, and projects
// matched on utility account number and address so that a re-import adds nothing. Rules are the product's own.
import { describe, expect, it } from "vitest";
import { guessMapping, planImport, projectMatchKey, type ImportLookups } from "@/lib/spreadsheets/project-import";
import { readCsv } from "@/lib/spreadsheets/read-csv";

const LOOKUPS: ImportLookups = {
  jurisdictions: [{ id: "00000000-0000-4000-8000-000000000001", name: "Town of Fernwick" }],
  utilities: [{ id: "00000000-0000-4000-8000-000000000002", name: "Fernwick Power" }],
  coordinators: [{ id: "00000000-0000-4000-8000-000000000003", name: "Cora Coordinator", email: "cora@firm.example" }],
  installers: [{ id: "00000000-0000-4000-8000-000000000004", name: "Ivo Installer", email: "ivo@firm.example" }],
};

const HEADER = "Customer,Street,City,State,ZIP,AHJ,Utility,Utility account,Main breaker (A),Busbar (A),Coordinator,Installer";
const GOOD = "Wren Alder,12 Pine St,Fernwick,co,80301,Town of Fernwick,Fernwick Power,ACC-1,200,200,cora@firm.example,Ivo Installer";

const plan = (text: string, existing = new Map<string, number>()) => {
  const sheet = readCsv(text);
  return planImport(sheet.rows, guessMapping(sheet.headers), LOOKUPS, existing);
};

describe("guessMapping", () => {
  it.each([
    [["Customer", "Street", "ZIP"], { customerName: 0, street: 1, postalCode: 2, city: null }],
    [
      ["Homeowner", "Site Address", "Zip Code", "Town", "Account Number"],
      { customerName: 0, street: 1, postalCode: 2, city: 3, utilityAccountNumber: 4 },
    ],
    [["CUSTOMER NAME", "e-mail", "Main Breaker", "Jurisdiction"], { customerName: 0, customerEmail: 1, mainBreakerA: 2, jurisdiction: 3 }],
  ])("finds the columns of %j", (headers, expected) => {
    expect(guessMapping(headers)).toMatchObject(expected);
  });

  it("reads back every column the projects export writes", () => {
    const mapping = guessMapping(HEADER.split(","));
    expect(Object.values(mapping).filter((v) => v !== null)).toHaveLength(12);
  });
});

describe("planImport", () => {
  it("takes a good row with its references resolved and its state upper-cased", () => {
    const [row] = plan(`${HEADER}\n${GOOD}`);
    expect(row).toMatchObject({
      line: 2,
      status: "ready",
      values: {
        customerName: "Wren Alder",
        state: "CO",
        jurisdictionId: LOOKUPS.jurisdictions[0]!.id,
        coordinatorId: LOOKUPS.coordinators[0]!.id,
        mainBreakerA: 200,
      },
    });
  });

  it.each([
    ["a ZIP code that is not one", GOOD.replace("80301", "8030"), ["ZIP: Use a 5-digit ZIP code"]],
    ["a missing customer", GOOD.replace("Wren Alder", ""), ["Customer: Enter the customer's name"]],
    ["an unknown AHJ", GOOD.replace("Town of Fernwick", "Nowhere County"), ["AHJ: “Nowhere County” is not one of your AHJs"]],
    [
      "a main breaker above the busbar",
      GOOD.replace("200,200", "225,200"),
      ["Main breaker (A): The main breaker cannot be larger than the busbar rating"],
    ],
    [
      "a coordinator who is not one",
      GOOD.replace("cora@firm.example", "ivo@firm.example"),
      ["Coordinator: “ivo@firm.example” is not an active coordinator or admin of your company"],
    ],
    [
      "two problems at once",
      GOOD.replace("co,", "Colorado,").replace(",200,200,", ",lots,200,"),
      ["State: Use the two-letter state code", "Main breaker (A): Main breaker must be a whole number of amperes between 1 and 4000"],
    ],
  ])("refuses %s and names the problem by its column", (_, line, problems) => {
    const [row] = plan(`${HEADER}\n${line}`);
    expect(row).toMatchObject({ status: "problem", problems });
  });

  it("marks a project the company already has, and a row repeated in the file, instead of importing it twice", () => {
    const existing = new Map([[projectMatchKey({ utilityAccountNumber: "acc 1", street: "12 PINE ST.", postalCode: "80301" }), 41]]);
    const other = GOOD.replace("ACC-1", "ACC-2");
    const rows = plan(`${HEADER}\n${GOOD}\n${other}\n${other}`, existing);
    expect(rows.map((r) => r.status)).toEqual(["already", "ready", "already"]);
    expect(rows[0]).toMatchObject({ existingNumber: 41 });
    expect(rows[2]).toMatchObject({ sameAsLine: 3 });
  });

  it("refuses every row while a required field has no column", () => {
    const rows = plan("Customer,Street\nAna,1 Elm St");
    expect(rows[0]).toMatchObject({ status: "problem", problems: ["No column is chosen for City, State, ZIP"] });
  });
});

describe("readCsv", () => {
  it.each([
    ["", "The file has no header row: its first line must name the columns."],
    [HEADER, "The file has a header row but no projects under it."],
    [`${HEADER}\n"Wren, 12 Pine`, "Line 2 has a quotation mark that is never closed."],
  ])("names what makes %j unusable", (text, problem) => {
    expect(readCsv(text).problem).toBe(problem);
  });

  it("drops the byte-order mark, reads semicolons and skips blank lines", () => {
    expect(readCsv("\uFEFFCustomer;ZIP\n\nAna;80301\n")).toEqual({ headers: ["Customer", "ZIP"], rows: [["Ana", "80301"]], problem: null });
  });
});

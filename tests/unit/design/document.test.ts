import { describe, expect, it } from "vitest";
import { DesignDocument, SIZE_LABELS, sizeFromLabel } from "@/lib/design/document";
import { jsonPath, problemsOfZod } from "@/lib/design/document-problems";
import { exampleDocument } from "./document-fixtures";

const problemsOf = (body: unknown) => {
  const parsed = DesignDocument.safeParse(body);
  return parsed.success ? [] : problemsOfZod(parsed.error);
};
const pathsOf = (body: unknown) => problemsOf(body).map((p) => p.path);

describe("jsonPath", () => {
  it.each([
    [["runs", 2, "size"], "runs[2].size"],
    [["site", "recordLowC"], "site.recordLowC"],
    [["modules", 0], "modules[0]"],
    [[], ""],
    [["runs", 0, "odd key"], 'runs[0]["odd key"]'],
  ] as const)("%j → %s", (path, expected) => {
    expect(jsonPath(path)).toBe(expected);
  });
});

describe("DesignDocument", () => {
  it("accepts a document with only the fields the issue lists, filling list defaults", () => {
    const doc = exampleDocument();
    delete doc.optimizers;
    doc.strings = doc.strings!.map(({ optimizerId: _unused, ...s }) => s);
    const parsed = DesignDocument.parse(doc);
    expect(parsed.optimizers).toEqual([]);
    expect(parsed.runs[0]).toMatchObject({ circuit: "dc-string", size: "10 AWG", insulationC: 90 });
  });

  it("takes conductor sizes as a coordinator writes them, from 14 AWG to 300 kcmil", () => {
    expect(SIZE_LABELS).toContain("1/0 AWG");
    expect(SIZE_LABELS).toContain("250 kcmil");
    expect(sizeFromLabel("1/0 AWG")).toBe("1/0");
    expect(sizeFromLabel("250 kcmil")).toBe("250");
  });

  it("names every problem by its JSON path", () => {
    const doc = exampleDocument() as Record<string, any>;
    doc.runs[2].size = "9 AWG";
    delete doc.modules[0].vocV;
    doc.service.connection = "backfed";
    doc.codeEdition = "2014";
    doc.strings[1].parallel = 1.5;
    const problems = problemsOf(doc);
    expect(problems.map((p) => p.path).sort()).toEqual([
      "codeEdition",
      "modules[0].vocV",
      "runs[2].size",
      "service.connection",
      "strings[1].parallel",
    ]);
    expect(problems.find((p) => p.path === "runs[2].size")?.message).toMatch(/"10 AWG", "1\/0 AWG" or "250 kcmil"/);
    expect(problems.find((p) => p.path === "modules[0].vocV")?.message).toBe("Voc is required");
    expect(problems.find((p) => p.path === "strings[1].parallel")?.message).toBe("Strings in parallel must be a whole number");
  });

  it("refuses misspelt fields instead of ignoring them", () => {
    const doc = exampleDocument() as Record<string, any>;
    doc.runs[0].lenghtFt = 100;
    doc.site.recordLow = -20;
    expect(problemsOf(doc)).toEqual([
      { path: "site.recordLow", message: "Unknown field; check its spelling against the document format" },
      { path: "runs[0].lenghtFt", message: "Unknown field; check its spelling against the document format" },
    ]);
  });

  it("refuses numbers outside sensible ranges with the range and unit", () => {
    const doc = exampleDocument() as Record<string, any>;
    doc.site.recordLowC = -273;
    doc.runs[0].lengthFt = 1e9;
    const problems = problemsOf(doc);
    expect(problems).toContainEqual({ path: "site.recordLowC", message: "The record low temperature must be between -60 and 40 °C" });
    expect(problems).toContainEqual({ path: "runs[0].lengthFt", message: "The length must be between 0 and 5000 ft" });
  });

  it.each([
    ["null", null, [""]],
    ["an array", [], [""]],
    ["a string", "design", [""]],
    ["an empty object", {}, ["codeEdition", "site", "modules", "inverters", "service"]],
  ])("refuses %s at the document's root", (_what, body, paths) => {
    expect(pathsOf(body)).toEqual(paths);
  });
});

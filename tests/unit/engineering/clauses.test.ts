import { describe, expect, test } from "vitest";
import { CLAUSES, EDITION_ONLY_CLAUSES, NON_CODE_BASES, clause, clauseInEdition, clauses } from "@/lib/engineering";

describe("clause numbering by NEC edition (REFERENCE.md; marked entries from memory)", () => {
  test.each([
    ["maxVoltage", 2017, "NEC 2017 690.7(A)"],
    ["maxVoltage", 2023, "NEC 2023 690.7(A)"],
    ["ampacityTable", 2017, "NEC 2017 Table 310.15(B)(16)"], // from memory
    ["ampacityTable", 2020, "NEC 2020 Table 310.16"],
    ["tempCorrection", 2017, "NEC 2017 Table 310.15(B)(2)(a)"],
    ["tempCorrection", 2020, "NEC 2020 Table 310.15(B)(1)"],
    ["tempCorrection", 2023, "NEC 2023 Table 310.15(B)(1)(1)"], // 2023 numbering from memory
    ["standardRatings", 2020, "NEC 2020 240.6(A)"],
    ["standardRatings", 2023, "NEC 2023 Table 240.6(A)"], // trade-press summaries of 2023
    ["rapidShutdownLabel", 2017, "NEC 2017 690.56(C)(1)(a)"], // from memory
    ["rapidShutdownLabel", 2023, "NEC 2023 690.12(D)"], // from memory, agreeing with a trade summary
    ["dcInsideBuilding", 2017, "NEC 2017 690.31(G)"], // from memory
    ["dcInsideBuilding", 2020, "NEC 2020 690.31(D)"], // from memory
    ["pvDisconnectRatings", 2017, "NEC 2017 690.13(E)"], // from memory
    ["pvDisconnectRatings", 2023, "NEC 2023 690.13(D)"], // from memory
    ["centerFed", 2017, "NEC 2017 705.12(B)(2)(3)(d)"], // from memory
    ["centerFed", 2020, "NEC 2020 705.12(B)(3)(4)"], // from memory
    ["feederConnection", 2023, "NEC 2023 705.12(A)"], // from memory
    ["rooftopAdder", 2017, "NEC 2017 310.15(B)(3)(c)"],
    ["rooftopAdder", 2020, "NEC 2020 310.15(B)(2)"],
    ["cccAdjustment", 2017, "NEC 2017 Table 310.15(B)(3)(a)"],
    ["cccAdjustment", 2023, "NEC 2023 Table 310.15(C)(1)"],
    ["supplySide", 2017, "NEC 2017 705.12(A)"],
    ["supplySide", 2020, "NEC 2020 705.11"],
    ["loadSide100", 2017, "NEC 2017 705.12(B)(2)(3)(a)"],
    ["loadSide120", 2020, "NEC 2020 705.12(B)(3)(2)"],
    ["loadSideSum", 2023, "NEC 2023 705.12(B)(3)"], // 2023 numbering from memory
    ["acOcpd", 2017, "NEC 2017 690.9(B)"], // from memory
    ["acOcpd", 2020, "NEC 2020 705.30(B)"], // REFERENCE.md: 2020 705.30
    ["egcTable", 2020, "NEC 2020 Table 250.122"],
    ["essDisconnect", 2017, "NEC 2017 706.7"], // from memory
    ["essDisconnect", 2020, "NEC 2020 706.15"], // from memory
    ["essDisconnectLocation", 2023, "NEC 2023 706.15(B)"], // trade summary of the 2023 Article 706 changes
    ["essDisconnectLabel", 2023, "NEC 2023 706.15(C)"], // trade summary of the 2023 Article 706 changes
    ["essCircuitSizing", 2023, "NEC 2023 706.30(B)"], // 125 % rule per a trade summary of 2023 Article 706; item letter from memory
    ["essOcpd", 2017, "NEC 2017 706.21"], // from memory
    ["essOcpd", 2023, "NEC 2023 706.31"], // trade summary of 2023 Article 706
    ["standAloneSupply", 2020, "NEC 2020 710.15(A)"], // from memory
    ["singleSupply120", 2023, "NEC 2023 710.15(C)"], // from memory
  ] as const)("%s in %d → %s", (id, edition, expected) => {
    expect(clause(id, edition)).toBe(expected);
  });

  test("several clauses of one edition read as one citation", () => {
    expect(clauses(2020, "conductorSizing", "terminals")).toBe("NEC 2020 690.8(B), 110.14(C)");
  });

  test("every clause has a number for every supported edition", () => {
    for (const byEdition of Object.values(CLAUSES)) {
      expect(Object.keys(byEdition).sort()).toEqual(["2017", "2020", "2023"]);
      for (const ref of Object.values(byEdition)) expect(ref).toMatch(/^(Table )?\d{3}\.\d+|^Chapter 9/);
    }
  });

  // 690.54 in 2017 and 2020; a trade-press summary of the 2023 changes reports it deleted in 2023.
  test.each([
    ["interactivePointLabel", 2017, "NEC 2017 690.54"],
    ["interactivePointLabel", 2020, "NEC 2020 690.54"],
    ["interactivePointLabel", 2023, null],
    ["feedThrough", 2017, null], // no feed-through item in 2017 (from memory)
    ["feedThrough", 2020, "NEC 2020 705.12(B)(3)(6)"], // from memory
    ["feedThrough", 2023, "NEC 2023 705.12(B)(6)"], // from memory
    ["powerControl", 2017, null], // power control systems entered the code in 2020 (REFERENCE.md, from memory)
    ["powerControl", 2020, "NEC 2020 705.13"],
    ["powerControl", 2023, "NEC 2023 705.13"],
  ] as const)("edition-only clause %s in %d → %s", (id, edition, expected) => {
    expect(clauseInEdition(id, edition)).toBe(expected);
  });

  test("edition-only clauses name every edition, with a number or null", () => {
    for (const byEdition of Object.values(EDITION_ONLY_CLAUSES)) {
      expect(Object.keys(byEdition).sort()).toEqual(["2017", "2020", "2023"]);
      for (const ref of Object.values(byEdition)) if (ref !== null) expect(ref).toMatch(/^(Table )?\d{3}\.\d+/);
    }
  });

  test("non-code bases never pass for an NEC citation", () => {
    for (const basis of NON_CODE_BASES) expect(basis).not.toMatch(/^NEC /);
  });
});

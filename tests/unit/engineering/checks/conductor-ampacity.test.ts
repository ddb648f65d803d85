import { describe, expect, test } from "vitest";
import { checkConductorAmpacity, conditionsOfUse, rooftopAdderC } from "@/lib/engineering";
import type { ConductorRun, NecEdition } from "@/lib/engineering";
import { acRun, coldSite, stringDesign, stringRun } from "../fixtures";

const design = stringDesign();
const check = (run: ConductorRun, edition: NecEdition = 2020) => {
  const [terminal, conditions] = checkConductorAmpacity(design, { ...coldSite, necEdition: edition }, run);
  return { terminal: terminal!, conditions: conditions! };
};

describe("rooftop adder: +33 °C under 7/8 in (NEC 2017 310.15(B)(3)(c); 2020/2023 310.15(B)(2); REFERENCE.md)", () => {
  test.each([
    [undefined, undefined, 0], // not on a roof
    [0.5, "PV wire", 33],
    [0.874, "PV wire", 33],
    [0.875, "PV wire", 0], // exactly 7/8 in: not "less than"
    [3.5, "THWN-2", 0],
    [0.5, "XHHW-2", 0], // exempt (from memory)
  ])("%s in, %s → +%d °C", (clearanceIn, insulation, adderC) => {
    for (const edition of [2017, 2020, 2023] as const) expect(rooftopAdderC(edition, clearanceIn, insulation)).toBe(adderC);
  });
});

describe("690.8(B) conductor ampacity with conditions of use", () => {
  // 10 AWG Cu, 90 °C PV wire, 35 °C air, 1 in above the roof, 2 CCCs.
  // Terminal: 1.25 × 15.25 = 19.06 A ≤ 35 A (75 °C column, NEC 2023 Table 310.16; 110.14(C)).
  // Conditions: 40 A × 0.96 (31–35 °C, Table 310.15(B)(1)) = 38.4 A ≥ 15.25 A.
  test("10 AWG Cu string run passes both tests", () => {
    const { terminal, conditions } = check(stringRun);
    expect(terminal).toMatchObject({ status: "pass", value: 35, limit: 19.06, clause: "NEC 2020 690.8(B), 110.14(C), Table 310.16" });
    expect(conditions).toMatchObject({ status: "pass", value: 38.4, limit: 15.25 });
  });

  // 0.5 in above the roof: 35 + 33 = 68 °C → 0.58 → 40 × 0.58 = 23.2 A
  test("rooftop adder applied: 23.2 A, and the clause cites it by edition", () => {
    const run = { ...stringRun, roofClearanceIn: 0.5 };
    expect(check(run).conditions).toMatchObject({ status: "pass", value: 23.2, clause: "NEC 2020 690.8(B), Table 310.15(B)(1), 310.15(B)(2)" });
    expect(check(run, 2017).conditions.clause).toBe("NEC 2017 690.8(B), Table 310.15(B)(2)(a), 310.15(B)(3)(c)");
  });

  // More than 3 CCCs: 8 → 0.7: 23.2 × 0.7 = 16.24 A ≥ 15.25 A; 10 → 0.5: 11.6 A < 15.25 A.
  // Smallest passing: 8 AWG Cu: 55 × 0.58 × 0.5 = 15.95 A ≥ 15.25 A.
  test.each([
    [8, "pass", 16.24, undefined],
    [10, "fail", 11.6, "Use 8 AWG copper or larger."],
  ])("%d current-carrying conductors on the roof → %s (%d A)", (ccc, status, valueA, fix) => {
    const { conditions } = check({ ...stringRun, roofClearanceIn: 0.5, currentCarryingConductors: ccc });
    expect(conditions).toMatchObject({ status, value: valueA });
    expect(conditions.fix).toBe(fix);
    expect(conditions.clause).toContain("Table 310.15(C)(1)");
  });

  // Inverter output circuit: 1.25 × 32 = 40 A (2020 705.28(B); from memory).
  test.each([
    ["8", "Cu", 75, "pass", 50],
    ["10", "Cu", 75, "fail", 35],
    ["8", "Al", 75, "pass", 40], // exactly at the limit: 40 A = 40 A
    ["10", "Al", 75, "fail", 30],
    ["8", "Cu", 60, "pass", 40], // 60 °C terminals: 40 A column, exactly at the limit
  ] as const)("AC run %s AWG %s, %d °C terminals → %s (%d A vs 40 A)", (size, material, terminalC, status, valueA) => {
    const run = { ...acRun, terminalTempC: terminalC, conductor: { ...acRun.conductor, size, material } };
    expect(check(run).terminal).toMatchObject({ status, value: valueA, limit: 40 });
  });

  test("AC runs cite 705.28(B) from 2020 on, 690.8(B) in 2017 (from memory)", () => {
    expect(check(acRun, 2023).terminal.clause).toBe("NEC 2023 705.28(B), 110.14(C), Table 310.16");
    expect(check(acRun, 2017).terminal.clause).toBe("NEC 2017 690.8(B), 110.14(C), Table 310.15(B)(16)");
  });

  test("the fix names the smallest conductor that passes: 10 AWG Cu on the AC run → 8 AWG", () => {
    const run = { ...acRun, conductor: { ...acRun.conductor, size: "10" as const } };
    expect(check(run).terminal.fix).toBe("Use 8 AWG copper or larger.");
  });

  test("three-phase inverter output counts 3 current-carrying conductors by default (no adjustment)", () => {
    const three = stringDesign({ inverters: [{ ...design.inverters[0]!, phase: 3, acVoltageV: 208 }] });
    expect(conditionsOfUse(acRun, coldSite, 3).adjustmentFactor).toBe(1);
    const [, conditions] = checkConductorAmpacity(three, coldSite, acRun);
    expect(conditions!.clause).not.toContain("310.15(C)(1)");
  });

  test("an unknown conductor size is a readable input error", () => {
    const run = { ...stringRun, conductor: { ...stringRun.conductor, size: "5" as never } };
    expect(() => checkConductorAmpacity(design, coldSite, run)).toThrow(/not in the ampacity table/);
  });
});

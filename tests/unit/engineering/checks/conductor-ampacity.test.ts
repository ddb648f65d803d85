import { describe, expect, test } from "vitest";
import { checkConductorAmpacity, checkCurrentCarryingCount, conditionsOfUse, rooftopAdderC } from "@/lib/engineering";
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
    const { terminal, conditions } = check({ ...stringRun, terminalTempC: 75 });
    expect(terminal).toMatchObject({ status: "pass", value: 35, limit: 19.06, clause: "NEC 2020 690.8(B), 110.14(C), Table 310.16" });
    expect(conditions).toMatchObject({ status: "pass", value: 38.4, limit: 15.25 });
  });

  // 0.5 in above the roof: 35 + 33 = 68 °C → 0.58 → 40 × 0.58 = 23.2 A
  test("rooftop adder applied: 23.2 A, and the clause cites it by edition", () => {
    const run = { ...stringRun, roofClearanceIn: 0.5 };
    expect(check(run).conditions).toMatchObject({
      status: "pass",
      value: 23.2,
      clause: "NEC 2020 690.8(B), Table 310.15(B)(1), 310.15(B)(2)",
    });
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
    const rated = { ...acRun, terminalTempC: 75 as const };
    expect(check(rated, 2023).terminal.clause).toBe("NEC 2023 705.28(B), 110.14(C), Table 310.16");
    expect(check(rated, 2017).terminal.clause).toBe("NEC 2017 690.8(B), 110.14(C), Table 310.15(B)(16)");
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

// 110.14(C)(1): terminations of circuits of 100 A or less (or marked for 14–1 AWG) are 60 °C unless the
// equipment is marked otherwise; over 100 A, 75 °C (from memory). 10 AWG Cu: 30 A at 60 °C, 35 A at 75 °C
// (Table 310.16, REFERENCE.md). A 25 A inverter needs 1.25 × 25 = 31.25 A at its terminals.
describe("110.14(C) terminal temperature when the run gives none", () => {
  const inverter = design.inverters[0]!;
  const run = { ...acRun, ocpdA: 35, conductor: { ...acRun.conductor, size: "10" as const }, terminalTempC: undefined };
  const at = (terminalTempC?: 60 | 75 | 90) =>
    checkConductorAmpacity(stringDesign({ inverters: [{ ...inverter, acOutputCurrentA: 25, terminalTempC }] }), coldSite, run)[0]!;

  test.each([
    [undefined, "fail", 30, "110.14(C)(1)(a)"], // nothing marked: 60 °C, 30 A < 31.25 A
    [75, "pass", 35, "110.14(C),"], // the inverter's terminals marked 75 °C
    [60, "fail", 30, "110.14(C),"],
  ] as const)("inverter terminals %s °C → %s at %d A", (marked, status, valueA, citation) => {
    const r = at(marked);
    expect(r).toMatchObject({ status, value: valueA, limit: 31.25 });
    expect(r.clause).toContain(citation);
  });

  test("the unmarked case says it assumed 60 °C and names the field", () => {
    const r = at(undefined);
    expect(r.message).toContain("no terminal rating is entered");
    expect(r.field).toBe("runs.r2.terminalTempC");
  });

  test("the rating entered for the run wins over the equipment's", () => {
    const r = checkConductorAmpacity(stringDesign({ inverters: [{ ...inverter, acOutputCurrentA: 25, terminalTempC: 60 }] }), coldSite, {
      ...run,
      terminalTempC: 75,
    })[0]!;
    expect(r).toMatchObject({ status: "pass", value: 35 });
  });

  test("a circuit above 100 A takes 75 °C by default", () => {
    const big = stringDesign({ inverters: [{ ...inverter, acOutputCurrentA: 100 }], service: { ...design.service, pvBreakerA: 125 } });
    const feeder = {
      ...acRun,
      ocpdA: 125,
      conductor: { ...acRun.conductor, size: "1/0" as const },
      terminalTempC: undefined,
      raceway: undefined,
    };
    // 1/0 Cu at 75 °C: 150 A ≥ 1.25 × 100 = 125 A (at 60 °C it would be 125 A)
    expect(checkConductorAmpacity(big, coldSite, feeder)[0]).toMatchObject({ status: "pass", value: 150 });
  });
});

// Issue: a blank count assumed 2–3 even with four conductors in the raceway. The count now comes
// from the circuits (two strings → 4, Table 310.15(C)(1): 4–6 → 0.8), and a lower entered count fails.
describe("current-carrying conductors counted from what the raceway carries (Table 310.15(C)(1))", () => {
  const twoStrings = { ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"] }, roofClearanceIn: undefined };

  test.each([
    [undefined, 4, 0.8],
    [2, 4, 0.8], // entered below the circuits' own count: the counted 4 is used
    [7, 7, 0.7], // entered above: other circuits share the raceway
  ])("entered %s → %d conductors × %d", (entered, counted, factor) => {
    const c = conditionsOfUse({ ...twoStrings, currentCarryingConductors: entered }, coldSite, 4);
    expect(c.currentCarryingConductors).toBe(counted);
    expect(c.adjustmentFactor).toBe(factor);
  });

  test("two strings in one raceway: each conductor carries one string's 15.25 A, derated for four conductors", () => {
    // 10 AWG Cu 90 °C: 40 A × 0.96 (35 °C) × 0.8 = 30.72 A ≥ 15.25 A
    const { conditions } = check(twoStrings);
    expect(conditions).toMatchObject({ status: "pass", value: 30.72, limit: 15.25 });
    expect(conditions.message).toContain("4 current-carrying conductors together × 0.8");
  });

  test("an entered count below the circuits' count fails and names the field", () => {
    const [r] = checkCurrentCarryingCount(design, coldSite, { ...twoStrings, currentCarryingConductors: 2 });
    expect(r).toMatchObject({ status: "fail", value: 2, limit: 4, field: "runs.r1.currentCarryingConductors" });
    expect(r!.message).toContain("2 separate circuits, 4 current-carrying conductors");
    expect(checkCurrentCarryingCount(design, coldSite, { ...twoStrings, currentCarryingConductors: 4 })).toEqual([]);
    expect(checkCurrentCarryingCount(design, coldSite, { ...twoStrings, currentCarryingConductors: undefined })).toEqual([]);
  });
});

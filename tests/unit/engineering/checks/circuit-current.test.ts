import { describe, expect, test } from "vitest";
import { checkInverterInputCurrent, runMaxCurrentA, stringMaxCurrentA } from "@/lib/engineering";
import { acRun, coldSite, fenwickOptimizer, microDesign, stringDesign, stringRun } from "../fixtures";

describe("690.8(A) maximum circuit current (REFERENCE.md, from memory)", () => {
  test("a PV source circuit: 1.25 × Isc = 1.25 × 12.2 A = 15.25 A", () => {
    expect(stringMaxCurrentA(stringDesign())).toBeCloseTo(15.25, 9);
  });

  test("optimizer strings: the optimizer's rated output current (15 A), not 1.25 × Isc", () => {
    expect(stringMaxCurrentA(stringDesign({ moduleLevelDevice: fenwickOptimizer }))).toBe(15);
  });

  test.each([
    // strings in parallel add: 2 × 15.25 = 30.5 A
    [{ ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"] } }, 30.5],
    // inverter output circuit = continuous output current (2020 705.28(A)): 32 A
    [acRun, 32],
  ])("run %# carries %d A", (run, currentA) => {
    expect(runMaxCurrentA(stringDesign(), run)).toBeCloseTo(currentA, 9);
  });

  test("a micro-inverter branch: 20 units × 1.25 A = 25 A; 12 units named on the run → 15 A", () => {
    const design = microDesign();
    expect(runMaxCurrentA(design, design.runs[0]!)).toBe(25);
    const branch = { ...design.runs[0]!, circuit: { kind: "ac-output" as const, sources: [{ inverterId: "micro", units: 12 }] } };
    expect(runMaxCurrentA(design, branch)).toBe(15);
  });

  test("a run naming an unknown string is an input error", () => {
    const run = { ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S9"] } };
    expect(() => runMaxCurrentA(stringDesign(), run)).toThrow(/No string with id "S9"/);
  });
});

describe("short-circuit current into each inverter input (inverter listing, 110.3(B))", () => {
  test("one 12.2 A string per 18 A input passes", () => {
    const checks = checkInverterInputCurrent(stringDesign(), coldSite);
    expect(checks.map((c) => [c.status, c.value, c.limit])).toEqual([
      ["pass", 12.2, 18],
      ["pass", 12.2, 18],
    ]);
  });

  test("two strings on one input: 24.4 A > 18 A fails; at most ⌊18 / 12.2⌋ = 1 string", () => {
    const design = stringDesign();
    design.strings = design.strings.map((s) => ({ ...s, mpptIndex: 1 }));
    const [c] = checkInverterInputCurrent(design, coldSite);
    expect(c).toMatchObject({ status: "fail", value: 24.4, fix: "Put at most 1 string on this input." });
  });
});

import { describe, expect, test } from "vitest";
import { checkInverterInputCurrent, circuitConductorCount, runCircuits, runMaxCurrentA, stringMaxCurrentA } from "@/lib/engineering";
import { acRun, coldSite, fenwickOptimizer, microDesign, stringDesign, stringRun } from "../fixtures";

describe("690.8(A) maximum circuit current (REFERENCE.md, from memory)", () => {
  test("a PV source circuit: 1.25 × Isc = 1.25 × 12.2 A = 15.25 A", () => {
    expect(stringMaxCurrentA(stringDesign())).toBeCloseTo(15.25, 9);
  });

  test("optimizer strings: the optimizer's rated output current (15 A), not 1.25 × Isc", () => {
    expect(stringMaxCurrentA(stringDesign({ moduleLevelDevice: fenwickOptimizer }))).toBe(15);
  });

  test.each([
    // two strings in one raceway are two circuits: each conductor carries one string's 15.25 A
    [{ ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"] } }, 15.25],
    // strings joined in parallel before the run (a combiner) add: 2 × 15.25 = 30.5 A
    [{ ...stringRun, circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"], combined: true } }, 30.5],
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

// Table 310.15(C)(1) counts what the raceway carries: each DC circuit is a pair of conductors, each
// single-phase AC circuit two, each three-phase circuit three (a balanced neutral is not counted;
// 310.15(E), from memory).
describe("current-carrying conductors from the circuits a run holds", () => {
  const design = stringDesign();
  const dc = (stringIds: string[], combined?: boolean) => ({ ...stringRun, circuit: { kind: "dc-strings" as const, stringIds, combined } });
  test.each([
    ["one string", dc(["S1"]), 1, 2],
    ["two strings in one raceway", dc(["S1", "S2"]), 2, 4],
    ["two strings joined before the run", dc(["S1", "S2"], true), 1, 2],
  ])("%s → %d circuit(s), %d conductors", (_what, run, circuits, conductors) => {
    expect(runCircuits(design, run)).toHaveLength(circuits);
    expect(circuitConductorCount(design, run)).toBe(conductors);
  });

  test("AC outputs are one circuit after a combiner, separate circuits when the run says so", () => {
    const two = stringDesign({
      inverters: [
        { ...design.inverters[0]!, id: "a" },
        { ...design.inverters[0]!, id: "b" },
      ],
    });
    const joined = { ...acRun, circuit: { kind: "ac-output" as const, sources: [{ inverterId: "a" }, { inverterId: "b" }] } };
    expect(circuitConductorCount(two, joined)).toBe(2);
    expect(runMaxCurrentA(two, joined)).toBe(64);
    const apart = { ...joined, circuit: { ...joined.circuit, combined: false } };
    expect(circuitConductorCount(two, apart)).toBe(4);
    expect(runMaxCurrentA(two, apart)).toBe(32);
  });

  test("a three-phase output circuit counts three", () => {
    const three = stringDesign({ inverters: [{ ...design.inverters[0]!, phase: 3, acVoltageV: 208 }] });
    expect(circuitConductorCount(three, acRun)).toBe(3);
  });
});

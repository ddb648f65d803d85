import { describe, expect, test } from "vitest";
import { DesignInputError, checkConduitFill, racewayFill, runRacewayWires } from "@/lib/engineering";
import type { RacewayWire } from "@/lib/engineering";
import { acRun, coldSite, stringDesign, stringRun } from "../fixtures";

describe("conduit fill, NEC Chapter 9 Tables 1, 4, 5 (REFERENCE.md)", () => {
  // 3 × 8 AWG THWN-2 (0.0366) + 1 × 10 AWG (0.0211) = 0.1309 in²; 3/4 EMT total 0.213 / 0.4 = 0.5325 in² → 24.58 % ≤ 40 %
  test("four wires in 3/4 in EMT: 24.58 % of 40 %", () => {
    const fill = racewayFill({ ...acRun.raceway!, wires: acRun.raceway!.wires! });
    expect(fill.conductorAreaIn2).toBeCloseTo(0.1309, 10);
    expect(fill.fillPercent).toBeCloseTo(24.582, 3);
    expect(fill.allowedPercent).toBe(40);
  });

  // 1/2 EMT total 0.122 / 0.4 = 0.305 in² → 0.1309 / 0.305 = 42.92 % > 40 % → 3/4 in fits
  test("the same wires in 1/2 in EMT fail and the fix names 3/4 in", () => {
    const run = { ...acRun, raceway: { ...acRun.raceway!, tradeSize: "1/2" as const } };
    expect(checkConduitFill(stringDesign(), coldSite, run)[0]).toMatchObject({
      status: "fail",
      value: 42.92,
      limit: 40,
      fix: "Use 3/4 in EMT.",
    });
  });

  test.each([
    [1, 53],
    [2, 31],
  ])("%d wire(s) may fill %d %% (Table 1)", (count, percent) => {
    expect(racewayFill({ type: "PVC-40", tradeSize: "1/2", wires: [{ size: "10", count, insulation: "THWN-2" }] }).allowedPercent).toBe(
      percent,
    );
  });

  // The same count and size fill more with a thicker insulation: Table 5 by insulation, never THHN for all.
  // 4 × 10 AWG in 1/2 in EMT (0.305 in²): THWN-2 4 × 0.0211 = 27.67 %; XHHW-2 4 × 0.0243 = 31.87 %;
  // RHW-2 4 × 0.0437 = 57.31 % (Table 5 from memory; Table 4 REFERENCE.md).
  test.each([
    ["THWN-2", 27.67, "pass"],
    ["XHHW-2", 31.87, "pass"],
    ["RHW-2", 57.31, "fail"],
  ] as const)("4 × 10 AWG %s in 1/2 in EMT fills %d %% → %s", (insulation, percent, status) => {
    const wires: RacewayWire[] = [{ size: "10", count: 4, insulation }];
    expect(checkConduitFill(stringDesign(), coldSite, { ...acRun, raceway: { type: "EMT", tradeSize: "1/2", wires } })[0]).toMatchObject({
      status,
      value: percent,
    });
  });

  test("PV wire has no Table 5 area: the check warns and names the field instead of guessing", () => {
    const wires: RacewayWire[] = [{ size: "10", count: 4, insulation: "PV wire" }];
    const [r] = checkConduitFill(stringDesign(), coldSite, { ...acRun, raceway: { type: "EMT", tradeSize: "3/4", wires } });
    expect(r).toMatchObject({ status: "warn", value: null, field: "runs.r2.wireAreaIn2" });
    expect(r!.message).toContain("10 AWG PV wire");
  });

  test("PV wire with its data-sheet area is checked with that area", () => {
    // 4 × 0.03 in² = 0.12 of 0.5325 in² (3/4 EMT) = 22.54 %
    const wires: RacewayWire[] = [{ size: "10", count: 4, insulation: "PV wire", areaIn2: 0.03 }];
    expect(checkConduitFill(stringDesign(), coldSite, { ...acRun, raceway: { type: "EMT", tradeSize: "3/4", wires } })[0]).toMatchObject({
      status: "pass",
      value: 22.54,
    });
  });

  test("exactly 40 % passes", () => {
    // three wires of 0.122 / 3 in² each fill 0.122 of 0.305 in² = 40 %
    const run = {
      ...acRun,
      raceway: { type: "EMT" as const, tradeSize: "1/2" as const, wires: [{ size: "1/0" as const, count: 3, areaIn2: 0.122 / 3 }] },
    };
    expect(checkConduitFill(stringDesign(), coldSite, run)[0]).toMatchObject({ status: "pass", value: 40 });
  });

  test("an insulation without a Table 5 area must be entered", () => {
    expect(() => racewayFill({ type: "EMT", tradeSize: "1", wires: [{ size: "1/0", count: 3, insulation: "USE-2" }] })).toThrow(
      DesignInputError,
    );
  });

  test("a run without a raceway has nothing to check", () => {
    expect(checkConduitFill(stringDesign(), coldSite, { ...acRun, raceway: undefined })).toEqual([]);
  });

  // Two strings in one 3/4 in EMT: 4 current-carrying 10 AWG conductors (two circuits) and the EGC. Without a
  // wires list the raceway holds what the circuits need, in the run's own insulation.
  test("two strings in one raceway: the raceway holds both circuits' conductors and the EGC", () => {
    const run = {
      ...stringRun,
      circuit: { kind: "dc-strings" as const, stringIds: ["S1", "S2"] },
      raceway: { type: "EMT" as const, tradeSize: "3/4" as const },
      wireAreaIn2: 0.0266,
      egc: { size: "10" as const, material: "Cu" as const },
    };
    expect(runRacewayWires(stringDesign(), run)).toEqual([
      { size: "10", count: 4, insulation: "PV wire", areaIn2: 0.0266 },
      { size: "10", count: 1, insulation: "PV wire", areaIn2: 0.0266 },
    ]);
    // 5 × 0.0266 = 0.133 of 0.5325 in² = 24.98 %
    expect(checkConduitFill(stringDesign(), coldSite, run)[0]).toMatchObject({ status: "pass", value: 24.98 });
  });

  test("an EGC of another size than PV-wire conductors is taken as THWN-2 (common practice)", () => {
    const run = {
      ...stringRun,
      raceway: { type: "EMT" as const, tradeSize: "3/4" as const },
      wireAreaIn2: 0.0266,
      egc: { size: "8" as const, material: "Cu" as const },
    };
    expect(runRacewayWires(stringDesign(), run)[1]).toEqual({ size: "8", count: 1, insulation: "THWN-2", areaIn2: undefined });
  });
});

import { describe, expect, test } from "vitest";
import { DesignInputError, checkConduitFill, racewayFill } from "@/lib/engineering";
import { acRun, coldSite } from "../fixtures";

describe("conduit fill, NEC Chapter 9 Tables 1, 4, 5 (REFERENCE.md)", () => {
  // 3 × 8 AWG THWN-2 (0.0366) + 1 × 10 AWG (0.0211) = 0.1309 in²; 3/4 EMT total 0.213 / 0.4 = 0.5325 in² → 24.58 % ≤ 40 %
  test("four wires in 3/4 in EMT: 24.58 % of 40 %", () => {
    const fill = racewayFill(acRun.raceway!);
    expect(fill.conductorAreaIn2).toBeCloseTo(0.1309, 10);
    expect(fill.fillPercent).toBeCloseTo(24.582, 3);
    expect(fill.allowedPercent).toBe(40);
  });

  // 1/2 EMT total 0.122 / 0.4 = 0.305 in² → 0.1309 / 0.305 = 42.92 % > 40 % → 3/4 in fits
  test("the same wires in 1/2 in EMT fail and the fix names 3/4 in", () => {
    const run = { ...acRun, raceway: { ...acRun.raceway!, tradeSize: "1/2" as const } };
    expect(checkConduitFill(coldSite, run)[0]).toMatchObject({ status: "fail", value: 42.92, limit: 40, fix: "Use 3/4 in EMT." });
  });

  test.each([
    [1, 53],
    [2, 31],
  ])("%d wire(s) may fill %d %% (Table 1)", (count, percent) => {
    expect(racewayFill({ type: "PVC-40", tradeSize: "1/2", wires: [{ size: "10", count }] }).allowedPercent).toBe(percent);
  });

  test("exactly 40 % passes", () => {
    // three wires of 0.122 / 3 in² each fill 0.122 of 0.305 in² = 40 %
    const run = { ...acRun, raceway: { type: "EMT" as const, tradeSize: "1/2" as const, wires: [{ size: "1/0" as const, count: 3, areaIn2: 0.122 / 3 }] } };
    expect(checkConduitFill(coldSite, run)[0]).toMatchObject({ status: "pass", value: 40 });
  });

  test("a size without a Table 5 area must be entered", () => {
    expect(() => racewayFill({ type: "EMT", tradeSize: "1", wires: [{ size: "1/0", count: 3 }] })).toThrow(DesignInputError);
  });

  test("a run without a raceway has nothing to check", () => {
    expect(checkConduitFill(coldSite, { ...acRun, raceway: undefined })).toEqual([]);
  });
});

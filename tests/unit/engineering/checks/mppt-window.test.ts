import { describe, expect, test } from "vitest";
import { CELL_TEMP_RISE_C, cellTempC, checkMicroMpptWindow, checkMpptWindow, hotModuleVmpV } from "@/lib/engineering";
import { coldSite, fenwickOptimizer, larkspurModule, microDesign, northmereOptimizerInverter, stringDesign } from "../fixtures";

describe("minimum string voltage at high cell temperature", () => {
  test("cell temperature = high design ambient + 25 °C on a roof (common practice)", () => {
    expect(CELL_TEMP_RISE_C.roof).toBe(25);
    expect(cellTempC(stringDesign(), coldSite)).toBe(60);
    expect(cellTempC(stringDesign({ cellTempRiseC: 30 }), coldSite)).toBe(65);
  });

  test.each([
    // Pmax coefficient standing in for Vmp (common practice): 33.6 × (1 + 35 × −0.0035) = 33.6 × 0.8775 = 29.484 V
    [{ ...larkspurModule }, 29.484],
    // Vmp coefficient given: 33.6 × (1 + 35 × −0.0040) = 33.6 × 0.86 = 28.896 V
    [{ ...larkspurModule, vmpTempCoeff: { value: -0.4, unit: "%/C" as const } }, 28.896],
    // In V/°C: 33.6 + 35 × −0.12 = 29.4 V
    [{ ...larkspurModule, vmpTempCoeff: { value: -0.12, unit: "V/C" as const } }, 29.4],
  ])("hot Vmp at 60 °C cells → %d V", (module, vmpV) => {
    expect(hotModuleVmpV(module, 60)).toBeCloseTo(vmpV, 9);
  });

  test("without any coefficient there is nothing to compute", () => {
    expect(hotModuleVmpV({ ...larkspurModule, pmaxTempCoeffPctPerC: undefined }, 60)).toBeNull();
  });

  // 10 × 29.484 = 294.84 V ≥ 200 V; 6 × 29.484 = 176.9 V < 200 V → at least ⌈200 / 29.484⌉ = 7 modules
  test.each([
    [10, "pass", 294.84, undefined],
    [7, "pass", 206.39, undefined],
    [6, "warn", 176.9, "Use at least 7 modules in this string."],
  ])("%d modules → %s at %d V against the 200 V MPPT minimum", (n, status, valueV, fix) => {
    const string = { id: "S1", inverterId: "inv-1", modulesInSeries: n };
    const min = checkMpptWindow(stringDesign(), coldSite, string).find((c) => c.id === "mppt-min:S1")!;
    expect(min).toMatchObject({ status, value: valueV, limit: 200, clause: "inverter data sheet: MPPT range" }); // the window is the maker's (common practice to check it hot)
    expect(min.fix).toBe(fix);
  });

  // STC: 15 × 33.6 = 504 V > 480 V MPPT maximum → at most ⌊480 / 33.6⌋ = 14
  test("a string above the MPPT maximum at STC warns", () => {
    const string = { id: "S1", inverterId: "inv-1", modulesInSeries: 15 };
    const max = checkMpptWindow(stringDesign(), coldSite, string).find((c) => c.id === "mppt-max:S1")!;
    expect(max).toMatchObject({ status: "warn", value: 504, limit: 480, fix: "Use at most 14 modules in this string." });
  });

  test("missing coefficient warns instead of guessing", () => {
    const design = stringDesign({ module: { ...larkspurModule, pmaxTempCoeffPctPerC: undefined } });
    const min = checkMpptWindow(design, coldSite, design.strings[0]!)[0]!;
    expect(min).toMatchObject({ status: "warn", value: null });
  });

  test("optimizer strings have a fixed voltage: no MPPT window check", () => {
    const design = stringDesign({
      inverters: [northmereOptimizerInverter],
      moduleLevelDevice: fenwickOptimizer,
      strings: [{ id: "S1", inverterId: "inv-opt", modulesInSeries: 10 }],
    });
    expect(checkMpptWindow(design, coldSite, design.strings[0]!)).toEqual([]);
  });

  // Micro-inverter: one module, 29.484 V ≥ 27 V; 33.6 V ≤ 45 V
  test("micro-inverters are checked one module at a time", () => {
    const checks = checkMicroMpptWindow(microDesign(), coldSite);
    expect(checks.map((c) => [c.id, c.status, c.value])).toEqual([
      ["mppt-min:micro", "pass", 29.48],
      ["mppt-max:micro", "pass", 33.6],
    ]);
  });
});

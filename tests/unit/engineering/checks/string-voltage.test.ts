import { describe, expect, test } from "vitest";
import { DesignInputError, checkStringVoltage, coldModuleVoc, stringVoltageLimit } from "@/lib/engineering";
import { coldSite, fenwickOptimizer, larkspurModule, northmereOptimizerInverter, northmereString, stringDesign } from "../fixtures";

describe("690.7(A) module Voc at the record low", () => {
  test.each([
    // Coefficient method, NEC 690.7(A)(1) as given in REFERENCE.md:
    // 40.0 × (1 + (−20 − 25)(−0.28/100)) = 40.0 × 1.126 = 45.04 V
    [{ value: -0.28, unit: "%/C" } as const, -20, 45.04, "coefficient"],
    // Same module in V/°C: β = −0.112 V/°C → 40.0 + (−45)(−0.112) = 45.04 V
    [{ value: -0.112, unit: "V/C" } as const, -20, 45.04, "coefficient"],
    // −10 °C: 40.0 × (1 + (−35)(−0.0028)) = 40.0 × 1.098 = 43.92 V
    [{ value: -0.28, unit: "%/C" } as const, -10, 43.92, "coefficient"],
    // No coefficient → NEC Table 690.7(A): −20 °C is in the −16 to −20 row, 1.18 → 47.2 V
    [undefined, -20, 47.2, "table"],
    // Table boundary: −5 °C → 1.12 → 44.8 V; −6 °C → 1.14 → 45.6 V
    [undefined, -5, 44.8, "table"],
    [undefined, -6, 45.6, "table"],
  ])("coefficient %j at %d °C → %d V (%s method)", (coeff, tempC, vocV, method) => {
    const cold = coldModuleVoc({ ...larkspurModule, vocTempCoeff: coeff }, tempC);
    expect(cold.vocV).toBeCloseTo(vocV, 9);
    expect(cold.method).toBe(method);
  });

  test("a positive Voc coefficient is an input error", () => {
    expect(() => coldModuleVoc({ ...larkspurModule, vocTempCoeff: { value: 0.28, unit: "%/C" } }, -20)).toThrow(DesignInputError);
  });
});

describe("690.7 voltage limit: min(inverter max DC input, 600 V dwelling / 1000 V other) (REFERENCE.md)", () => {
  test.each([
    [600, true, 600],
    [1000, true, 600],
    [1000, false, 1000],
    [480, false, 480],
  ])("inverter %d V, dwelling %s → %d V", (maxDcInputV, isDwelling, limitV) => {
    expect(stringVoltageLimit({ ...northmereString, maxDcInputV }, { ...coldSite, isDwelling }).limitV).toBe(limitV);
  });
});

describe("checkStringVoltage", () => {
  const string = (n: number) => ({ id: "S1", inverterId: "inv-1", modulesInSeries: n });

  // 10 × 45.04 V = 450.4 V ≤ 600 V
  test("10 modules at −20 °C: 450.4 V passes, cited to 690.7(A) of the site's edition", () => {
    const [r] = checkStringVoltage(stringDesign(), coldSite, string(10));
    expect(r).toMatchObject({ status: "pass", value: 450.4, limit: 600, unit: "V", clause: "NEC 2020 690.7(A)", edition: 2020 });
  });

  // 13 × 45.04 = 585.52 V passes; 14 × 45.04 = 630.56 V fails and the fix says 13 (⌊600 / 45.04⌋)
  test.each([
    [13, "pass", 585.52],
    [14, "fail", 630.56],
  ])("%d modules → %s at %d V", (n, status, valueV) => {
    const [r] = checkStringVoltage(stringDesign(), coldSite, string(n));
    expect(r!.status).toBe(status);
    expect(r!.value).toBe(valueV);
    if (status === "fail") expect(r!.fix).toBe("Use at most 13 modules in this string.");
  });

  test("exactly at the limit passes: 15 modules × 40.0 V at 25 °C = 600 V", () => {
    const [r] = checkStringVoltage(stringDesign(), { ...coldSite, recordLowTempC: 25 }, string(15));
    expect(r).toMatchObject({ status: "pass", value: 600, limit: 600 });
  });

  test("zero modules is an input error", () => {
    expect(() => checkStringVoltage(stringDesign(), coldSite, string(0))).toThrow(/whole number of at least 1/);
  });

  describe("optimizer strings: fixed regulated voltage and per-string power", () => {
    const design = stringDesign({
      inverters: [northmereOptimizerInverter],
      moduleLevelDevice: fenwickOptimizer,
      strings: [{ id: "S1", inverterId: "inv-opt", modulesInSeries: 14 }],
    });

    // The string sits at the regulated 380 V whatever the temperature, against the 480 V inverter limit (690.7(B), from memory)
    test("string voltage is the regulated 380 V", () => {
      const [v] = checkStringVoltage(design, coldSite, design.strings[0]!);
      expect(v).toMatchObject({ status: "pass", value: 380, limit: 480, clause: "NEC 2020 690.7(B)" });
    });

    // 14 × 400 W = 5600 W ≤ 5700 W; 15 × 400 W = 6000 W > 5700 W → at most ⌊5700 / 400⌋ = 14
    test.each([
      [14, "pass", 5600],
      [15, "fail", 6000],
    ])("%d modules → %s (%d W)", (n, status, powerW) => {
      const checks = checkStringVoltage(design, coldSite, { id: "S1", inverterId: "inv-opt", modulesInSeries: n });
      const power = checks.find((c) => c.id === "string-power:S1")!;
      expect(power).toMatchObject({ status, value: powerW, limit: 5700 });
      if (status === "fail") expect(power.fix).toBe("Use at most 14 modules in this string.");
    });
  });

  test("a string wired to a micro-inverter is an input error", () => {
    const design = stringDesign({ inverters: [{ ...northmereString, kind: "micro" }] });
    expect(() => checkStringVoltage(design, coldSite, string(10))).toThrow(/micro-inverter/);
  });
});

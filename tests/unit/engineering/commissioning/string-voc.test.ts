import { describe, expect, test } from "vitest";
import {
  DesignInputError,
  checkStringVoc,
  moduleVocAtV,
  stringVocWindow,
  type StringTestReading,
  type TempCoefficient,
} from "@/lib/engineering";
import { FENWICK, stringReading } from "./fixtures";

describe("module Voc at a temperature: the 690.7(A)(1) coefficient arithmetic at any temperature", () => {
  test.each([
    // NEC 690.7(A)(1) (REFERENCE.md, confirmed): Voc × [1 + (T − 25) × αVoc/100]. At the record low this is
    // the packet's 11 × 37.2 × (1 + (−24 − 25) × −0.27/100) = 463.34 V.
    [37.2, { value: -0.27, unit: "%/C" }, -24, 463.34 / 11],
    // README's design-review example: 40 V × (1 + (−20 − 25) × −0.28/100) = 45.04 V.
    [40, { value: -0.28, unit: "%/C" }, -20, 45.04],
    [37.2, { value: -0.27, unit: "%/C" }, 25, 37.2], // at STC, the data sheet value
    [37.2, { value: -0.27, unit: "%/C" }, 45, 37.2 * (1 - 0.054)], // warmer: lower
    // With βVoc in V/°C: Voc + (T − 25) × β (REFERENCE.md).
    [49.4, { value: -0.136, unit: "V/C" }, 45, 49.4 - 20 * 0.136],
  ])("Voc %d V, %j, at %d °C → %d V", (voc, coeff, t, expected) => {
    expect(moduleVocAtV(voc, coeff as TempCoefficient, t)).toBeCloseTo(expected, 2);
  });
});

// The ±5 % window and the 30 °C cell rise over the air are common practice; the correction is 690.7(A)(1)'s.
describe("string open-circuit voltage before energizing", () => {
  const at = (
    vocV: number | null,
    tempC: number | null = 45,
    source: "module" | "ambient" = "module",
    over: Partial<StringTestReading> = {},
  ) => checkStringVoc(stringReading({ vocV, ...over }), { tempC, source }, 2023);

  test("window at a module temperature: 11 × 37.2 × (1 + 20 × −0.0027) = 387.1 V, ± 5 %", () => {
    const w = stringVocWindow(stringReading(), { tempC: 45, source: "module" });
    expect(w.expectedV).toBeCloseTo(387.12, 1);
    expect(w.lowV).toBeCloseTo(387.12 * 0.95, 1);
    expect(w.highV).toBeCloseTo(387.12 * 1.05, 1);
  });

  test("window from an air temperature spans cells from the air temperature to 30 °C warmer", () => {
    const w = stringVocWindow(stringReading(), { tempC: 20, source: "ambient" });
    expect(w.cellC).toEqual({ low: 20, high: 50 });
    expect(w.highV).toBeCloseTo(11 * 37.2 * (1 + 0.0135) * 1.05, 1);
    expect(w.lowV).toBeCloseTo(11 * 37.2 * (1 - 0.0675) * 0.95, 1);
  });

  test.each([
    [387, "pass"],
    [368, "pass"], // within 5 % below
    [406, "pass"], // within 5 % above
    [360, "fail"], // below the window
    [351.9, "fail"], // a module short: 10 × 35.19 V
    [422.3, "fail"], // a module too many: 12 × 35.19 V
  ])("11 modules at a 45 °C module read %d V → %s", (v, status) => {
    const r = at(v);
    expect(r).toMatchObject({ status, kind: "string-voc", id: "string-voc:S1", value: v, unit: "V", reading: "recorded" });
    expect(r.clause).toBe("module data sheet Voc, corrected as in NEC 2023 690.7(A)(1)");
  });

  test("a string a module short says so in its finding", () => {
    expect(at(351.9).message).toMatch(/1 module fewer than the design/);
    expect(at(422.3).message).toMatch(/1 module more than the design/);
    expect(at(351.9).fix).toMatch(/Do not connect the string/);
  });

  test("with a V/°C coefficient: 8 × (49.4 − 20 × 0.136) = 373.4 V at a 45 °C module", () => {
    expect(at(373, 45, "module", { ...FENWICK, modulesInSeries: 8 }).status).toBe("pass");
    expect(at(330, 45, "module", { ...FENWICK, modulesInSeries: 8 }).status).toBe("fail");
  });

  test("without a coefficient a typical crystalline −0.3 %/°C is assumed (common practice)", () => {
    const w = stringVocWindow({ modulesInSeries: 10, moduleVocV: 40 }, { tempC: 45, source: "module" });
    expect(w.expectedV).toBeCloseTo(10 * 40 * (1 - 0.06), 6);
  });

  test("from an air temperature the wider window still catches a missing module on a cool day", () => {
    expect(at(395, 10, "ambient").status).toBe("pass"); // cells somewhere between 10 and 40 °C
    expect(at(340, 10, "ambient").status).toBe("fail"); // 10 modules even with cells at 40 °C would read 357 V
  });

  test("a negative reading means reversed leads or conductors: fail", () => {
    const r = at(-387);
    expect(r).toMatchObject({ status: "fail", reading: "recorded" });
    expect(r.message).toMatch(/wrong way round/);
  });

  test.each([
    [null, 45, "warn", "missing"],
    [387, null, "warn", "missing"], // the temperature is needed to compare
    [387, 150, "fail", "invalid"], // not a plausible °C
    [Number.NaN, 45, "fail", "invalid"],
  ])("Voc %j at %j °C → %s (%s)", (v, t, status, state) => {
    expect(at(v, t)).toMatchObject({ status, reading: state });
  });

  test.each([
    [0, 37.2],
    [11, 0],
  ])("bad design facts (%d modules, Voc %d V) are input errors", (n, voc) => {
    expect(() => at(387, 45, "module", { modulesInSeries: n, moduleVocV: voc })).toThrow(DesignInputError);
  });
});

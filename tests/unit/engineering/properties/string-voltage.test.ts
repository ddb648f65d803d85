import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { checkStringVoltage, coldModuleVoc } from "@/lib/engineering";
import type { PvModule, TempCoefficient } from "@/lib/engineering";
import { coldSite, larkspurModule, stringDesign } from "../fixtures";
import { RUNS, num } from "./arbitraries";

// NEC 690.7(A) (REFERENCE.md): Voc rises as the cell gets colder, by the maker's coefficient
// (690.7(A)(1)) or by Table 690.7(A); the string voltage is N × the cold module Voc.
const coefficientArb: fc.Arbitrary<TempCoefficient> = fc.oneof(
  fc.record({ value: num(-0.6, -0.1), unit: fc.constant("%/C" as const) }),
  fc.record({ value: num(-0.3, -0.01), unit: fc.constant("V/C" as const) }),
);
const withCoefficient = (vocTempCoeff: TempCoefficient): PvModule => ({ ...larkspurModule, vocTempCoeff });
const { vocTempCoeff: _dropped, ...tableModule } = larkspurModule; // no coefficient: Table 690.7(A) applies

/** Two record lows, the colder first. */
const coldThenWarm = (min: number, max: number) =>
  fc.tuple(num(min, max), num(min, max)).map(([a, b]): readonly [number, number] => (a <= b ? [a, b] : [b, a]));

describe("690.7(A) maximum voltage: colder never means lower", () => {
  test("a colder record low never lowers the cold Voc (maker's coefficient, %/°C or V/°C)", () => {
    fc.assert(
      fc.property(coefficientArb, coldThenWarm(-60, 40), (coeff, [colderC, warmerC]) => {
        const m = withCoefficient(coeff);
        expect(coldModuleVoc(m, colderC).vocV).toBeGreaterThanOrEqual(coldModuleVoc(m, warmerC).vocV);
      }),
      RUNS,
    );
  });

  test("a colder record low never lowers the cold Voc (Table 690.7(A), −40 °C to 40 °C)", () => {
    fc.assert(
      fc.property(coldThenWarm(-40, 40), ([colderC, warmerC]) => {
        const colder = coldModuleVoc(tableModule, colderC);
        expect(colder.method).toBe("table");
        expect(colder.vocV).toBeGreaterThanOrEqual(coldModuleVoc(tableModule, warmerC).vocV);
      }),
      RUNS,
    );
  });

  test("the cold Voc is never below the STC Voc at or below 25 °C, by either method", () => {
    fc.assert(
      fc.property(fc.option(coefficientArb, { nil: undefined }), num(-40, 25), (coeff, lowC) => {
        const m = coeff ? withCoefficient(coeff) : tableModule;
        expect(coldModuleVoc(m, lowC).vocV).toBeGreaterThanOrEqual(m.vocV - 1e-9);
      }),
      RUNS,
    );
  });

  test("a colder record low never lowers the string voltage, by either method", () => {
    fc.assert(
      fc.property(
        fc.option(coefficientArb, { nil: undefined }),
        fc.integer({ min: 1, max: 25 }),
        coldThenWarm(-40, 40),
        (coeff, n, [colderC, warmerC]) => {
          const design = stringDesign({ module: coeff ? withCoefficient(coeff) : tableModule });
          const string = { id: "S1", inverterId: "inv-1", modulesInSeries: n };
          const [colder] = checkStringVoltage(design, { ...coldSite, recordLowTempC: colderC }, string);
          const [warmer] = checkStringVoltage(design, { ...coldSite, recordLowTempC: warmerC }, string);
          expect(colder!.value!).toBeGreaterThanOrEqual(warmer!.value!);
          // A failing string is never reported as passing when the site gets colder.
          if (warmer!.status === "fail") expect(colder!.status).toBe("fail");
        },
      ),
      RUNS,
    );
  });

  test("one more module in series never lowers the string voltage", () => {
    fc.assert(
      fc.property(fc.option(coefficientArb, { nil: undefined }), fc.integer({ min: 1, max: 24 }), num(-40, 40), (coeff, n, lowC) => {
        const design = stringDesign({ module: coeff ? withCoefficient(coeff) : tableModule });
        const site = { ...coldSite, recordLowTempC: lowC };
        const [shorter] = checkStringVoltage(design, site, { id: "S1", inverterId: "inv-1", modulesInSeries: n });
        const [longer] = checkStringVoltage(design, site, { id: "S1", inverterId: "inv-1", modulesInSeries: n + 1 });
        expect(longer!.value!).toBeGreaterThan(shorter!.value!);
      }),
      RUNS,
    );
  });
});

import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { conditionsOfUse, evaluateConductor, tableAmpacityA } from "@/lib/engineering";
import type { ConditionsOfUse, ConductorSpec, InsulationTempC, TerminalTempC } from "@/lib/engineering";
import { conductorCountAdjustmentFactor } from "@/lib/engineering/tables/adjustment-factors";
import { temperatureCorrectionFactor } from "@/lib/engineering/tables/temperature-correction";
import { coldSite, stringRun } from "../fixtures";
import { RUNS, editionArb, listedSizes, materialArb, num } from "./arbitraries";

// Table 310.16 (2017: 310.15(B)(16)) columns grow with size; correction (310.15(B)(1), 2017
// 310.15(B)(2)(a)) falls as the ambient rises; adjustment (310.15(C)(1), 2017 310.15(B)(3)(a))
// falls as more current-carrying conductors share a raceway. REFERENCE.md, confirmed tables.
const columnArb = fc.constantFrom<TerminalTempC>(60, 75, 90);
const insulationArb = fc.constantFrom<InsulationTempC>(75, 90);

/** A material with two of its listed sizes, the smaller first. */
const sizePairArb = materialArb.chain((material) => {
  const sizes = listedSizes(material);
  return fc
    .tuple(fc.integer({ min: 0, max: sizes.length - 1 }), fc.integer({ min: 0, max: sizes.length - 1 }))
    .map(([a, b]) => ({ material, smaller: sizes[Math.min(a, b)]!, larger: sizes[Math.max(a, b)]! }));
});

const conditionsArb: fc.Arbitrary<ConditionsOfUse> = fc
  .record({
    ambientTempC: num(-20, 60),
    roofClearanceIn: fc.option(num(0, 12), { nil: undefined }),
    currentCarryingConductors: fc.integer({ min: 1, max: 50 }),
    insulation: fc.constantFrom("PV wire", "THWN-2", "XHHW-2"),
    edition: editionArb,
  })
  .map(({ edition, insulation, ...run }) =>
    conditionsOfUse({ ...stringRun, ...run, conductor: { ...stringRun.conductor, insulation } }, { ...coldSite, necEdition: edition }, 2),
  );

describe("ampacity: bigger conductors carry more, hotter and fuller raceways carry less", () => {
  test("a bigger conductor never has a lower table ampacity, in any column or edition", () => {
    fc.assert(
      fc.property(sizePairArb, columnArb, editionArb, ({ material, smaller, larger }, columnC, edition) => {
        expect(tableAmpacityA(larger, material, columnC, edition)).toBeGreaterThanOrEqual(
          tableAmpacityA(smaller, material, columnC, edition),
        );
      }),
      RUNS,
    );
  });

  test("a bigger conductor never has a lower terminal, corrected or usable ampacity", () => {
    fc.assert(
      fc.property(
        sizePairArb,
        insulationArb,
        columnArb,
        conditionsArb,
        editionArb,
        num(0, 200),
        (pair, insulationTempC, terminalC, conditions, edition, currentA) => {
          const spec = (size: ConductorSpec["size"]): ConductorSpec => ({ size, material: pair.material, insulationTempC });
          const small = evaluateConductor(spec(pair.smaller), terminalC, currentA, conditions, edition);
          const big = evaluateConductor(spec(pair.larger), terminalC, currentA, conditions, edition);
          expect(big.terminalAmpacityA).toBeGreaterThanOrEqual(small.terminalAmpacityA);
          expect(big.correctedAmpacityA).toBeGreaterThanOrEqual(small.correctedAmpacityA);
          expect(big.usableAmpacityA).toBeGreaterThanOrEqual(small.usableAmpacityA);
          // A conductor that passes never fails when it is made bigger.
          if (small.passesTerminal) expect(big.passesTerminal).toBe(true);
          if (small.passesConditions) expect(big.passesConditions).toBe(true);
        },
      ),
      RUNS,
    );
  });

  test("more current-carrying conductors never raise the adjustment factor", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 200 }), fc.integer({ min: 1, max: 200 }), (a, b) => {
        const [fewer, more] = a <= b ? [a, b] : [b, a];
        expect(conductorCountAdjustmentFactor(more)).toBeLessThanOrEqual(conductorCountAdjustmentFactor(fewer));
        expect(conductorCountAdjustmentFactor(more)).toBeGreaterThan(0);
        expect(conductorCountAdjustmentFactor(fewer)).toBeLessThanOrEqual(1);
      }),
      RUNS,
    );
  });

  test("a hotter ambient never raises the correction factor (75 °C and 90 °C columns)", () => {
    fc.assert(
      fc.property(insulationArb, num(-40, 100), num(-40, 100), (insulationTempC, a, b) => {
        const [cooler, hotter] = a <= b ? [a, b] : [b, a];
        const hot = temperatureCorrectionFactor(hotter, insulationTempC);
        expect(hot).toBeLessThanOrEqual(temperatureCorrectionFactor(cooler, insulationTempC));
        expect(hot).toBeGreaterThanOrEqual(0);
      }),
      RUNS,
    );
  });

  test("a hotter ambient never raises the correction a run gets where installed, rooftop adder included", () => {
    fc.assert(
      fc.property(num(-20, 60), num(-20, 60), fc.option(num(0, 12), { nil: undefined }), editionArb, (a, b, roofClearanceIn, edition) => {
        const [cooler, hotter] = a <= b ? [a, b] : [b, a];
        const site = { ...coldSite, necEdition: edition };
        const at = (ambientTempC: number) => conditionsOfUse({ ...stringRun, ambientTempC, roofClearanceIn }, site, 2).correctionFactor;
        expect(at(hotter)).toBeLessThanOrEqual(at(cooler));
      }),
      RUNS,
    );
  });
});

import { describe, expect, test } from "vitest";
import { DesignInputError, conditionsOfUse } from "@/lib/engineering";
import { coldSite, stringRun } from "../fixtures";

describe("conditions of use for a run (NEC 2020 310.15(B)(1), 310.15(B)(2), 310.15(C)(1))", () => {
  // 35 °C air + 33 °C adder = 68 °C → 0.58 (90 °C column); 6 CCCs → 0.8
  test("site ambient, rooftop adder and conductor count combine", () => {
    const c = conditionsOfUse({ ...stringRun, roofClearanceIn: 0.5, currentCarryingConductors: 6 }, coldSite, 2);
    expect(c).toEqual({
      ambientC: 35,
      rooftopAdderC: 33,
      effectiveAmbientC: 68,
      correctionFactor: 0.58,
      currentCarryingConductors: 6,
      adjustmentFactor: 0.8,
    });
  });

  // An attic run at 50 °C: 0.82 (90 °C column), no adder, the default 2 CCCs
  test("a run's own ambient overrides the site's", () => {
    const c = conditionsOfUse({ ...stringRun, roofClearanceIn: undefined, ambientTempC: 50 }, coldSite, 2);
    expect(c).toMatchObject({ effectiveAmbientC: 50, correctionFactor: 0.82, adjustmentFactor: 1 });
  });

  test("a negative height above the roof is an input error", () => {
    expect(() => conditionsOfUse({ ...stringRun, roofClearanceIn: -1 }, coldSite, 2)).toThrow(DesignInputError);
  });
});

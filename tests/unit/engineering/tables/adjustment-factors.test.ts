import { describe, expect, test } from "vitest";
import { DesignInputError } from "@/lib/engineering";
import { conductorCountAdjustmentFactor } from "@/lib/engineering/tables/adjustment-factors";

describe("NEC 2020/2023 Table 310.15(C)(1) (2017 Table 310.15(B)(3)(a)) more than three CCCs (REFERENCE.md, confirmed)", () => {
  test.each([
    [1, 1.0],
    [3, 1.0], // three or fewer: no adjustment
    [4, 0.8], // boundary: the fourth conductor
    [6, 0.8],
    [7, 0.7],
    [9, 0.7],
    [10, 0.5],
    [20, 0.5],
    [21, 0.45],
    [31, 0.4],
    [41, 0.35],
  ])("%d current-carrying conductors → %d", (count, factor) => {
    expect(conductorCountAdjustmentFactor(count)).toBe(factor);
  });

  test.each([0, -2, 2.5])("%d conductors is an input error", (count) => {
    expect(() => conductorCountAdjustmentFactor(count)).toThrow(DesignInputError);
  });
});

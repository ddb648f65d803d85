import { describe, expect, test } from "vitest";
import {
  DEFAULT_LOSS_FRACTION,
  DesignInputError,
  PVWATTS_V5_DEFAULT_LOSSES_PERCENT,
  annualProductionKwh,
  combinedLossFraction,
} from "@/lib/engineering";

describe("production estimate (NREL/TP-6A20-62641 PVWatts v5 default losses 14.08 %)", () => {
  test("the ten default losses combine multiplicatively to 14.08 %", () => {
    // 1 − (0.98 × 0.97 × 1 × 0.98 × 0.98 × 0.995 × 0.985 × 0.99 × 1 × 0.97) = 1 − 0.859243 = 0.140757
    expect(Object.keys(PVWATTS_V5_DEFAULT_LOSSES_PERCENT)).toHaveLength(10);
    expect(DEFAULT_LOSS_FRACTION).toBeCloseTo(0.140757, 6);
    expect(Math.round(DEFAULT_LOSS_FRACTION * 10000) / 100).toBe(14.08);
  });

  test("losses multiply, they do not add: 10 % and 10 % → 19 %", () => {
    expect(combinedLossFraction({ a: 10, b: 10 })).toBeCloseTo(0.19, 12);
  });

  test.each([
    // 4 kW × 5 h × 365 × 0.859243 = 6272.48 kWh
    [4, 5, 6272.48],
    // 8 kW × 4.5 h × 365 × 0.859243 = 11290.46 kWh
    [8, 4.5, 11290.46],
  ])("%d kW DC at %d peak sun hours → %d kWh/yr", (dcKw, psh, kwh) => {
    expect(annualProductionKwh(dcKw, psh)).toBeCloseTo(kwh, 1);
  });

  test("a custom loss: 8 kW × 5 h × 365 × (1 − 0.2) = 11 680 kWh", () => {
    expect(annualProductionKwh(8, 5, 0.2)).toBeCloseTo(11680, 9);
  });

  test.each([
    [8, 0],
    [-1, 5],
  ])("bad input (%d kW, %d h) throws a typed error", (dcKw, psh) => {
    expect(() => annualProductionKwh(dcKw, psh)).toThrow(DesignInputError);
  });
});

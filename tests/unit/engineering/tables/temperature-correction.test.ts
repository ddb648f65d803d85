import { describe, expect, test } from "vitest";
import { temperatureCorrectionFactor } from "@/lib/engineering/tables/temperature-correction";

describe("NEC 2020/2023 Table 310.15(B)(1) (2017 Table 310.15(B)(2)(a)) ambient correction, 30 °C base (REFERENCE.md, confirmed via IRC Table E3705.2)", () => {
  test.each([
    [5, 1.2, 1.15],
    [10, 1.2, 1.15],
    [11, 1.15, 1.12],
    [30, 1.0, 1.0], // table base
    [31, 0.94, 0.96], // boundary: first degree above the base
    [35, 0.94, 0.96],
    [36, 0.88, 0.91],
    [45, 0.82, 0.87],
    [68, 0.33, 0.58], // 35 °C air + 33 °C rooftop adder
    [70, 0.33, 0.58],
  ])("%d °C → 75 °C insulation %d, 90 °C insulation %d", (ambientC, f75, f90) => {
    expect(temperatureCorrectionFactor(ambientC, 75)).toBe(f75);
    expect(temperatureCorrectionFactor(ambientC, 90)).toBe(f90);
  });

  test("a fractional ambient takes the hotter row", () => {
    expect(temperatureCorrectionFactor(30.5, 90)).toBe(0.96);
  });

  test("75 °C insulation may not be used above 70 °C; 90 °C stops after 85 °C", () => {
    expect(temperatureCorrectionFactor(71, 75)).toBe(0);
    expect(temperatureCorrectionFactor(85, 90)).toBe(0.29);
    expect(temperatureCorrectionFactor(86, 90)).toBe(0);
  });
});

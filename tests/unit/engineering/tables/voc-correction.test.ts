import { describe, expect, test } from "vitest";
import { DesignInputError } from "@/lib/engineering";
import { vocCorrectionFactor } from "@/lib/engineering/tables/voc-correction";

describe("Table 690.7(A) Voc correction factors (NEC 2017/2020/2023 Table 690.7(A), via REFERENCE.md)", () => {
  test.each([
    [24, 1.02],
    [20, 1.02],
    [19, 1.04],
    [0, 1.1],
    [-1, 1.12],
    [-5, 1.12], // boundary: −1 to −5 row
    [-6, 1.14], // boundary: first degree of the −6 to −10 row
    [-5.5, 1.14], // between rows: the colder row, the safe side
    [-20, 1.18],
    [-21, 1.2],
    [-30, 1.21],
    [-31, 1.23],
    [-40, 1.25],
  ])("%d °C → %d", (tempC, factor) => {
    expect(vocCorrectionFactor(tempC)).toBe(factor);
  });

  test("at 25 °C (STC) and above nothing is corrected", () => {
    expect(vocCorrectionFactor(25)).toBe(1);
    expect(vocCorrectionFactor(30)).toBe(1);
  });

  test("below −40 °C the table ends and the error asks for the coefficient", () => {
    expect(() => vocCorrectionFactor(-41)).toThrow(DesignInputError);
    expect(() => vocCorrectionFactor(-41)).toThrow(/coefficient/);
  });
});

import { describe, expect, test } from "vitest";
import { CONDUCTOR_SIZES, areaCmil } from "@/lib/engineering";

// AWG definition: d = 0.005 in × 92^((36 − n)/39); area in circular mils = (d in mils)². 1/0 = 0, 2/0 = −1, …
const awgNumber: Record<string, number> = { "1/0": 0, "2/0": -1, "3/0": -2, "4/0": -3 };
const fromDefinition = (size: string) => {
  const n = awgNumber[size] ?? Number(size);
  const dMils = 5 * 92 ** ((36 - n) / 39);
  return dMils * dMils;
};

describe("NEC Chapter 9 Table 8 conductor areas (circular mils)", () => {
  // Table 8 values from memory, each checked against the AWG definition (published formula, ASTM B258).
  test.each(CONDUCTOR_SIZES.filter((s) => s !== "250" && s !== "300"))("%s AWG agrees with the AWG definition within 0.5 %%", (size) => {
    expect(Math.abs(areaCmil(size) / fromDefinition(size) - 1)).toBeLessThan(0.005);
  });

  test.each([
    ["250", 250_000],
    ["300", 300_000],
  ] as const)("%s kcmil is %d cmil by its name", (size, cmil) => {
    expect(areaCmil(size)).toBe(cmil);
  });

  test("areas grow with size", () => {
    const areas = CONDUCTOR_SIZES.map(areaCmil);
    expect([...areas].sort((a, b) => a - b)).toEqual(areas);
  });
});

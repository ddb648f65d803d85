import { describe, expect, test } from "vitest";
import { DesignInputError } from "@/lib/engineering";
import { resistanceOhmPerKft } from "@/lib/engineering/tables/conductor-resistance";

describe("NEC Chapter 9 Table 8 resistance at 75 °C, Ω/kft (REFERENCE.md)", () => {
  test.each([
    ["10", "Cu", "solid", 1.21], // confirmed
    ["10", "Cu", "stranded", 1.24], // from memory
    ["14", "Cu", "solid", 3.07], // confirmed
    ["14", "Cu", "stranded", 3.14], // from memory
    ["8", "Cu", "solid", 0.764], // confirmed
    ["8", "Cu", "stranded", 0.778], // from memory
    ["6", "Cu", "stranded", 0.491], // confirmed
    ["4/0", "Cu", "stranded", 0.0608], // confirmed
    ["10", "Al", "stranded", 2.0], // confirmed
    ["1/0", "Al", "stranded", 0.201], // confirmed
  ] as const)("%s AWG %s %s → %d", (size, material, stranding, ohms) => {
    expect(resistanceOhmPerKft(size, material, stranding)).toBe(ohms);
  });

  test("stranding defaults to stranded, as PV field wiring normally is", () => {
    expect(resistanceOhmPerKft("10", "Cu")).toBe(1.24);
  });

  test("solid is listed only up to 8 AWG; 6 AWG solid is an input error", () => {
    expect(() => resistanceOhmPerKft("6", "Cu", "solid")).toThrow(DesignInputError);
  });

  test("temperature correction R2 = R1 × [1 + α(T2 − 75)], α = 0.00323 Cu (REFERENCE.md)", () => {
    // 10 AWG Cu stranded at 50 °C: 1.24 × (1 + 0.00323 × −25) = 1.24 × 0.91925 = 1.13987
    expect(resistanceOhmPerKft("10", "Cu", "stranded", 50)).toBeCloseTo(1.13987, 5);
    // 10 AWG Al at 90 °C: 2.00 × (1 + 0.0033 × 15) = 2.099
    expect(resistanceOhmPerKft("10", "Al", "stranded", 90)).toBeCloseTo(2.099, 6);
  });

  test("unknown sizes are input errors", () => {
    expect(() => resistanceOhmPerKft("7", "Cu")).toThrow(/Table 8/);
  });
});

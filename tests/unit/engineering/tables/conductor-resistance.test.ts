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
    // Aluminum 14–8 AWG: stranded and solid differ; an earlier copy held the solid values as stranded.
    ["14", "Al", "stranded", 5.17], // from memory (REFERENCE.md, corrected)
    ["12", "Al", "stranded", 3.25], // from memory (REFERENCE.md, corrected)
    ["10", "Al", "stranded", 2.04], // from memory (REFERENCE.md, corrected)
    ["8", "Al", "stranded", 1.28], // from memory (REFERENCE.md, corrected)
    ["14", "Al", "solid", 5.06], // REFERENCE.md
    ["10", "Al", "solid", 2.0], // REFERENCE.md
    ["8", "Al", "solid", 1.26], // REFERENCE.md
    ["6", "Al", "stranded", 0.808], // confirmed
    ["1/0", "Al", "stranded", 0.201], // confirmed
  ] as const)("%s AWG %s %s → %d", (size, material, stranding, ohms) => {
    expect(resistanceOhmPerKft(size, material, stranding)).toBe(ohms);
  });

  test("stranding defaults to stranded, as PV field wiring normally is", () => {
    expect(resistanceOhmPerKft("10", "Cu")).toBe(1.24);
  });

  test("solid is listed only up to 8 AWG; 6 AWG solid is an input error", () => {
    expect(() => resistanceOhmPerKft("6", "Cu", "solid")).toThrow(DesignInputError);
    expect(() => resistanceOhmPerKft("6", "Al", "solid")).toThrow(DesignInputError);
  });

  // Stranding adds resistance over solid of the same size in Table 8, for both metals (14–8 AWG).
  test.each(["14", "12", "10", "8"] as const)("%s AWG stranded is above solid, copper and aluminum", (size) => {
    expect(resistanceOhmPerKft(size, "Cu", "stranded")).toBeGreaterThan(resistanceOhmPerKft(size, "Cu", "solid"));
    expect(resistanceOhmPerKft(size, "Al", "stranded")).toBeGreaterThan(resistanceOhmPerKft(size, "Al", "solid"));
  });

  test("temperature correction R2 = R1 × [1 + α(T2 − 75)], α = 0.00323 Cu (REFERENCE.md)", () => {
    // 10 AWG Cu stranded at 50 °C: 1.24 × (1 + 0.00323 × −25) = 1.24 × 0.91925 = 1.13987
    expect(resistanceOhmPerKft("10", "Cu", "stranded", 50)).toBeCloseTo(1.13987, 5);
    // 10 AWG Al stranded at 90 °C: 2.04 × (1 + 0.0033 × 15) = 2.14098
    expect(resistanceOhmPerKft("10", "Al", "stranded", 90)).toBeCloseTo(2.14098, 6);
  });

  test("unknown sizes are input errors", () => {
    expect(() => resistanceOhmPerKft("7", "Cu")).toThrow(/Table 8/);
  });
});

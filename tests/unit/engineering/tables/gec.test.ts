import { describe, expect, test } from "vitest";
import { table250_66GecSize } from "@/lib/engineering/tables/gec";

describe("NEC Table 250.66 grounding electrode conductor (REFERENCE.md)", () => {
  test.each([
    ["2", "Cu", "8", "6"], // Cu 2 AWG or smaller → 8 Cu / 6 Al
    ["1/0", "Al", "8", "6"], // Al 1/0 or smaller → 8 Cu / 6 Al
    ["1", "Cu", "6", "4"], // Cu 1 or 1/0 → 6 Cu / 4 Al
    ["1/0", "Cu", "6", "4"],
    ["2/0", "Al", "6", "4"], // Al 2/0 or 3/0 → 6 Cu / 4 Al
    ["2/0", "Cu", "4", "2"], // Cu 2/0 or 3/0 → 4 Cu / 2 Al
    ["4/0", "Al", "4", "2"], // Al 4/0 or 250 → 4 Cu / 2 Al
    ["4/0", "Cu", "2", "1/0"], // Cu over 3/0 through 350 → 2 Cu / 1/0 Al
    ["300", "Al", "2", "1/0"], // Al over 250 through 500 → 2 Cu / 1/0 Al
  ] as const)("service conductors %s %s → %s Cu / %s Al", (size, material, cu, al) => {
    expect(table250_66GecSize({ size, material }, "Cu")).toBe(cu);
    expect(table250_66GecSize({ size, material }, "Al")).toBe(al);
  });
});

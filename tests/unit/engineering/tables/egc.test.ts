import { describe, expect, test } from "vitest";
import { DesignInputError } from "@/lib/engineering";
import { minimumEgcSize } from "@/lib/engineering/tables/egc";

describe("NEC Table 250.122 equipment grounding conductor by OCPD (REFERENCE.md, confirmed)", () => {
  test.each([
    [15, "14", "12"],
    [20, "12", "10"],
    [25, "10", "8"], // between rows: the next row up (60 A)
    [40, "10", "8"],
    [60, "10", "8"],
    [61, "8", "6"],
    [100, "8", "6"],
    [200, "6", "4"],
    [300, "4", "2"],
    [400, "3", "1"],
    [800, "1/0", "3/0"],
    [1000, "2/0", "4/0"],
  ])("%d A → %s AWG Cu / %s AWG Al", (ocpdA, cu, al) => {
    expect(minimumEgcSize(ocpdA, "Cu")).toBe(cu);
    expect(minimumEgcSize(ocpdA, "Al")).toBe(al);
  });

  test("beyond the table, or a zero rating, is an input error", () => {
    expect(() => minimumEgcSize(1200, "Cu")).toThrow(DesignInputError);
    expect(() => minimumEgcSize(0, "Cu")).toThrow(DesignInputError);
  });
});

import { describe, expect, test } from "vitest";
import { allowedFillPercent, racewayAreaIn2, thhnAreaIn2 } from "@/lib/engineering/tables/conduit";

describe("NEC Chapter 9 Tables 1, 4 and 5 (REFERENCE.md)", () => {
  test.each([
    [1, 53],
    [2, 31],
    [3, 40],
    [9, 40],
  ])("Table 1: %d conductor(s) → %d %%", (count, percent) => {
    expect(allowedFillPercent(count)).toBe(percent);
  });

  test.each([
    ["EMT", "3/4", 0.213],
    ["EMT", "1", 0.346],
    ["PVC-40", "3/4", 0.203],
    ["PVC-40", "2", 1.316],
  ] as const)("Table 4: %s %s in has %d in² at 40 %%", (type, tradeSize, area40) => {
    expect(racewayAreaIn2(type, tradeSize) * 0.4).toBeCloseTo(area40, 10);
  });

  test.each([
    ["14", 0.0097],
    ["10", 0.0211],
    ["8", 0.0366],
    ["6", 0.0507], // from memory
    ["2", 0.1158], // from memory
  ] as const)("Table 5: THHN/THWN-2 %s AWG is %d in²", (size, area) => {
    expect(thhnAreaIn2(size)).toBe(area);
  });

  test("sizes above 2 AWG are not in our copy of Table 5", () => {
    expect(thhnAreaIn2("1/0")).toBeNull();
  });
});

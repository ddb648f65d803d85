import { describe, expect, test } from "vitest";
import { allowedFillPercent, racewayAreaIn2, table5AreaIn2, table5Insulation } from "@/lib/engineering/tables/conduit";

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
    ["THWN-2", "14", 0.0097], // REFERENCE.md
    ["THHN/THWN-2", "10", 0.0211], // REFERENCE.md
    ["THWN-2", "8", 0.0366], // REFERENCE.md
    ["THWN-2", "6", 0.0507], // REFERENCE.md, from memory
    ["THWN-2", "2", 0.1158], // REFERENCE.md, from memory
    ["THWN-2", "1/0", 0.1855], // from memory
    ["XHHW-2", "10", 0.0243], // from memory
    ["XHHW-2", "6", 0.059], // from memory
    ["XHHW", "1/0", 0.1825], // from memory
    ["RHW-2", "10", 0.0437], // with outer covering, from memory
    ["RHW-2/USE-2", "8", 0.0835], // dual-rated cable read by its first type; from memory
  ] as const)("Chapter 9 Table 5: %s %s AWG is %d in²", (insulation, size, area) => {
    expect(table5AreaIn2(insulation, size)).toBe(area);
  });

  test.each([
    ["THWN-2", "THHN/THWN-2"],
    ["thhn", "THHN/THWN-2"],
    ["XHHW-2", "XHHW-2"],
    ["RHH/RHW-2/USE-2", "RHW-2"],
    ["PV wire", null], // not in Table 5
    ["USE-2", null], // not in Table 5 on its own (from memory)
    [undefined, null],
  ] as const)("insulation %s reads as Table 5 family %s", (insulation, family) => {
    expect(table5Insulation(insulation)).toBe(family);
  });

  // XHHW-2 is thinner than RHW-2 and thicker than THHN in the small sizes (Table 5, from memory): a unit
  // or column slip would break this order.
  test.each(["14", "12", "10", "8", "6"] as const)("%s AWG: THHN < XHHW-2 < RHW-2", (size) => {
    expect(table5AreaIn2("THWN-2", size)!).toBeLessThan(table5AreaIn2("XHHW-2", size)!);
    expect(table5AreaIn2("XHHW-2", size)!).toBeLessThan(table5AreaIn2("RHW-2", size)!);
  });
});

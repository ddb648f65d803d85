import { describe, expect, test } from "vitest";
import { smallConductorMaxOcpdA } from "@/lib/engineering/tables/small-conductor-limits";

describe("NEC 240.4(D) small conductors (REFERENCE.md, from memory)", () => {
  test.each([
    ["14", "Cu", 15],
    ["12", "Cu", 20],
    ["10", "Cu", 30],
    ["8", "Cu", null],
    ["12", "Al", 15],
    ["10", "Al", 25],
    ["8", "Al", null],
  ] as const)("%s AWG %s → at most %s A", (size, material, limitA) => {
    expect(smallConductorMaxOcpdA(size, material)).toBe(limitA);
  });
});

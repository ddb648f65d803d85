import { describe, expect, test } from "vitest";
import { applicableLines, computeFees, isInEffect } from "@/lib/fees";
import { ASHCOMBE, BRINDLE, facts, feeLine } from "./fixtures";

// Invented schedules (demo). Ashcombe raised its building permit from $200.00 to $250.00 on
// 2026-07-01 by adding a new version; its plan review fee ran for calendar year 2025 only.
// Brindle Valley Power's interconnection application fee began 2025-03-01.
const flat = (amountCents: number) => ({ kind: "flat", amountCents }) as const;
const schedule = [
  feeLine(flat(20_000), { id: "permit-2024", authority: ASHCOMBE, effectiveFrom: "2024-01-01" }),
  feeLine(flat(7_500), {
    id: "plan-review",
    authority: ASHCOMBE,
    name: "Plan review",
    effectiveFrom: "2025-01-01",
    effectiveUntil: "2026-01-01",
  }),
  feeLine(flat(25_000), { id: "permit-2026", authority: ASHCOMBE, effectiveFrom: "2026-07-01" }),
  feeLine(flat(10_000), { id: "interconnect", authority: BRINDLE, name: "Interconnection application fee", effectiveFrom: "2025-03-01" }),
];

describe("which lines apply on a day", () => {
  test.each([
    ["2023-12-31", [], 0], // before every line
    ["2024-01-01", ["permit-2024"], 20_000], // the start date is included
    ["2025-02-28", ["permit-2024", "plan-review"], 27_500], // $200 + $75
    ["2025-03-01", ["permit-2024", "plan-review", "interconnect"], 37_500], // $200 + $75 + $100
    ["2025-12-31", ["permit-2024", "plan-review", "interconnect"], 37_500], // the last day of plan review
    ["2026-01-01", ["permit-2024", "interconnect"], 30_000], // the end date is excluded: $200 + $100
    ["2026-06-30", ["permit-2024", "interconnect"], 30_000], // the new permit version is not yet in effect
    ["2026-07-01", ["permit-2026", "interconnect"], 35_000], // it supersedes the old one: $250 + $100
  ])("on %s: %j, %d ¢", (asOf, lineIds, totalCents) => {
    const result = computeFees({ lines: schedule, facts: facts({ asOf }) });
    expect(result.lines.map((line) => line.lineId)).toEqual(lineIds);
    expect(result.totalCents).toBe(totalCents);
  });

  test.each([
    ["2025-12-31", true],
    ["2025-01-01", true],
    ["2024-12-31", false],
    ["2026-01-01", false],
  ])("plan review (2025-01-01 up to 2026-01-01) in effect on %s: %s", (asOf, expected) => {
    expect(isInEffect(schedule[1]!, asOf)).toBe(expected);
  });
});

describe("versions of one fee", () => {
  test("an old version comes back when the newer one ends and the old one never did", () => {
    const lines = [
      feeLine(flat(20_000), { id: "standing", effectiveFrom: "2024-01-01" }),
      feeLine(flat(0), { id: "waiver", effectiveFrom: "2025-06-01", effectiveUntil: "2025-09-01" }), // a summer waiver
    ];
    expect(applicableLines(lines, "2025-07-15").map((line) => line.id)).toEqual(["waiver"]);
    expect(applicableLines(lines, "2025-09-01").map((line) => line.id)).toEqual(["standing"]);
  });

  test("names match regardless of case and spacing", () => {
    const lines = [
      feeLine(flat(20_000), { id: "old", effectiveFrom: "2024-01-01" }),
      feeLine(flat(25_000), { id: "new", name: "  building   PERMIT", effectiveFrom: "2025-01-01" }),
    ];
    expect(applicableLines(lines, "2026-01-01").map((line) => line.id)).toEqual(["new"]);
  });

  test("lines of different authorities never supersede each other, even with one name", () => {
    const lines = [
      feeLine(flat(5_000), { id: "town", name: "Application fee", authority: ASHCOMBE, effectiveFrom: "2024-01-01" }),
      feeLine(flat(10_000), { id: "utility", name: "Application fee", authority: BRINDLE, effectiveFrom: "2025-01-01" }),
    ];
    expect(applicableLines(lines, "2026-01-01").map((line) => line.id)).toEqual(["town", "utility"]);
  });

  test("results keep the schedule's order, whichever version won", () => {
    const lines = [
      feeLine(flat(1), { id: "review", name: "Plan review" }),
      feeLine(flat(2), { id: "permit-new", effectiveFrom: "2025-06-01" }),
      feeLine(flat(3), { id: "permit-old", effectiveFrom: "2024-01-01" }),
    ];
    expect(applicableLines(lines, "2026-01-01").map((line) => line.id)).toEqual(["review", "permit-new"]);
  });
});

import { describe, expect, it } from "vitest";
import { isStage, NEXT_ACTION, STAGE_LABELS, STAGES, stageIndex } from "@/lib/domain/stages";

describe("stages", () => {
  it("run from draft to closed with PTO before closing", () => {
    expect(STAGES[0]).toBe("draft");
    expect(STAGES.at(-1)).toBe("closed");
    expect(stageIndex("pto_received")).toBe(STAGES.length - 2);
    expect(stageIndex("inspection_passed")).toBeLessThan(stageIndex("utility_approved"));
  });

  it("have a label and a next action each", () => {
    for (const stage of STAGES) {
      expect(STAGE_LABELS[stage]).toMatch(/\S/);
      expect(NEXT_ACTION[stage]).toMatch(/\S/);
    }
  });

  it.each([
    ["permit_filed", true],
    ["Permit filed", false],
    ["approved", false],
    ["", false],
  ])("isStage(%j) is %s", (value, expected) => {
    expect(isStage(value)).toBe(expected);
  });
});

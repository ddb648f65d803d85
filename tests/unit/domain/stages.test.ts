import { describe, expect, it, test } from "vitest";
import { isStage, NEXT_ACTION, STAGE_LABELS, STAGES, stageIndex, nextActionFor } from "@/lib/domain/stages";

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

describe("nextActionFor on a project set aside", () => {
  it.each([
    ["permit_filed", "pass", "on_hold", "On hold: take it up again once the reason is resolved"],
    ["draft", "fail", "cancelled", "Cancelled: nothing to do unless it is reopened"],
    ["permit_filed", "pass", null, NEXT_ACTION.permit_filed],
  ] as const)("%s, %s review, %s → %s", (stage, review, hold, text) => expect(nextActionFor(stage, review, hold)).toBe(text));
});

describe("nextActionFor", () => {
  // Our own workflow words (invented for the product): what the office does next follows the design's real state.
  test.each([
    ["draft", null, "Finish the design and run the review"],
    ["draft", "incomplete", "Finish the design and run the review"],
    ["draft", "fail", "Fix the failing checks of the design review"],
    ["draft", "pass", "The review passes: mark the design checked"],
    ["draft", "warn", "Read the checks that need review, then mark the design checked"],
    ["design_checked", "pass", "Assemble and file the permit packet"],
    ["design_checked", "fail", "The design no longer passes its review: fix it before filing"],
    ["permit_filed", "fail", "Follow up with the AHJ on plan review"],
  ] as const)("%s with a %s review → %s", (stage, review, text) => expect(nextActionFor(stage, review)).toBe(text));
});

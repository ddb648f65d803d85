// The change list a new packet revision prints on its cover: the comments it answers first, then what changed.
import { describe, expect, test } from "vitest";
import { describeAnswers } from "@/lib/documents/packets/changes";

const comment = (round: number, position: number, text = "Show the setbacks.", reference = "", response = "Shown on PV-1.") => ({
  round,
  position,
  text,
  reference,
  response,
});

describe("the comments a revision answers", () => {
  test("names each by round and comment number, in the reviewer's order, with its sheet or clause", () => {
    expect(
      describeAnswers([comment(2, 0), comment(1, 1, "Label the AC disconnect.", "NEC 690.13(B)", "Added to sheet PV-5."), comment(1, 0)]),
    ).toEqual([
      "Answers round 1, comment 1: Show the setbacks. — Shown on PV-1.",
      "Answers round 1, comment 2 (NEC 690.13(B)): Label the AC disconnect. — Added to sheet PV-5.",
      "Answers round 2, comment 1: Show the setbacks. — Shown on PV-1.",
    ]);
  });

  test("shortens long comments and answers so one line stays one item on the cover", () => {
    const [line] = describeAnswers([comment(1, 0, "x".repeat(400), "", "y".repeat(400))]);
    expect(line.length).toBeLessThan(320);
    expect(line).toContain("x…");
    expect(line.endsWith("y…")).toBe(true);
  });

  test("says nothing when nothing was answered", () => {
    expect(describeAnswers([])).toEqual([]);
  });
});

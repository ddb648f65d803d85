import { describe, expect, test } from "vitest";
import { checkPolarity } from "@/lib/engineering";
import { stringReading } from "./fixtures";

// Basis: the inverter's input marking (+ to +, − to −).
describe("string polarity", () => {
  test.each([
    ["correct", "pass", "recorded"],
    ["reversed", "fail", "recorded"],
    [null, "warn", "missing"],
  ] as const)("%j → %s", (polarity, status, state) => {
    expect(checkPolarity(stringReading({ polarity }), 2023)).toMatchObject({
      status,
      reading: state,
      kind: "string-polarity",
      id: "string-polarity:S1",
    });
  });

  test("a reversed string must not be landed", () => {
    expect(checkPolarity(stringReading({ polarity: "reversed" }), 2023).fix).toMatch(/Do not close the DC disconnect/);
  });
});

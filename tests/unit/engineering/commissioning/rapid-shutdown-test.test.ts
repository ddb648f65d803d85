import { describe, expect, test } from "vitest";
import { checkRapidShutdownTest } from "@/lib/engineering";

// NEC 690.12(B)(1) outside the array boundary: ≤ 30 V within 30 s; 690.12(B)(2) inside: ≤ 80 V (REFERENCE.md).
describe("rapid shutdown test vs 690.12", () => {
  test.each([
    [20, 12, "pass", "pass"],
    [30, 30, "pass", "pass"], // exactly at both limits
    [30.5, 12, "fail", "pass"],
    [12, 31, "pass", "fail"],
  ])("outside the boundary: %d V in %d s → voltage %s, time %s", (v, s, vStatus, sStatus) => {
    const [volts, secs] = checkRapidShutdownTest({ measuredV: v, seconds: s }, 2020);
    expect(volts).toMatchObject({ status: vStatus, value: v, limit: 30, unit: "V", kind: "rapid-shutdown-voltage" });
    expect(secs).toMatchObject({ status: sStatus, value: s, limit: 30, unit: "s", kind: "rapid-shutdown-time" });
  });

  test.each([
    [2017, "outside", "NEC 2017 690.12(B)(1)"],
    [2020, "outside", "NEC 2020 690.12(B)(1)"],
    [2023, "inside", "NEC 2023 690.12(B)(2)"],
  ] as const)("NEC %d, %s the boundary cites %s", (edition, boundary, cite) => {
    const [volts] = checkRapidShutdownTest({ boundary, measuredV: 10, seconds: 5 }, edition);
    expect(volts!.clause).toBe(cite);
  });

  test("inside the boundary 80 V is allowed, 81 V is not", () => {
    expect(checkRapidShutdownTest({ boundary: "inside", measuredV: 80, seconds: 5 }, 2020)[0]).toMatchObject({ status: "pass", limit: 80 });
    expect(checkRapidShutdownTest({ boundary: "inside", measuredV: 81, seconds: 5 }, 2020)[0]!.status).toBe("fail");
  });

  test("no test yet: two missing readings", () => {
    const results = checkRapidShutdownTest(undefined, 2020);
    expect(results.map((r) => [r.status, r.reading])).toEqual([
      ["warn", "missing"],
      ["warn", "missing"],
    ]);
  });

  test.each([
    [Number.NaN, 5],
    [-2, 5],
    [10, -1],
    [10, Number.NaN],
  ])("bad reading %d V / %d s → fail", (v, s) => {
    const results = checkRapidShutdownTest({ measuredV: v, seconds: s }, 2020);
    expect(results.some((r) => r.status === "fail" && r.reading === "invalid" && r.value === null)).toBe(true);
  });
});

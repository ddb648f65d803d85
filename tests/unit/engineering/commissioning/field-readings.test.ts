import { describe, expect, test } from "vitest";
import { DesignInputError, checkFirstPower, checkModulesReporting, checkRapidShutdownTest, parseTimeOfDay } from "@/lib/engineering";

describe("modules reporting vs installed (all must report)", () => {
  const check = (modulesReporting: number | null, modulesInstalled = 20) => checkModulesReporting({ edition: 2020, modulesInstalled, modulesReporting });

  test.each([
    [20, "pass"],
    [19, "fail"], // one module silent: the record cannot be completed yet
    [0, "fail"],
    [21, "fail"], // more than installed: a count or device list is wrong
  ])("20 installed, %d reporting → %s", (n, status) => {
    expect(check(n)).toMatchObject({ status, value: n, limit: 20, unit: "modules", kind: "modules-reporting" });
  });

  test("missing count warns and stays open", () => {
    expect(check(null)).toMatchObject({ status: "warn", reading: "missing" });
  });

  test.each([[Number.NaN], [-1], [19.5]])("bad count %d → fail", (n) => {
    expect(check(n)).toMatchObject({ status: "fail", reading: "invalid", value: null });
  });

  test.each([[0], [Number.NaN], [2.5]])("modules installed %d is an input error", (installed) => {
    expect(() => check(20, installed)).toThrow(DesignInputError);
  });
});

// Common practice: first power above 0 and at most 1.05 × the AC rating; under 10 % of the rating between 10:00 and 14:00 warns.
describe("first power reading vs the AC rating (common practice)", () => {
  const check = (firstPowerW: number | null, firstPowerTime: string | null = "12:30", acRatingW = 7600) =>
    checkFirstPower({ edition: 2020, acRatingW, firstPowerW, firstPowerTime });

  test.each([
    [5200, "12:30", "pass", 7980], // 1.05 × 7600 = 7980 W
    [7980, "12:30", "pass", 7980], // exactly 1.05 × the rating
    [7981, "12:30", "fail", 7980], // more than the system can make
    [7600000, "12:30", "fail", 7980], // kilowatts typed as watts, or the wrong meter
    [0, "12:30", "fail", 0], // not exporting
    [-300, "12:30", "fail", 0], // negative: not exporting
    [700, "12:30", "warn", 760], // 700 < 0.1 × 7600 = 760 at midday
    [760, "10:00", "pass", 7980], // exactly 10 %: not "very low"
    [700, "09:59", "pass", 7980], // low but early
    [700, "14:01", "pass", 7980], // low but late
    [700, "14:00", "warn", 760], // last minute of midday
  ])("%d W at %s → %s (limit %d W)", (w, time, status, limit) => {
    expect(check(w, time)).toMatchObject({ status, value: w, limit, unit: "W", kind: "first-power" });
  });

  test.each([
    [null, "12:30"],
    [5200, null],
    [5200, "  "],
  ])("missing power %j or time %j → warn, reading missing", (w, time) => {
    expect(check(w, time)).toMatchObject({ status: "warn", reading: "missing" });
  });

  test.each([
    [Number.NaN, "12:30"],
    [5200, "25:00"],
    [5200, "noon"],
  ])("bad power %d or time %j → fail, never NaN", (w, time) => {
    const r = check(w, time);
    expect(r).toMatchObject({ status: "fail", reading: "invalid", value: null });
  });

  test("an AC rating of zero is an input error", () => {
    expect(() => check(100, "12:00", 0)).toThrow(DesignInputError);
  });

  test.each([
    ["00:00", 0],
    ["9:05", 545],
    ["23:59", 1439],
    ["24:00", null],
    ["12:60", null],
  ])("parseTimeOfDay(%j) = %j", (text, minutes) => {
    expect(parseTimeOfDay(text)).toBe(minutes);
  });
});

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

import { describe, expect, test } from "vitest";
import { DesignInputError, checkFirstPower, parseTimeOfDay } from "@/lib/engineering";

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

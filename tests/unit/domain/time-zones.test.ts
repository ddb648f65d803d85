import { describe, expect, it, test } from "vitest";
import {
  US_TIME_ZONES,
  addCalendarDays,
  calendarDayText,
  dateTimeFormat,
  formatInZone,
  localDateTime,
  localIsoDate,
  localLongDate,
} from "@/lib/domain/time-zones";

// Offsets from the IANA tz database as shipped with Node's ICU (from memory: MST = UTC−7, MDT = UTC−6, HST = UTC−10).
test.each([
  ["2026-12-02T01:12:00Z", "America/Denver", "2026-12-01 18:12 MST"],
  ["2026-07-01T18:05:00Z", "America/Denver", "2026-07-01 12:05 MDT"],
  ["2026-07-01T18:05:00Z", "America/Phoenix", "2026-07-01 11:05 MST"],
  ["2026-12-02T01:12:00Z", "Pacific/Honolulu", "2026-12-01 15:12 HST"],
])("%s in %s → %s", (iso, zone, expected) => {
  expect(localDateTime(iso, zone)).toBe(expected);
});

test("the long date follows the zone across midnight", () => {
  expect(localLongDate("2026-12-02T01:12:00Z", "America/Denver")).toBe("December 1, 2026");
  expect(localLongDate("2026-12-02T01:12:00Z", "America/New_York")).toBe("December 1, 2026");
  expect(localLongDate("2026-12-02T06:00:00Z", "America/New_York")).toBe("December 2, 2026");
});

test("every listed zone is one Node knows", () => {
  for (const { id } of US_TIME_ZONES) expect(() => localDateTime("2026-01-01T00:00:00Z", id)).not.toThrow();
});

test.each([
  ["2026-07-01T05:30:00Z", "America/Denver", "2026-06-30"], // still June 30 in Colorado: a fee taking effect July 1 does not apply yet
  ["2026-07-01T06:30:00Z", "America/Denver", "2026-07-01"],
  ["2026-07-01T03:59:00Z", "America/New_York", "2026-06-30"],
])("local day of %s in %s is %s", (iso, zone, expected) => {
  expect(localIsoDate(iso, zone)).toBe(expected);
});

test.each([
  ["datetime", "Nov 15, 2026, 5:11 PM"],
  ["date", "Nov 15, 2026"],
  ["time", "5:11 PM"],
] as const)("screens show %s in the organization's zone, whatever the machine's", (style, expected) => {
  // 2026-11-16T00:11Z is still the evening of November 15 in Colorado (MST, UTC−7).
  expect(formatInZone("2026-11-16T00:11:00Z", "America/Denver", style)).toBe(expected);
});

describe("calendar days", () => {
  it.each([
    ["2026-03-20", 180, "2026-09-16"],
    ["2026-12-31", 1, "2027-01-01"],
    ["2028-02-28", 1, "2028-02-29"],
    ["2027-02-28", 1, "2027-03-01"],
    ["2026-03-08", 1, "2026-03-09"], // the night clocks spring forward in the US changes nothing for a day count
    ["2026-01-10", -10, "2025-12-31"],
  ])("%s plus %i days is %s", (day, days, expected) => {
    expect(addCalendarDays(day, days)).toBe(expected);
  });

  it("writes a calendar day as it is, whatever zone the machine runs in", () => {
    expect(calendarDayText("2026-03-02")).toBe("Mar 2, 2026");
    expect(calendarDayText("2026-12-31")).toBe("Dec 31, 2026");
  });
});

describe("dateTimeFormat", () => {
  test("keeps one formatter per locale and options, and formats as a fresh one would", () => {
    const options = { timeZone: "America/Denver", dateStyle: "medium" } as const;
    expect(dateTimeFormat("en-US", options)).toBe(dateTimeFormat("en-US", { ...options }));
    expect(dateTimeFormat("en-US", options)).not.toBe(dateTimeFormat("en-CA", options));
    const at = new Date("2026-11-20T16:30:00Z");
    // Intl itself is the reference: the kept formatter answers exactly as a new one does.
    expect(dateTimeFormat("en-US", options).format(at)).toBe(new Intl.DateTimeFormat("en-US", options).format(at));
  });
});

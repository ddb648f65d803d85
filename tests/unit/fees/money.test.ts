import { describe, expect, test } from "vitest";
import { centsToDollarsText, divideRoundHalfUp, formatKw, formatUsd, formatUsdExact, kwToWatts, parsePercent, parseUsd } from "@/lib/fees";

describe("formatUsd", () => {
  test.each([
    [0, "$0.00"],
    [5, "$0.05"],
    [150, "$1.50"],
    [123_450, "$1,234.50"],
    [100_000_000, "$1,000,000.00"],
    [-500, "-$5.00"],
    [Number.MAX_SAFE_INTEGER, "$90,071,992,547,409.91"], // exact, no float division
  ])("%d ¢ → %s", (cents, text) => {
    expect(formatUsd(cents)).toBe(text);
  });

  test("refuses fractions of a cent", () => {
    expect(() => formatUsd(12.5)).toThrow(RangeError);
    expect(() => formatUsd(Number.NaN)).toThrow(RangeError);
  });
});

describe("exact products before rounding", () => {
  test.each([
    [11_641_850n, 3, "$116.4185"], // thousandths of a cent
    [11_400_000n, 3, "$114.00"],
    [5n, 3, "$0.00005"],
    [12_500_500_000n, 6, "$125.005"], // millionths of a cent
  ])("%d at scale %d → %s", (numerator, scale, text) => {
    expect(formatUsdExact(numerator, scale)).toBe(text);
  });

  test.each([
    [9_501_250n, 9_501n], // .25 down
    [9_502_500n, 9_503n], // .5 up
    [9_503_750n, 9_504n], // .75 up
    [9_505_000n, 9_505n],
    [499n, 0n],
    [500n, 1n],
  ])("%d / 1000 rounds half up to %d", (n, expected) => {
    expect(divideRoundHalfUp(n, 1000n)).toBe(expected);
  });
});

describe("parseUsd reads typed dollars into cents without floating point", () => {
  test.each([
    ["150", 15_000],
    ["150.5", 15_050],
    ["150.50", 15_050],
    ["150.", 15_000],
    [".75", 75],
    ["$1,234.50", 123_450],
    ["  0.29 ", 29], // 0.29 × 100 is 28.999… in floating point
    ["1234567.89", 123_456_789],
  ])("%j → %d ¢", (text, cents) => {
    expect(parseUsd(text)).toBe(cents);
  });

  test.each(["", ".", "-5", "12.345", "1,23", "12a", "$", "1e3", "99999999999999999999"])("%j is not an amount", (text) => {
    expect(parseUsd(text)).toBeNull();
  });

  test("cents back to the form's text", () => {
    expect([centsToDollarsText(123_450), centsToDollarsText(5), centsToDollarsText(0)]).toEqual(["1234.50", "0.05", "0.00"]);
  });
});

describe("sizes and percents as exact integers", () => {
  test.each([
    [7.6, 7_600, "7.600 kW"],
    [0.1 + 0.2, 300, "0.300 kW"],
    [12_500, 12_500_000, "12,500.000 kW"],
    [0.0004, 0, "0.000 kW"], // finer than a watt is read to the watt
  ])("%d kW → %d W → %s", (kw, watts, text) => {
    expect(kwToWatts(kw)).toBe(watts);
    expect(formatKw(watts)).toBe(text);
  });

  test.each([
    ["1.25", 12_500n],
    ["0.0725", 725n],
    ["100", 1_000_000n],
    ["0", 0n],
    ["100.0001", null],
    ["1.23456", null],
    ["-1", null],
    ["1.", null],
    ["1e2", null],
  ])("%j %% → %s millionths", (text, millionths) => {
    expect(parsePercent(text)).toBe(millionths);
  });
});

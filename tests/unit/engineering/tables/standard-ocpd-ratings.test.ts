import { describe, expect, test } from "vitest";
import { DesignInputError } from "@/lib/engineering";
import {
  STANDARD_OCPD_RATINGS_A,
  isStandardRatingA,
  largestStandardRatingAtMostA,
  nextStandardRatingA,
} from "@/lib/engineering/tables/standard-ocpd-ratings";

describe("NEC 2017 240.6(A) standard ratings (REFERENCE.md, confirmed)", () => {
  test("the list is the published one, in order", () => {
    expect(STANDARD_OCPD_RATINGS_A).toEqual([
      15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500,
      600, 700, 800, 1000,
    ]);
  });

  test.each([
    [0, 15],
    [15, 15], // exactly a rating stays
    [15.01, 20],
    [19.0625, 20], // 1.25 × 15.25 A string current
    [40, 40], // 1.25 × 32 A: REFERENCE.md example 32 A → 40 A
    [50.1, 60], // no 55 A rating
    [111, 125],
    [801, 1000],
  ])("next standard rating at or above %d A is %d A", (currentA, ratingA) => {
    expect(nextStandardRatingA(currentA)).toBe(ratingA);
  });

  test("fuses add 1, 3, 6, 10 and 601 A (NEC 240.6(A), from memory)", () => {
    expect(nextStandardRatingA(7.5, { fuse: true })).toBe(10);
    expect(nextStandardRatingA(7.5)).toBe(15);
    expect(isStandardRatingA(10, { fuse: true })).toBe(true);
    expect(isStandardRatingA(10)).toBe(false);
  });

  test.each([
    [40, 40],
    [44.9, 40],
    [14, null],
  ])("largest standard rating at or below %d A is %s", (currentA, ratingA) => {
    expect(largestStandardRatingAtMostA(currentA)).toBe(ratingA);
  });

  test("above 1000 A, and negative currents, are input errors", () => {
    expect(() => nextStandardRatingA(1001)).toThrow(DesignInputError);
    expect(() => nextStandardRatingA(-1)).toThrow(DesignInputError);
  });
});

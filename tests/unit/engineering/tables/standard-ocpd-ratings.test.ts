import { describe, expect, test } from "vitest";
import { DesignInputError } from "@/lib/engineering";
import {
  STANDARD_OCPD_RATINGS_A,
  isStandardRatingA,
  largestStandardRatingAtMostA,
  nextStandardRatingA,
  standardRatingsA,
} from "@/lib/engineering/tables/standard-ocpd-ratings";

describe("NEC 2017 240.6(A) standard ratings (REFERENCE.md, confirmed to 1000 A)", () => {
  test("the list is the published one, in order", () => {
    expect(STANDARD_OCPD_RATINGS_A).toEqual([
      15,
      20,
      25,
      30,
      35,
      40,
      45,
      50,
      60,
      70,
      80,
      90,
      100,
      110,
      125,
      150,
      175,
      200,
      225,
      250,
      300,
      350,
      400,
      450,
      500,
      600,
      700,
      800,
      1000,
      1200,
      1600,
      2000,
      2500,
      3000,
      4000,
      5000,
      6000, // from memory
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

  test("above 6000 A, and negative currents, are input errors", () => {
    expect(nextStandardRatingA(1001)).toBe(1200); // from memory
    expect(() => nextStandardRatingA(6001)).toThrow(DesignInputError);
    expect(() => nextStandardRatingA(-1)).toThrow(DesignInputError);
  });
});

// NEC 2023 Table 240.6(A) adds 10 A for breakers too (trade-press summaries of the 2023 changes, e.g. a
// continuing-education lesson on the 2023 change for 10 A branch circuits; the 2023 text itself not seen).
describe("240.6(A) by edition", () => {
  test.each([
    [2017, 7, 15],
    [2020, 7, 15],
    [2023, 7, 10],
    [2023, 10.5, 15],
  ] as const)("NEC %d: the next breaker rating at or above %d A is %d A", (edition, currentA, ratingA) => {
    expect(nextStandardRatingA(currentA, { edition })).toBe(ratingA);
  });

  test.each([
    [2020, false],
    [2023, true],
  ] as const)("NEC %d: 10 A is a standard breaker rating → %s", (edition, standard) => {
    expect(isStandardRatingA(10, { edition })).toBe(standard);
  });

  test("fuse-only ratings stay in every edition, without repeating 10 A", () => {
    const list = standardRatingsA({ fuse: true, edition: 2023 });
    expect(list.filter((r) => r === 10)).toHaveLength(1);
    expect(list.slice(0, 5)).toEqual([1, 3, 6, 10, 15]);
  });

  test("with no main room left, 2023 finds a 10 A breaker where 2020 finds none", () => {
    expect(largestStandardRatingAtMostA(12, { edition: 2023 })).toBe(10);
    expect(largestStandardRatingAtMostA(12, { edition: 2020 })).toBeNull();
  });
});

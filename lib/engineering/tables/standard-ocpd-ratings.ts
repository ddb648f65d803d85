import { DesignInputError } from "../errors";
import type { NecEdition } from "../types";

// NEC 240.6(A) standard ampere ratings of fuses and inverse-time breakers. 15–1000 A confirmed for 2017
// (REFERENCE.md); 1200–6000 A from memory. 2020 kept the list (from memory).
export const STANDARD_OCPD_RATINGS_A: readonly number[] = [
  15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500, 600, 700, 800, 1000,
  1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000,
];

// NEC 2023 made the list Table 240.6(A) and added 10 A for breakers as well as fuses, to go with
// 10 A branch circuits (trade-press summaries of the 2023 changes; the 2023 text itself not seen).
const ADDED_IN_2023_A: readonly number[] = [10];

// Additional standard ratings for fuses only (240.6(A), from memory); PV string fuses use 10 A.
export const FUSE_ONLY_RATINGS_A: readonly number[] = [1, 3, 6, 10, 601];

export type RatingOptions = { fuse?: boolean; edition?: NecEdition };

/** The standard ratings of an edition, breakers only or with the fuse-only ratings; 2017 and 2020 when no edition is given. */
export function standardRatingsA({ fuse = false, edition }: RatingOptions = {}): number[] {
  const list = [...STANDARD_OCPD_RATINGS_A, ...(edition === 2023 ? ADDED_IN_2023_A : []), ...(fuse ? FUSE_ONLY_RATINGS_A : [])];
  return [...new Set(list)].sort((a, b) => a - b);
}

/** The smallest standard rating at or above `currentA`. */
export function nextStandardRatingA(currentA: number, options: RatingOptions = {}): number {
  if (!Number.isFinite(currentA) || currentA < 0) {
    throw new DesignInputError("currentA", "A current must be zero or more to pick a breaker size.");
  }
  const found = standardRatingsA(options).find((r) => r >= currentA - 1e-9);
  if (found === undefined) {
    throw new DesignInputError("currentA", `No standard rating reaches ${currentA} A; the largest is 6000 A.`);
  }
  return found;
}

/** The largest standard rating at or below `currentA`, or null when even the smallest is too much. */
export function largestStandardRatingAtMostA(currentA: number, options: RatingOptions = {}): number | null {
  const fitting = standardRatingsA(options).filter((r) => r <= currentA + 1e-9);
  return fitting.length === 0 ? null : fitting[fitting.length - 1]!;
}

export function isStandardRatingA(ratingA: number, options: RatingOptions = {}): boolean {
  return standardRatingsA(options).includes(ratingA);
}

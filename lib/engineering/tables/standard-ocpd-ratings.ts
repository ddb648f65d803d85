import { DesignInputError } from "../errors";

// NEC 240.6(A) standard ampere ratings of fuses and inverse-time breakers (REFERENCE.md; confirmed for 2017, assumed unchanged in 2020/2023).
export const STANDARD_OCPD_RATINGS_A: readonly number[] = [
  15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300,
  350, 400, 450, 500, 600, 700, 800, 1000,
];

// NEC 240.6(A) additional standard ratings for fuses only (from memory); PV string fuses use 10 A.
export const FUSE_ONLY_RATINGS_A: readonly number[] = [1, 3, 6, 10, 601];

function ratings(fuse: boolean): number[] {
  const list = fuse ? [...STANDARD_OCPD_RATINGS_A, ...FUSE_ONLY_RATINGS_A] : [...STANDARD_OCPD_RATINGS_A];
  return list.sort((a, b) => a - b);
}

/** The smallest standard rating at or above `currentA`. */
export function nextStandardRatingA(currentA: number, options: { fuse?: boolean } = {}): number {
  if (!Number.isFinite(currentA) || currentA < 0) {
    throw new DesignInputError("currentA", "A current must be zero or more to pick a breaker size.");
  }
  const found = ratings(options.fuse ?? false).find((r) => r >= currentA - 1e-9);
  if (found === undefined) {
    throw new DesignInputError("currentA", `No standard rating reaches ${currentA} A; the largest is 1000 A.`);
  }
  return found;
}

/** The largest standard rating at or below `currentA`, or null when even 15 A is too much. */
export function largestStandardRatingAtMostA(currentA: number, options: { fuse?: boolean } = {}): number | null {
  const fitting = ratings(options.fuse ?? false).filter((r) => r <= currentA + 1e-9);
  return fitting.length === 0 ? null : fitting[fitting.length - 1]!;
}

export function isStandardRatingA(ratingA: number, options: { fuse?: boolean } = {}): boolean {
  return ratings(options.fuse ?? false).includes(ratingA);
}

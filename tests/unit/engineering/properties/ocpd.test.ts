import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { STANDARD_OCPD_RATINGS_A, largestMainBreakerA, largestPvBreakerA, requiredOcpdA } from "@/lib/engineering";
import { FUSE_ONLY_RATINGS_A } from "@/lib/engineering/tables/standard-ocpd-ratings";
import { RUNS, num } from "./arbitraries";

// 690.9(B) / 705.30(B): at least 1.25 × the maximum current, rounded up to a 240.6(A) standard
// rating (REFERENCE.md, 240.6(A) confirmed). 705.12 120 % rule: PV breaker ≤ 1.2 × busbar − main.
const EPSILON = 1e-9;
const FUSE_RATINGS_A = [...STANDARD_OCPD_RATINGS_A, ...FUSE_ONLY_RATINGS_A].sort((a, b) => a - b);
// 1.25 × 800 A = 1000 A, the largest rating in the table.
const currentArb = num(0, 800);
const ampsArb = fc.integer({ min: 30, max: 1200 });

describe("overcurrent device ratings", () => {
  test("the required OCPD is always a standard 240.6(A) rating of at least 1.25 × the current, and the smallest such", () => {
    fc.assert(
      fc.property(currentArb, fc.boolean(), (currentA, fuse) => {
        const ratings = fuse ? FUSE_RATINGS_A : STANDARD_OCPD_RATINGS_A;
        const ocpdA = requiredOcpdA(currentA, { fuse });
        expect(ratings).toContain(ocpdA);
        expect(ocpdA).toBeGreaterThanOrEqual(1.25 * currentA - EPSILON);
        // Every smaller standard rating is too small.
        for (const r of ratings.filter((x) => x < ocpdA)) expect(r).toBeLessThan(1.25 * currentA - EPSILON);
      }),
      RUNS,
    );
  });

  test("more current never calls for a smaller OCPD", () => {
    fc.assert(
      fc.property(currentArb, currentArb, (a, b) => {
        const [less, more] = a <= b ? [a, b] : [b, a];
        expect(requiredOcpdA(more)).toBeGreaterThanOrEqual(requiredOcpdA(less));
      }),
      RUNS,
    );
  });
});

describe("705.12 load-side busbar limits", () => {
  test("the largest PV breaker under the 120 % rule never exceeds 1.2 × busbar − main, and is the largest standard rating that fits", () => {
    fc.assert(
      fc.property(ampsArb, ampsArb, (busbarA, mainA) => {
        const roomA = 1.2 * busbarA - mainA;
        const pvA = largestPvBreakerA(busbarA, mainA, "120%");
        if (pvA === null) {
          expect(roomA).toBeLessThan(STANDARD_OCPD_RATINGS_A[0]!);
          return;
        }
        expect(STANDARD_OCPD_RATINGS_A).toContain(pvA);
        expect(pvA).toBeLessThanOrEqual(roomA + EPSILON);
        const nextUp = STANDARD_OCPD_RATINGS_A.find((r) => r > pvA);
        if (nextUp !== undefined) expect(nextUp).toBeGreaterThan(roomA + EPSILON);
      }),
      RUNS,
    );
  });

  test("a bigger busbar never lowers the largest PV breaker (120 % and 100 % rules)", () => {
    fc.assert(
      fc.property(ampsArb, ampsArb, ampsArb, fc.constantFrom("100%" as const, "120%" as const), (a, b, mainA, rule) => {
        const [smallBus, bigBus] = a <= b ? [a, b] : [b, a];
        expect(largestPvBreakerA(bigBus, mainA, rule) ?? 0).toBeGreaterThanOrEqual(largestPvBreakerA(smallBus, mainA, rule) ?? 0);
      }),
      RUNS,
    );
  });

  test("a bigger main never raises the largest PV breaker, and a bigger PV breaker never raises the largest main", () => {
    fc.assert(
      fc.property(ampsArb, ampsArb, ampsArb, (busbarA, a, b) => {
        const [small, big] = a <= b ? [a, b] : [b, a];
        expect(largestPvBreakerA(busbarA, big, "120%") ?? 0).toBeLessThanOrEqual(largestPvBreakerA(busbarA, small, "120%") ?? 0);
        expect(largestMainBreakerA(busbarA, big, "120%") ?? 0).toBeLessThanOrEqual(largestMainBreakerA(busbarA, small, "120%") ?? 0);
      }),
      RUNS,
    );
  });
});

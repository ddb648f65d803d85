import { atMost } from "../check-result";
import { largestStandardRatingAtMostA } from "../tables/standard-ocpd-ratings";
import type { ServicePanel } from "../types";
import { CONTINUOUS_MULTIPLIER } from "./conductor-ampacity";

export type LoadSideRule = "100%" | "120%" | "sum";

export interface LoadSideOutcome {
  rule: LoadSideRule;
  applies: boolean; // the panel meets the rule's preconditions (a main breaker; breaker at the far end; breaker list)
  passes: boolean;
  valueA: number;
  limitA: number;
}

// 705.12 load-side rules (REFERENCE.md). The 120 % rule is 1.2 × busbar, computed as busbar × 12 / 10 to stay exact.
function busbarAllowanceA(busbarA: number, rule: "100%" | "120%"): number {
  return rule === "120%" ? (busbarA * 12) / 10 : busbarA;
}

/** Largest standard PV breaker for which breaker + main fits the rule; null when none does. */
export function largestPvBreakerA(busbarA: number, mainBreakerA: number, rule: "100%" | "120%"): number | null {
  return largestStandardRatingAtMostA(busbarAllowanceA(busbarA, rule) - mainBreakerA);
}

/** Largest standard main breaker that leaves room for a given PV breaker; null when none does. */
export function largestMainBreakerA(busbarA: number, pvBreakerA: number, rule: "100%" | "120%"): number | null {
  return largestStandardRatingAtMostA(busbarAllowanceA(busbarA, rule) - pvBreakerA);
}

/** Whether a busbar may use the 120 % and sum rules at all: a busbar feeding feed-through conductors with no device at either end may not (from memory). */
export function feedThroughLimitsToFullRating(service: ServicePanel): boolean {
  return service.loadSideAt === "feed-through" && service.feeder?.loadSideOcpdA === undefined;
}

/**
 * Each load-side rule as the code words it: 125 % of the inverter output current plus the
 * main, against the busbar (100 %) or 1.2 × busbar (120 %); the sum rule adds every breaker
 * on the bus except the main. On an end-fed bus the 120 % rule needs the PV breaker at the end
 * away from the main; on a center-fed bus it may sit at either end, but only at dwellings
 * (705.12 center-fed panelboards, from memory).
 */
export function evaluateLoadSideRules(
  service: ServicePanel,
  inverterOutputA: number,
  context: { isDwelling?: boolean } = {},
): LoadSideOutcome[] {
  const sourceA = CONTINUOUS_MULTIPLIER * inverterOutputA;
  const main = service.mainBreakerA;
  const centerFed = service.panelFeed === "center";
  const fullRatingOnly = feedThroughLimitsToFullRating(service);
  const outcomes: LoadSideOutcome[] = [];
  for (const rule of ["100%", "120%"] as const) {
    const limitA = busbarAllowanceA(service.busbarA, rule);
    const valueA = sourceA + (main ?? 0);
    const endOk = service.pvBreakerAtOppositeEnd && (!centerFed || (context.isDwelling ?? true));
    const applies = main !== null && (rule === "100%" || (endOk && !fullRatingOnly));
    outcomes.push({ rule, applies, passes: applies && atMost(valueA, limitA), valueA, limitA });
  }
  const others = service.otherBreakersA;
  const sumA = (others ?? []).reduce((a, b) => a + b, 0) + service.pvBreakerA;
  const sumApplies = others !== undefined && !fullRatingOnly;
  outcomes.push({
    rule: "sum",
    applies: sumApplies,
    passes: sumApplies && atMost(sumA, service.busbarA),
    valueA: sumA,
    limitA: service.busbarA,
  });
  return outcomes;
}

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

/**
 * Each load-side rule as the code words it: 125 % of the inverter output current plus the
 * main, against the busbar (100 %) or 1.2 × busbar (120 %); the sum rule adds every breaker
 * on the bus except the main.
 */
export function evaluateLoadSideRules(service: ServicePanel, inverterOutputA: number): LoadSideOutcome[] {
  const sourceA = CONTINUOUS_MULTIPLIER * inverterOutputA;
  const main = service.mainBreakerA;
  const outcomes: LoadSideOutcome[] = [];
  for (const rule of ["100%", "120%"] as const) {
    const limitA = busbarAllowanceA(service.busbarA, rule);
    const valueA = sourceA + (main ?? 0);
    const applies = main !== null && (rule === "100%" || service.pvBreakerAtOppositeEnd);
    outcomes.push({ rule, applies, passes: applies && atMost(valueA, limitA), valueA, limitA });
  }
  const others = service.otherBreakersA;
  const sumA = (others ?? []).reduce((a, b) => a + b, 0) + service.pvBreakerA;
  outcomes.push({ rule: "sum", applies: others !== undefined, passes: others !== undefined && atMost(sumA, service.busbarA), valueA: sumA, limitA: service.busbarA });
  return outcomes;
}

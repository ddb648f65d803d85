import type { CheckResult, CheckStatus } from "./types";

// Floating-point products such as 1.25 × 32 or 1.2 × 225 must count as "at the limit".
const EPSILON = 1e-9;

export function atMost(value: number, limit: number): boolean {
  return value <= limit + EPSILON;
}

export function atLeast(value: number, limit: number): boolean {
  return value >= limit - EPSILON;
}

export function round(value: number, digits = 2): number {
  const scale = 10 ** digits;
  return Math.round(value * scale) / scale;
}

/** A number as a sentence shows it: at most two decimals, no trailing zeros. */
export function fmt(value: number, digits = 2): string {
  return String(round(value, digits));
}

/** "1 string", "2 strings". */
export function plural(count: number, word: string): string {
  return `${count} ${word}${count === 1 ? "" : "s"}`;
}

export function worstStatus(statuses: CheckStatus[]): CheckStatus {
  if (statuses.includes("fail")) return "fail";
  if (statuses.includes("warn")) return "warn";
  return "pass";
}

/** What a check hands to makeCheck: a result before rounding. */
export type CheckInput = CheckResult;

/** Builds a result, rounding numbers and refusing NaN so none reaches a screen or a PDF. */
export function makeCheck(input: CheckInput): CheckResult {
  for (const key of ["value", "limit"] as const) {
    const n = input[key];
    if (n !== null && !Number.isFinite(n)) {
      throw new Error(`Check ${input.id} computed a non-finite ${key}.`);
    }
  }
  const result: CheckResult = {
    ...input,
    value: input.value === null ? null : round(input.value),
    limit: input.limit === null ? null : round(input.limit),
  };
  if (input.fix === undefined) delete result.fix;
  return result;
}

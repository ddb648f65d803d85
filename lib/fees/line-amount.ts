import { formatUsd } from "./money";
import type { FeeLineProblem } from "./types";

/**
 * A fee line's amount as a screen shows it. While the line waits for a fact (the valuation, the
 * design) it is the least it comes to, its minimum, or else what it waits for, never a bare $0.00.
 */
export function feeAmountText({ amountCents, problem }: { amountCents: number; problem?: FeeLineProblem["code"] | null }): string {
  if (!problem) return formatUsd(amountCents);
  if (amountCents > 0) return `at least ${formatUsd(amountCents)}`;
  return problem === "valuation-missing" ? "needs the valuation" : "needs the design";
}

/** A total as a screen shows it: "at least" while a line still waits for a fact. */
export function feeTotalText({ totalCents, isComplete }: { totalCents: number; isComplete: boolean }): string {
  return isComplete ? formatUsd(totalCents) : `at least ${formatUsd(totalCents)}`;
}

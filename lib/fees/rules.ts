// The rules a fee schedule must keep, shared by the admin form's schema and by the arithmetic's
// own guard against stored data that bypassed it. Each returns a message in the form's words.
import { formatUsd } from "./money";
import { formatKw, isWholeWatts, kwToWatts } from "./quantities";

/** A problem with part of a line; `path` is relative to what was checked (zod style). */
export type RuleProblem = { path: (string | number)[]; message: string };

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** A real calendar day written YYYY-MM-DD (2028-02-29 yes, 2027-02-29 no). */
export function isIsoDate(value: unknown): value is string {
  const match = typeof value === "string" ? ISO_DATE.exec(value) : null;
  if (!match) return false;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** Whole cents, zero or more. */
export function isCents(value: unknown): value is number {
  return typeof value === "number" && Number.isSafeInteger(value) && value >= 0;
}

/** Versions of one fee are recognised by name regardless of case and spacing. */
export function feeNameKey(name: string): string {
  return name.trim().replace(/\s+/g, " ").toLowerCase();
}

/** The end date is the first day a line no longer applies, so it must come after its start. */
export function dateRangeProblem(effectiveFrom: string, effectiveUntil: string | null): string | null {
  return effectiveUntil !== null && effectiveUntil <= effectiveFrom ? "The end date must be after the date the fee takes effect" : null;
}

export function minMaxProblem(minimumCents: number | null, maximumCents: number | null): string | null {
  return minimumCents !== null && maximumCents !== null && minimumCents > maximumCents
    ? `The minimum (${formatUsd(minimumCents)}) cannot be above the maximum (${formatUsd(maximumCents)})`
    : null;
}

/**
 * Tier upper edges must rise strictly from above 0 kW, in whole watts, and only the last tier
 * is open-ended (null) so every size has a tier. Paths point at the tier: [index, "upToKw"].
 */
export function tierBoundsProblem(upToKw: readonly unknown[]): RuleProblem | null {
  if (upToKw.length === 0) return { path: [], message: "Add at least one tier" };
  let previousW = 0;
  for (const [index, kw] of upToKw.entries()) {
    const path = [index, "upToKw"];
    const isLast = index === upToKw.length - 1;
    if (kw === null) {
      if (isLast) continue;
      return { path, message: "Only the last tier is open-ended; enter the size this tier ends at" };
    }
    if (isLast) return { path, message: "Leave the last tier's upper size blank so it covers every larger system" };
    if (typeof kw !== "number" || !isWholeWatts(kw))
      return { path, message: "Enter the tier's upper size in kW with at most three decimals" };
    const watts = kwToWatts(kw);
    if (watts <= previousW) {
      return {
        path,
        message: index === 0 ? "The first tier must end above 0 kW" : `Tiers must ascend: this tier must end above ${formatKw(previousW)}`,
      };
    }
    previousW = watts;
  }
  return null;
}

/**
 * Two versions of one fee (same authority and name) taking effect on the same day leave no way
 * to tell which applies; the later of the two in the list is reported.
 */
export function versionClashes(lines: readonly { name: string; effectiveFrom: string; authority?: string }[]): RuleProblem[] {
  const seen = new Set<string>();
  const problems: RuleProblem[] = [];
  for (const [index, line] of lines.entries()) {
    const key = JSON.stringify([line.authority ?? "", feeNameKey(line.name), line.effectiveFrom]);
    if (seen.has(key)) {
      problems.push({
        path: [index, "effectiveFrom"],
        message: `Another version of "${line.name.trim()}" already takes effect on ${line.effectiveFrom}`,
      });
    }
    seen.add(key);
  }
  return problems;
}

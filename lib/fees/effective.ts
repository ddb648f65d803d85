import { feeNameKey } from "./rules";
import type { FeeLine, ScheduledFeeLine } from "./types";

/** In effect on `asOf` (YYYY-MM-DD): from its start date, up to but not on its end date. */
export function isInEffect(line: Pick<FeeLine, "effectiveFrom" | "effectiveUntil">, asOf: string): boolean {
  // ISO dates compare as text in calendar order.
  return line.effectiveFrom <= asOf && (line.effectiveUntil === null || asOf < line.effectiveUntil);
}

/**
 * The lines that apply on `asOf`, in their stored order. Lines of one authority sharing a name
 * are versions of one fee: of those in effect, the one that took effect last wins, so a new
 * version supersedes the old without the old needing an end date. Lines of different authorities
 * never supersede each other.
 */
export function applicableLines<T extends ScheduledFeeLine>(lines: readonly T[], asOf: string): T[] {
  const winners = new Map<string, T>();
  for (const line of lines) {
    if (!isInEffect(line, asOf)) continue;
    const key = JSON.stringify([line.authority ?? "", feeNameKey(line.name)]);
    const current = winners.get(key);
    if (!current || current.effectiveFrom < line.effectiveFrom) winners.set(key, line);
  }
  const chosen = new Set(winners.values());
  return lines.filter((line) => chosen.has(line));
}

import { addCalendarDays } from "@/lib/domain/time-zones";

/** How far back a report looks when its range names no start: a year of days ending on `to`. */
export const DEFAULT_RANGE_DAYS = 365;

/** The range a report covers: blank ends become today (in the organization's zone) and a year before the end. */
export function resolveRange({ from, to }: { from: string; to: string }, today: string): { from: string; to: string } {
  const end = to || (from && from > today ? from : today);
  return { from: from || addCalendarDays(end, -(DEFAULT_RANGE_DAYS - 1)), to: end };
}

/** Every month (YYYY-MM) the range touches, first to last. */
export function monthsOf({ from, to }: { from: string; to: string }): string[] {
  const months: string[] = [];
  let [y, m] = from.split("-").map(Number) as [number, number];
  const last = to.slice(0, 7);
  for (let month = ""; month !== last && months.length < 1200;) {
    month = `${y}-${String(m).padStart(2, "0")}`;
    months.push(month);
    if (++m > 12) [y, m] = [y + 1, 1];
  }
  return months;
}

import { DEFAULT_TIME_ZONE, localDateTime, localIsoDate, localLongDate } from "@/lib/domain/time-zones";
import { formatUsd } from "@/lib/fees";

// How every document prints numbers, dates and money, in one place: the packet sheets, the
// commissioning documents and the receipt format their facts with these before the layouts see them.

const NUMBER = new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 });

/** A figure as every sheet prints it: at most two decimals, thousands grouped. */
export function formatNumber(value: number): string {
  return NUMBER.format(value);
}

/** "463.34 V", "2.55 lb/ft²", "1.17" (no unit), "—" when the check has no figure. */
export function formatQuantity(value: number | null, unit: string): string {
  if (value === null) return "—";
  return unit ? `${formatNumber(value)} ${unit}` : formatNumber(value);
}

/**
 * A document's date as an unambiguous calendar date in the organization's zone, e.g. "2026-11-20":
 * a packet made at 7 pm in Denver is dated that day, not the next day in UTC. Packets stored before
 * the zone was recorded print in the default zone.
 */
export function documentDate(iso: string, timeZone: string | undefined): string {
  return localIsoDate(iso, timeZone ?? DEFAULT_TIME_ZONE);
}

/** An ISO time as a local date and 24-hour time in the organization's zone, e.g. "2026-11-20 09:30 MST". */
export function documentTime(iso: string, timeZone: string): string {
  return localDateTime(iso, timeZone);
}

/** "December 3, 2026" in the organization's zone. */
export function longDate(iso: string, timeZone: string): string {
  return localLongDate(iso, timeZone);
}

/** "December 3, 2026, 11:05 MST" in the organization's zone. */
export function longDateTime(iso: string, timeZone: string): string {
  return `${longDate(iso, timeZone)}, ${localDateTime(iso, timeZone).split(" ").slice(1).join(" ")}`;
}

/** Amounts as documents print them: "$1,234.50". */
export const money = formatUsd;

// The shipped latin font subsets lack arrows and comparison signs, which would print as
// empty boxes; change lines ("35 A → 40 A") and typed text use them, so they are spelled out.
const UNSUPPORTED_GLYPHS: Record<string, string> = { "→": "to", "←": "from", "≤": "<=", "≥": ">=", "≈": "~", "√": "sqrt " };
const UNSUPPORTED = /[→←≤≥≈√]/g;

/** Text with the characters the PDF fonts cannot draw spelled out. */
export function printable(text: string): string {
  return text.replace(UNSUPPORTED, (c) => UNSUPPORTED_GLYPHS[c]!);
}

/** A copy of a value with every string in it made printable (applied once to a whole document's input). */
export function printableDeep<T>(value: T): T {
  if (typeof value === "string") return printable(value) as T;
  if (Array.isArray(value)) return value.map(printableDeep) as T;
  if (value && typeof value === "object") return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, printableDeep(v)])) as T;
  return value;
}

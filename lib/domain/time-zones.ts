/** The time zones of the United States, as IANA names; documents print local times in the organization's zone. */
export const US_TIME_ZONES = [
  { id: "America/New_York", label: "Eastern" },
  { id: "America/Chicago", label: "Central" },
  { id: "America/Denver", label: "Mountain" },
  { id: "America/Phoenix", label: "Mountain, no daylight saving (Arizona)" },
  { id: "America/Los_Angeles", label: "Pacific" },
  { id: "America/Anchorage", label: "Alaska" },
  { id: "Pacific/Honolulu", label: "Hawaii" },
  { id: "America/Puerto_Rico", label: "Atlantic (Puerto Rico, U.S. Virgin Islands)" },
] as const;

export type UsTimeZone = (typeof US_TIME_ZONES)[number]["id"];
export const DEFAULT_TIME_ZONE: UsTimeZone = "America/New_York";

// Making an Intl.DateTimeFormat costs far more than formatting with one (a page of fifty rows made
// hundreds), and a company has one zone and a handful of styles: each locale, zone and style is made once.
const formatters = new Map<string, Intl.DateTimeFormat>();

/** The formatter for these options, made on first use and kept (a few dozen at most: zones × styles). */
export function dateTimeFormat(locale: "en-US" | "en-CA", options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale}|${JSON.stringify(options)}`;
  let formatter = formatters.get(key);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat(locale, options);
    // An unbounded set of zones cannot reach here (zones are validated), but a long-running process stays bounded anyway.
    if (formatters.size >= 500) formatters.clear();
    formatters.set(key, formatter);
  }
  return formatter;
}

/** "2026-11-20 09:30 MST": a calendar date and 24-hour time in the zone, with its abbreviation. */
export function localDateTime(iso: string, timeZone: string): string {
  const parts = Object.fromEntries(
    dateTimeFormat("en-US", {
      timeZone,
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
      hourCycle: "h23",
      timeZoneName: "short",
    })
      .formatToParts(new Date(iso))
      .map((p) => [p.type, p.value]),
  );
  return `${parts.year}-${parts.month}-${parts.day} ${parts.hour}:${parts.minute} ${parts.timeZoneName}`;
}

/** "December 3, 2026" in the zone. */
export function localLongDate(iso: string, timeZone: string): string {
  return dateTimeFormat("en-US", { dateStyle: "long", timeZone }).format(new Date(iso));
}

/** The calendar day (YYYY-MM-DD) it is in the zone at that instant: fee schedules take effect by local day. */
export function localIsoDate(iso: string, timeZone: string): string {
  return dateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(new Date(iso));
}

const STYLES = {
  datetime: { dateStyle: "medium", timeStyle: "short" },
  date: { dateStyle: "medium" },
  time: { hour: "numeric", minute: "2-digit" },
} as const satisfies Record<string, Intl.DateTimeFormatOptions>;
export type TimeStyle = keyof typeof STYLES;

/** "Nov 15, 2026, 5:11 PM" in the zone: the same on the server and in any browser, so pages hydrate cleanly. */
export function formatInZone(iso: string, timeZone: string, style: TimeStyle = "datetime"): string {
  return dateTimeFormat("en-US", { ...STYLES[style], timeZone }).format(new Date(iso));
}

/** The calendar day (YYYY-MM-DD) so many days after another: arithmetic on days, no instant and no zone. */
export function addCalendarDays(day: string, days: number): string {
  const [y, m, d] = day.split("-").map(Number) as [number, number, number];
  const t = new Date(Date.UTC(y, m - 1, d + days));
  return `${t.getUTCFullYear()}-${String(t.getUTCMonth() + 1).padStart(2, "0")}-${String(t.getUTCDate()).padStart(2, "0")}`;
}

/** "Mar 2, 2026" for a calendar day (YYYY-MM-DD) that is already the organization's own: no zone to apply. */
export function calendarDayText(day: string): string {
  return dateTimeFormat("en-US", { dateStyle: "medium", timeZone: "UTC" }).format(new Date(`${day}T12:00:00Z`));
}

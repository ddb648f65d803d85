// The coordinator's desk: what to chase today, read from the filings of the projects a person looks after.
// The start page and the morning digest both list these rows, so they agree to the item.
import {
  FILING_KIND_LABELS,
  INSPECTION_KIND_LABELS,
  WITH_THE_AUTHORITY,
  type FilingKind,
  type FilingStatus,
  type InspectionKind,
  type InspectionResult,
} from "./filings";
import { addCalendarDays, dateTimeFormat, localIsoDate } from "./time-zones";

/** How far ahead the desk looks for booked inspections: today and the six days after it. */
export const INSPECTION_LOOKAHEAD_DAYS = 7;
// How early a permit about to lapse is raised: a month gives time to book an inspection (common practice).
export const PERMIT_LAPSE_NOTICE_DAYS = 30;

// Rows a section shows on the start page before "Show all": a long section would bury the others (common practice).
export const DESK_ROWS_SHOWN = 8;
/** Rows a section lists in the morning digest; the rest are counted and the e-mail links to the desk. */
export const DIGEST_ROWS_SHOWN = 15;

export const DESK_SECTIONS = ["followUps", "corrections", "inspections", "lapsing", "pastUsual", "signatures"] as const;
export type DeskSection = (typeof DESK_SECTIONS)[number];

export const DESK_SECTION_TITLES: Record<DeskSection, string> = {
  followUps: "Follow-ups due",
  corrections: "Corrections waiting on the office",
  inspections: "Inspections in the next seven days",
  lapsing: "Permits about to lapse",
  pastUsual: "Past the authority's usual time",
  signatures: "Signatures not given yet",
};

/** One filing as the desk reads it. Days are the organization's calendar days (YYYY-MM-DD). */
export type DeskFiling = {
  filingId: string;
  projectId: string;
  projectNumber: number;
  customerName: string;
  kind: FilingKind;
  authorityName: string;
  status: FilingStatus;
  /** The day the filing entered its status. */
  statusSinceDay: string;
  expiresOn: string | null;
  nextFollowUpOn: string | null;
  /** The authority profile's usual review time; null when the authority has no profile. */
  usualReviewDays: number | null;
  /** The latest correction round, if any. */
  latestRound: { number: number; receivedOn: string; answered: boolean; openItems: number } | null;
  inspections: { id: string; kind: InspectionKind; scheduledFor: string | null; timeWindow: string; result: InspectionResult | null }[];
};

/** A signing link still waiting for its signer (sent or opened, not expired), as the desk reads it. */
export type DeskSignature = {
  signerId: string;
  projectId: string;
  projectNumber: number;
  customerName: string;
  documentTitle: string;
  signerName: string;
  roleLabel: string;
  /** The day the link was sent (or last sent again), and the day it expires, in the organization's zone. */
  sentDay: string;
  expiresDay: string;
  opened: boolean;
};

export type DeskRow = {
  section: DeskSection;
  /** Stable key of the row: the digest and the page list the same keys for the same day. */
  key: string;
  /** The filing the row is about; null for a row about a signature. */
  filingId: string | null;
  /** Where in the app the row's matter is handled (a path, no host). */
  path: string;
  projectId: string;
  projectNumber: number;
  customerName: string;
  /** What is owed, in a sentence. */
  what: string;
  /** Who it is owed to or who holds it. */
  toWhom: string;
  /** The day the matter began (due, received, booked for, expiring, in the authority's hands). */
  since: string;
  /** Days from `since` to today; negative for a day still to come. */
  days: number;
};

export type Desk = Record<DeskSection, DeskRow[]>;

/** Whole days from one calendar day to another. */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / 86_400_000);
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** Days waited beyond an authority's usual review time, or null within it (or with no usual time known). */
export function beyondUsual(daysWaited: number, usualReviewDays: number | null): number | null {
  if (usualReviewDays === null) return null;
  const over = daysWaited - usualReviewDays;
  return over > 0 ? over : null;
}

/** Whole days a filing has been in the authority's hands beyond its usual review time, or null when it is not (yet). */
export function daysPastUsual(filing: Pick<DeskFiling, "status" | "statusSinceDay" | "usualReviewDays">, today: string): number | null {
  if (!WITH_THE_AUTHORITY.includes(filing.status)) return null;
  return beyondUsual(daysBetween(filing.statusSinceDay, today), filing.usualReviewDays);
}

function rowOf(
  section: DeskSection,
  filing: DeskFiling,
  today: string,
  part: { key?: string; what: string; toWhom: string; since: string },
) {
  return {
    section,
    key: `${section}:${part.key ?? filing.filingId}`,
    filingId: filing.filingId,
    path: `/projects/${filing.projectId}/filings#filing-${filing.filingId}`,
    projectId: filing.projectId,
    projectNumber: filing.projectNumber,
    customerName: filing.customerName,
    what: part.what,
    toWhom: part.toWhom,
    since: part.since,
    days: daysBetween(part.since, today),
  } satisfies DeskRow;
}

const filingName = (f: DeskFiling) => FILING_KIND_LABELS[f.kind].toLowerCase();

/**
 * The desk for one calendar day: follow-ups due today or overdue (longest overdue first); correction rounds
 * the office has not answered (oldest first, with their open items); inspections booked from today through
 * the next six days (soonest first); permits that lapse within a month without a passed final inspection,
 * or have lapsed (soonest first); filings in an authority's hands longer than its usual review time
 * (furthest past it first); signing links still waiting for their signer (oldest first). Withdrawn filings
 * are never listed.
 */
export function deskFor(filings: readonly DeskFiling[], today: string, signatures: readonly DeskSignature[] = []): Desk {
  const live = filings.filter((f) => f.status !== "withdrawn");
  const lastInspectionDay = addCalendarDays(today, INSPECTION_LOOKAHEAD_DAYS - 1);
  const lapseHorizon = addCalendarDays(today, PERMIT_LAPSE_NOTICE_DAYS);

  const followUps = live
    .filter((f) => f.nextFollowUpOn !== null && f.nextFollowUpOn <= today)
    .map((f) =>
      rowOf("followUps", f, today, {
        what: `Follow up on the ${filingName(f)}${f.nextFollowUpOn === today ? " (due today)" : ""}`,
        toWhom: f.authorityName,
        since: f.nextFollowUpOn!,
      }),
    );

  const corrections = live
    .filter((f) => f.status === "corrections_requested" && f.latestRound !== null && !f.latestRound.answered)
    .map((f) => {
      const round = f.latestRound!;
      return rowOf("corrections", f, today, {
        what: `Answer round ${round.number} of the ${filingName(f)}: ${plural(round.openItems, "item")} open`,
        toWhom: f.authorityName,
        since: round.receivedOn,
      });
    });

  const inspections = live.flatMap((f) =>
    f.inspections
      .filter((i) => i.result === null && i.scheduledFor !== null && i.scheduledFor >= today && i.scheduledFor <= lastInspectionDay)
      .map((i) =>
        rowOf("inspections", f, today, {
          key: i.id,
          what: `${INSPECTION_KIND_LABELS[i.kind]}${i.timeWindow ? `, ${i.timeWindow}` : ""}`,
          toWhom: f.authorityName,
          since: i.scheduledFor!,
        }),
      ),
  );

  const lapsing = live
    .filter(
      (f) =>
        f.kind === "permit" &&
        f.status === "approved" &&
        f.expiresOn !== null &&
        f.expiresOn <= lapseHorizon &&
        !f.inspections.some((i) => i.kind === "final" && i.result === "passed"),
    )
    .map((f) =>
      rowOf("lapsing", f, today, {
        what:
          f.expiresOn! < today ? "Permit lapsed: ask the AHJ about renewal" : "Permit lapses: pass an inspection or ask for an extension",
        toWhom: f.authorityName,
        since: f.expiresOn!,
      }),
    );

  const pastUsual = live
    .map((f) => ({ f, over: daysPastUsual(f, today) }))
    .filter((x): x is { f: DeskFiling; over: number } => x.over !== null)
    .sort((a, b) => b.over - a.over || a.f.projectNumber - b.f.projectNumber)
    .map(({ f, over }) =>
      rowOf("pastUsual", f, today, {
        what: `${FILING_KIND_LABELS[f.kind]} with the authority ${plural(daysBetween(f.statusSinceDay, today), "day")}, ${plural(over, "day")} past its usual ${f.usualReviewDays}`,
        toWhom: f.authorityName,
        since: f.statusSinceDay,
      }),
    );

  const unsigned = signatures
    .filter((x) => x.expiresDay >= today)
    .map((x): DeskRow => ({
      section: "signatures",
      key: `signatures:${x.signerId}`,
      filingId: null,
      path: `/projects/${x.projectId}/documents`,
      projectId: x.projectId,
      projectNumber: x.projectNumber,
      customerName: x.customerName,
      what: `${x.documentTitle}: not signed by ${x.signerName} yet${x.opened ? " (opened)" : ""}`,
      toWhom: `${x.roleLabel}, link until ${x.expiresDay}`,
      since: x.sentDay,
      days: daysBetween(x.sentDay, today),
    }));

  const oldestFirst = (a: DeskRow, b: DeskRow) => a.since.localeCompare(b.since) || a.projectNumber - b.projectNumber;
  return {
    followUps: followUps.sort(oldestFirst),
    corrections: corrections.sort(oldestFirst),
    inspections: inspections.sort(oldestFirst),
    lapsing: lapsing.sort(oldestFirst),
    pastUsual,
    signatures: unsigned.sort(oldestFirst),
  };
}

/** The section a `?desk=` search parameter names, or null for anything else. */
export function deskSectionOf(value: unknown): DeskSection | null {
  return typeof value === "string" && (DESK_SECTIONS as readonly string[]).includes(value) ? (value as DeskSection) : null;
}

export function deskIsEmpty(desk: Desk): boolean {
  return DESK_SECTIONS.every((s) => desk[s].length === 0);
}

/** "3 days overdue", "today", "in 2 days": how a row's day reads beside its date. */
export function deskDayText(row: Pick<DeskRow, "section" | "days">): string {
  const n = Math.abs(row.days);
  if (row.days === 0) return "today";
  if (row.days < 0) return `in ${plural(n, "day")}`;
  if (row.section === "followUps") return `${plural(n, "day")} overdue`;
  return `${plural(n, "day")} ago`;
}

/** The morning digest goes out on working days (Monday to Friday) from 07:00 until noon, local time. */
export const DIGEST_HOURS = { from: 7, until: 12 } as const;

/**
 * The organization's calendar day whose digest is due at this instant, or null outside a working
 * morning in its zone. A morning missed altogether (no worker running) is not made up in the afternoon.
 */
export function digestDayAt(iso: string, timeZone: string): string | null {
  const parts = dateTimeFormat("en-US", { timeZone, weekday: "short", hour: "numeric", hourCycle: "h23" }).formatToParts(new Date(iso));
  const weekday = parts.find((p) => p.type === "weekday")?.value;
  const hour = Number(parts.find((p) => p.type === "hour")?.value);
  if (weekday === "Sat" || weekday === "Sun") return null;
  if (hour < DIGEST_HOURS.from || hour >= DIGEST_HOURS.until) return null;
  return localIsoDate(iso, timeZone);
}

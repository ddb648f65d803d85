import Link from "next/link";
import {
  DESK_ROWS_SHOWN,
  DESK_SECTIONS,
  DESK_SECTION_TITLES,
  deskDayText,
  deskIsEmpty,
  type Desk,
  type DeskRow,
  type DeskSection,
} from "@/lib/domain/desk";
import { calendarDayText } from "@/lib/domain/time-zones";

const EMPTY: Record<DeskSection, string> = {
  followUps: "No follow-up is due.",
  corrections: "No correction round waits on the office.",
  inspections: "No inspection is booked this week.",
  lapsing: "No permit lapses within a month.",
  pastUsual: "Every authority is within its usual time.",
  signatures: "No signing link waits for its signer.",
};

const SINCE: Record<DeskSection, string> = {
  followUps: "Due",
  corrections: "Received",
  inspections: "Booked for",
  lapsing: "Expires",
  pastUsual: "With them since",
  signatures: "Sent",
};

function Row({ row }: { row: DeskRow }) {
  const href = row.path;
  return (
    <li
      className="flex flex-wrap items-baseline gap-x-3 gap-y-0.5 border-t border-paper-edge py-2 text-sm first:border-t-0"
      data-testid="desk-row"
    >
      <span className="min-w-0 flex-1 basis-64">
        <Link href={href} className="font-medium">
          {row.what}
        </Link>
        <span className="block text-xs text-ink-soft">
          <span className="measure">No. {row.projectNumber}</span> · {row.customerName} · {row.toWhom}
        </span>
      </span>
      <span className="whitespace-nowrap text-xs text-ink-soft">
        {SINCE[row.section]} {calendarDayText(row.since)} · <strong className="font-medium text-ink">{deskDayText(row)}</strong>
      </span>
    </li>
  );
}

/** The day's desk, one section per kind of work, each row opening its filing. */
export function TodayDesk({
  desk,
  today,
  scope,
  expanded,
}: {
  desk: Desk;
  today: string;
  scope: string;
  /** The one section shown whole; the others show their first rows. */
  expanded: DeskSection | null;
}) {
  return (
    <section className="space-y-3" aria-labelledby="today-heading" data-testid="today-desk">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 id="today-heading">Today · {calendarDayText(today)}</h1>
        <p className="text-xs text-ink-soft">{scope}</p>
      </div>
      {deskIsEmpty(desk) ? <p className="panel text-sm text-ink-soft">Nothing to chase today.</p> : null}
      <div className="grid gap-3 lg:grid-cols-2">
        {DESK_SECTIONS.filter((s) => !deskIsEmpty(desk) || s === "inspections").map((section) => {
          const rows = section === expanded ? desk[section] : desk[section].slice(0, DESK_ROWS_SHOWN);
          const hidden = desk[section].length - rows.length;
          return (
            <div key={section} id={`desk-${section}`} className="panel space-y-1" data-testid={`desk-${section}`}>
              <h2 className="text-sm font-semibold">
                {DESK_SECTION_TITLES[section]} <span className="measure font-normal text-ink-faint">({desk[section].length})</span>
              </h2>
              {desk[section].length ? (
                <ul>
                  {rows.map((row) => (
                    <Row key={row.key} row={row} />
                  ))}
                </ul>
              ) : (
                <p className="text-sm text-ink-faint">{EMPTY[section]}</p>
              )}
              {hidden > 0 ? (
                <Link href={`/dashboard?desk=${section}#desk-${section}`} className="inline-block pt-1 text-sm">
                  Show all {desk[section].length}
                </Link>
              ) : null}
              {section === expanded && desk[section].length > DESK_ROWS_SHOWN ? (
                <Link href={`/dashboard#desk-${section}`} className="inline-block pt-1 text-sm">
                  Show the first {DESK_ROWS_SHOWN}
                </Link>
              ) : null}
            </div>
          );
        })}
      </div>
    </section>
  );
}

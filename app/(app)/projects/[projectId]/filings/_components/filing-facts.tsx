import { FILING_STATUS_LABELS, SUBMISSION_CHANNEL_LABELS } from "@/lib/domain/filings";
import { calendarDayText } from "@/lib/domain/time-zones";
import type { FilingDto } from "@/lib/dto/filings";

const day = (d: string | null) => (d ? calendarDayText(d) : null);

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="mt-0.5 break-words">{children ?? <span className="text-ink-faint">—</span>}</dd>
    </div>
  );
}

/** A filing's facts at a glance: where it stands, its number, what went in and when. */
export function FilingFacts({ filing, today }: { filing: FilingDto; today: string }) {
  const overdue = filing.nextFollowUpOn !== null && filing.nextFollowUpOn < today;
  const lapsing = filing.expiresAt !== null && filing.expiresAt < today;
  return (
    <dl className="grid grid-cols-2 gap-x-6 gap-y-3 text-sm sm:grid-cols-4">
      <Fact label="Status">
        <strong data-testid="filing-status">{FILING_STATUS_LABELS[filing.status]}</strong>
      </Fact>
      <Fact label="Reference number">{filing.referenceNumber ? <span className="measure">{filing.referenceNumber}</span> : null}</Fact>
      <Fact label="Submitted">
        {filing.submittedAt ? (
          <>
            {day(filing.submittedAt)}
            {filing.channel ? ` · ${SUBMISSION_CHANNEL_LABELS[filing.channel]}` : ""}
            {filing.sentTo ? ` · ${filing.sentTo}` : ""}
          </>
        ) : null}
      </Fact>
      <Fact label="Packet sent">{filing.packetRevision ? `Rev ${filing.packetRevision}` : null}</Fact>
      <Fact label="Decided">{day(filing.decidedAt)}</Fact>
      <Fact label="Expires">
        {filing.expiresAt ? <span className={lapsing ? "font-semibold text-result-fail" : undefined}>{day(filing.expiresAt)}</span> : null}
      </Fact>
      <Fact label="Next follow-up">
        {filing.nextFollowUpOn ? (
          <span className={overdue ? "font-semibold text-result-warn" : undefined}>
            {day(filing.nextFollowUpOn)}
            {overdue ? " (due)" : ""}
          </span>
        ) : null}
      </Fact>
      {filing.kind === "interconnection" ? <Fact label="Permission to operate">{day(filing.ptoOn)}</Fact> : null}
    </dl>
  );
}

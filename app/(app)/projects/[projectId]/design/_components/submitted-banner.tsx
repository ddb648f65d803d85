import Link from "next/link";
import { FILING_KIND_LABELS, FILING_STATUS_LABELS } from "@/lib/domain/filings";
import { calendarDayText } from "@/lib/domain/time-zones";
import type { ProjectFilingsDto } from "@/lib/dto/filings";

const UNDER_REVIEW = new Set(["submitted", "in_review", "corrections_requested", "resubmitted"]);

/** Which authorities hold a packet of this design: a change saved here owes them a new revision. */
export function SubmittedBanner({ projectId, filings }: { projectId: string; filings: ProjectFilingsDto }) {
  const sent = filings.filings.filter((f) => f.packetRevision !== null && UNDER_REVIEW.has(f.status));
  if (!sent.length) return null;
  const owing = sent.filter((f) => f.revisionNeededSince);
  return (
    <div className="rounded border border-result-warn/40 bg-result-warn/10 px-3 py-2 text-sm" role="status" data-testid="submitted-banner">
      <ul className="space-y-1">
        {sent.map((f) => (
          <li key={f.id}>
            {`Rev ${f.packetRevision} of the ${FILING_KIND_LABELS[f.kind].toLowerCase()} packet is with ${f.authority.name}`}
            {f.submittedAt ? ` since ${calendarDayText(f.submittedAt)}` : ""}
            {` (${FILING_STATUS_LABELS[f.status].toLowerCase()}).`}
            {f.revisionNeededSince
              ? " The design has changed since: a new revision is due."
              : " A change saved here means sending them a new revision."}
          </li>
        ))}
      </ul>
      {owing.length ? (
        <p className="mt-1">
          <Link href={`/projects/${projectId}/documents`}>Generate the new revision</Link>, then record it on the{" "}
          <Link href={`/projects/${projectId}/filings`}>Filings</Link> page.
        </p>
      ) : null}
    </div>
  );
}

import { InspectionCalendarLink } from "@/components/desk/inspection-calendar-link";
import { INSPECTION_KIND_LABELS, INSPECTION_RESULT_LABELS } from "@/lib/domain/filings";
import { calendarDayText } from "@/lib/domain/time-zones";
import type { ProjectFilingsDto } from "@/lib/dto/filings";

/** The inspections and utility visits booked for this project, with what the inspector asked to correct. */
export function FieldInspections({ filings }: { filings: ProjectFilingsDto }) {
  const visits = filings.filings.flatMap((f) => f.inspections.map((inspection) => ({ inspection, authority: f.authority.name })));
  if (!visits.length) return null;
  return (
    <section className="panel space-y-3" aria-labelledby="inspections-heading" data-testid="field-inspections">
      <h2 id="inspections-heading">Inspections</h2>
      <ol className="space-y-2">
        {visits.map(({ inspection, authority }) => (
          <li key={inspection.id} className="rounded border border-paper-edge p-2 text-sm">
            <p>
              <strong>{INSPECTION_KIND_LABELS[inspection.kind]}</strong> · {authority}
              {inspection.scheduledFor ? ` · ${calendarDayText(inspection.scheduledFor)}` : ""}
              {inspection.timeWindow ? `, ${inspection.timeWindow}` : ""}
              {inspection.inspectorName ? ` · ${inspection.inspectorName}` : ""}
            </p>
            <p className="mt-1">
              {inspection.result ? (
                <strong>{INSPECTION_RESULT_LABELS[inspection.result]}</strong>
              ) : (
                <span className="text-ink-soft">Booked</span>
              )}
              {inspection.resultOn ? ` on ${calendarDayText(inspection.resultOn)}` : ""}
              {inspection.scheduledFor && !inspection.result ? (
                <>
                  {" · "}
                  <InspectionCalendarLink inspectionId={inspection.id} />
                </>
              ) : null}
            </p>
            {inspection.items.length ? (
              <ul className="mt-1 list-disc pl-5">
                {inspection.items.map((item) => (
                  <li key={item.id}>
                    {item.text}
                    {item.reference ? ` (${item.reference})` : ""}
                    {item.resolved ? <span className="text-ink-soft"> — {item.response}</span> : null}
                  </li>
                ))}
              </ul>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}

import { InspectionCalendarLink } from "@/components/desk/inspection-calendar-link";
import { LocalTime } from "@/components/time/local-time";
import {
  INSPECTION_KIND_LABELS,
  INSPECTION_RESULT_LABELS,
  type FilingStatus,
  type InspectionKind,
  type InspectionPlanRow,
} from "@/lib/domain/filings";
import { calendarDayText } from "@/lib/domain/time-zones";
import type { FilingDto, FilingItemDto } from "@/lib/dto/filings";
import type {
  answerItemAction,
  attachLetterAction,
  changeFilingStatusAction,
  recordInspectionResultAction,
  recordPtoAction,
  recordRoundAction,
  scheduleInspectionAction,
  updateFilingDetailsAction,
} from "../actions";
import { FilingDetailsForm } from "./filing-details-form";
import { FilingFacts } from "./filing-facts";
import { FilingStatusForm } from "./filing-status-form";
import { BookInspectionForm, InspectionResultForm } from "./inspection-forms";
import { ItemAnswerForm } from "./item-answer-form";
import { LetterForm } from "./letter-form";
import { PtoForm } from "./pto-form";
import { RoundForm } from "./round-form";

/** The filing actions the page hands down. */
export type FilingActions = {
  change: typeof changeFilingStatusAction;
  update: typeof updateFilingDetailsAction;
  recordRound: typeof recordRoundAction;
  attachLetter: typeof attachLetterAction;
  answer: typeof answerItemAction;
  book: typeof scheduleInspectionAction;
  recordResult: typeof recordInspectionResultAction;
  recordPto: typeof recordPtoAction;
};

type Props = {
  projectId: string;
  filing: FilingDto;
  title: string;
  today: string;
  canEdit: boolean;
  actions: FilingActions;
  designRevision: number | null;
  nextStatuses: FilingStatus[];
  revisions: { id: string; label: string }[];
  payments: { id: string; label: string }[];
  takesRound: boolean;
  inspectionKinds: readonly InspectionKind[];
  plan: { rows: InspectionPlanRow[]; next: InspectionKind | null };
  failedInspections: { id: string; label: string }[];
};

/** A part of the card the office opens when it has something to record. */
function Task({ title, children, open = false }: { title: string; children: React.ReactNode; open?: boolean }) {
  return (
    <details className="rounded border border-paper-edge bg-white/60 p-3" open={open}>
      <summary className="cursor-pointer text-sm font-medium">{title}</summary>
      <div className="mt-3">{children}</div>
    </details>
  );
}

function Items({
  items,
  canEdit,
  designRevision,
  answer,
}: {
  items: FilingItemDto[];
  canEdit: boolean;
  designRevision: number | null;
  answer: FilingActions["answer"];
}) {
  return (
    <ol className="space-y-2">
      {items.map((item, i) => (
        <li key={item.id} className="rounded border border-paper-edge p-2 text-sm" data-testid="filing-item">
          <p>
            <span className="measure text-ink-faint">{i + 1}.</span> {item.text}
            {item.reference ? <span className="ml-2 rounded bg-paper-deep px-1.5 py-0.5 text-xs">{item.reference}</span> : null}
          </p>
          {item.resolved ? (
            <p className="mt-1 text-ink-soft">
              Answered: {item.response}
              {item.designRevision ? <span className="measure"> (design revision {item.designRevision})</span> : null}
            </p>
          ) : canEdit ? (
            <ItemAnswerForm itemId={item.id} designRevision={designRevision} answer={answer} />
          ) : (
            <p className="mt-1 text-ink-faint">Not answered yet.</p>
          )}
        </li>
      ))}
    </ol>
  );
}

/** One authority's filing: its facts, its correction rounds, its inspections, and what the office can record next. */
export function FilingCard(props: Props) {
  const { filing, today, canEdit, actions } = props;
  const byId = new Map(filing.inspections.map((i) => [i.id, i]));
  return (
    <section
      id={`filing-${filing.id}`}
      className="panel scroll-mt-4 space-y-4"
      aria-label={props.title}
      data-testid={`filing-${filing.kind}`}
    >
      <h2 className="text-base">{props.title}</h2>
      {filing.revisionNeededSince ? (
        <p className="rounded border border-result-warn/40 bg-result-warn/10 px-3 py-2 text-sm" role="status">
          The design changed after {filing.packetRevision ? `Rev ${filing.packetRevision}` : "the packet"} went in (
          <LocalTime iso={filing.revisionNeededSince} style="date" />
          ): generate a new revision on the Documents page and send it.
        </p>
      ) : null}
      {filing.customerSince ? (
        <p className="text-sm text-ink-soft">
          Waiting for the customer since <LocalTime iso={filing.customerSince} style="date" />.
        </p>
      ) : null}
      <FilingFacts filing={filing} today={today} />
      {filing.notes ? <p className="whitespace-pre-line text-sm text-ink-soft">{filing.notes}</p> : null}

      {filing.rounds.length ? (
        <div className="space-y-3">
          <h3 className="text-sm font-semibold">Correction rounds</h3>
          {filing.rounds.map((round) => (
            <div key={round.id} className="space-y-2" data-testid="correction-round">
              <p className="text-sm">
                <strong>Round {round.number}</strong>, received {calendarDayText(round.receivedAt)}
                {round.revisionAtReceipt ? ` on Rev ${round.revisionAtReceipt}` : ""}
                {round.answeredAt ? " · answered" : ""}
                {round.resubmittedRevision ? ` · resubmitted as Rev ${round.resubmittedRevision}` : ""}
              </p>
              {round.letterFileId ? (
                <p className="text-sm">
                  Letter:{" "}
                  <a href={`/api/v1/projects/${props.projectId}/files/${round.letterFileId}`} download data-testid="round-letter">
                    {round.letterFileName ?? "download"}
                  </a>
                </p>
              ) : canEdit ? (
                <LetterForm projectId={props.projectId} roundId={round.id} number={round.number} attach={actions.attachLetter} />
              ) : null}
              <Items items={round.items} canEdit={canEdit} designRevision={props.designRevision} answer={actions.answer} />
            </div>
          ))}
        </div>
      ) : null}

      {props.plan.rows.some((r) => r.required) ? (
        <p className="text-sm" data-testid="required-inspections">
          <span className="text-ink-soft">Required by {filing.authority.name}: </span>
          {props.plan.rows
            .filter((r) => r.required)
            .map((r) => `${INSPECTION_KIND_LABELS[r.kind]} ${r.passed ? "passed" : "still to pass"}`)
            .join(" · ")}
        </p>
      ) : null}
      {filing.inspections.length ? (
        <div className="space-y-2">
          <h3 className="text-sm font-semibold">Inspections</h3>
          <ol className="space-y-2">
            {filing.inspections.map((inspection) => {
              const repeats = inspection.reinspectionOf ? byId.get(inspection.reinspectionOf) : undefined;
              return (
                <li key={inspection.id} className="rounded border border-paper-edge p-2 text-sm" data-testid="inspection">
                  <p>
                    <strong>{INSPECTION_KIND_LABELS[inspection.kind]}</strong>
                    {inspection.scheduledFor ? ` · ${calendarDayText(inspection.scheduledFor)}` : ""}
                    {inspection.timeWindow ? `, ${inspection.timeWindow}` : ""}
                    {inspection.inspectorName ? ` · ${inspection.inspectorName}` : ""}
                    {repeats
                      ? ` · re-inspects the ${INSPECTION_KIND_LABELS[repeats.kind].toLowerCase()} of ${calendarDayText(repeats.resultOn ?? repeats.scheduledFor ?? today)}`
                      : ""}
                    {inspection.scheduledFor && !inspection.result ? (
                      <>
                        {" · "}
                        <InspectionCalendarLink inspectionId={inspection.id} />
                      </>
                    ) : null}
                  </p>
                  <p className="mt-1">
                    {inspection.result ? (
                      <strong data-testid="inspection-result">{INSPECTION_RESULT_LABELS[inspection.result]}</strong>
                    ) : (
                      <span className="text-ink-soft">Booked, no result yet</span>
                    )}
                    {inspection.resultOn ? ` on ${calendarDayText(inspection.resultOn)}` : ""}
                    {inspection.notes ? ` · ${inspection.notes}` : ""}
                  </p>
                  {inspection.items.length ? (
                    <Items items={inspection.items} canEdit={canEdit} designRevision={props.designRevision} answer={actions.answer} />
                  ) : null}
                  {!inspection.result && canEdit ? (
                    <Task title="Record the result">
                      <InspectionResultForm
                        inspectionId={inspection.id}
                        inspectorName={inspection.inspectorName}
                        today={today}
                        record={actions.recordResult}
                      />
                    </Task>
                  ) : null}
                </li>
              );
            })}
          </ol>
        </div>
      ) : null}

      {canEdit ? (
        <div className="space-y-2">
          {props.nextStatuses.length ? (
            <Task title="Change the status">
              <FilingStatusForm
                key={filing.status}
                filingId={filing.id}
                nextStatuses={props.nextStatuses}
                referenceNumber={filing.referenceNumber}
                revisions={props.revisions}
                today={today}
                change={actions.change}
                asksCustomerSignature={filing.kind === "interconnection"}
              />
            </Task>
          ) : null}
          {props.takesRound ? (
            <Task title={`Record corrections (round ${filing.rounds.length + 1})`}>
              <RoundForm
                key={filing.rounds.length}
                projectId={props.projectId}
                filingId={filing.id}
                number={filing.rounds.length + 1}
                today={today}
                record={actions.recordRound}
              />
            </Task>
          ) : null}
          {props.inspectionKinds.length ? (
            <Task title="Book an inspection">
              <BookInspectionForm
                key={`${filing.inspections.length}-${props.failedInspections.length}`}
                filingId={filing.id}
                kinds={props.plan.rows.filter((r) => props.inspectionKinds.includes(r.kind))}
                next={props.plan.next}
                failed={props.failedInspections}
                today={today}
                book={actions.book}
              />
            </Task>
          ) : null}
          {filing.kind === "interconnection" && filing.status === "approved" && !filing.ptoOn ? (
            <Task title="Record permission to operate">
              <PtoForm filingId={filing.id} today={today} record={actions.recordPto} />
            </Task>
          ) : null}
          <Task title="Details: number, follow-up, fee, notes">
            <FilingDetailsForm
              filingId={filing.id}
              initial={{
                referenceNumber: filing.referenceNumber ?? "",
                nextFollowUpOn: filing.nextFollowUpOn ?? "",
                paymentId: filing.paymentId ?? "",
                waitingOnCustomer: filing.customerSince !== null,
                notes: filing.notes,
              }}
              payments={props.payments}
              update={actions.update}
            />
          </Task>
        </div>
      ) : null}
    </section>
  );
}

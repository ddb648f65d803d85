import type { Metadata } from "next";
import { ProjectSubpageHeader } from "@/components/projects/project-subpage-header";
import { LocalTime } from "@/components/time/local-time";
import { can } from "@/lib/domain/permissions";
import {
  FILING_KIND_LABELS,
  INSPECTION_KIND_LABELS,
  INSPECTION_KINDS_BY_FILING,
  NEXT_STATUSES,
  WAITING_PARTY_LABELS,
  WITH_THE_AUTHORITY,
  inspectionPlan,
  isFiled,
  needsReinspection,
} from "@/lib/domain/filings";
import type { FilingDto } from "@/lib/dto/filings";
import { calendarDayText, localIsoDate } from "@/lib/domain/time-zones";
import { centsToDollarsText } from "@/lib/fees/money";
import { requireUser } from "@/lib/server/auth";
import { listAuthorities } from "@/lib/server/data/authorities";
import { getDesignStatus } from "@/lib/server/data/designs";
import { listProjectFilings } from "@/lib/server/data/filings";
import { getOrganization } from "@/lib/server/data/organizations";
import { listPackets } from "@/lib/server/data/packets";
import { listSettledPayments } from "@/lib/server/data/payments";
import { loadProjectOr404 } from "@/lib/server/pages";
import { AddFilingForm } from "./_components/add-filing-form";
import { FilingCard, type FilingActions } from "./_components/filing-card";
import {
  addFilingAction,
  answerItemAction,
  attachLetterAction,
  changeFilingStatusAction,
  recordInspectionResultAction,
  recordPtoAction,
  recordRoundAction,
  scheduleInspectionAction,
  updateFilingDetailsAction,
} from "./actions";

export const metadata: Metadata = { title: "Filings" };

const ACTIONS: FilingActions = {
  change: changeFilingStatusAction,
  update: updateFilingDetailsAction,
  recordRound: recordRoundAction,
  attachLetter: attachLetterAction,
  answer: answerItemAction,
  book: scheduleInspectionAction,
  recordResult: recordInspectionResultAction,
  recordPto: recordPtoAction,
};

export default async function FilingsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  const canEdit = can(viewer, "filings:edit", { organizationId: viewer.organizationId, installerId: project.installer?.id ?? null });
  const [filings, organization, packets, design, settled, ahjs, utilities] = await Promise.all([
    listProjectFilings({ viewer, projectId: project.id }),
    getOrganization({ viewer }),
    listPackets({ viewer, projectId: project.id }),
    getDesignStatus({ viewer, projectId: project.id }),
    canEdit ? listSettledPayments({ viewer, projectId: project.id }) : [],
    canEdit ? listAuthorities({ viewer, kind: "jurisdiction" }) : [],
    canEdit ? listAuthorities({ viewer, kind: "utility" }) : [],
  ]);
  // The authority profile's required visits order the booking form and show what is still to pass.
  const requiredOf = (filing: FilingDto) =>
    (filing.authority.kind === "ahj" ? ahjs : filing.authority.kind === "utility" ? utilities : []).find(
      (a) => a.id === filing.authority.id,
    )?.requiredInspections ?? [];
  const authorities = [
    ...ahjs.map((a) => ({ value: `jurisdiction:${a.id}`, label: `AHJ: ${a.name}` })),
    ...utilities.map((u) => ({ value: `utility:${u.id}`, label: `Utility: ${u.name}` })),
  ];
  const today = localIsoDate(new Date().toISOString(), organization.timeZone);
  // The fee that went with a filing is chosen among the project's settled payments.
  const payments = settled.map((p) => ({
    id: p.id,
    label: `${centsToDollarsText(p.amountCents)} paid ${calendarDayText(localIsoDate(p.paidAt, organization.timeZone))}`,
  }));
  return (
    <div className="space-y-5">
      <ProjectSubpageHeader project={project} title="Filings">
        Each authority that must say yes, side by side: what went in, what came back, the inspections, and who holds the project now.
        Requirements differ from one AHJ and utility to the next: follow each authority&apos;s own instructions.
      </ProjectSubpageHeader>
      <section className="panel flex flex-wrap items-center gap-x-6 gap-y-1 text-sm" aria-label="Waiting on" data-testid="waiting-on">
        {filings.waitingOn ? (
          <>
            <span>
              Waiting on <strong>{WAITING_PARTY_LABELS[filings.waitingOn]}</strong>
            </span>
            {filings.waitingSince ? (
              <span className="text-ink-soft">
                since <LocalTime iso={filings.waitingSince} style="date" />
              </span>
            ) : null}
          </>
        ) : (
          <span>Nobody is holding this project.</span>
        )}
      </section>
      {filings.filings.length === 0 ? (
        <p className="panel text-sm text-ink-soft">No filing yet: choose the project&apos;s AHJ and utility on its edit page.</p>
      ) : null}
      {filings.filings.map((filing) => {
        const kinds = INSPECTION_KINDS_BY_FILING[filing.kind];
        return (
          <FilingCard
            key={filing.id}
            projectId={project.id}
            filing={filing}
            title={`${filing.kind === "other" && filing.title ? filing.title : FILING_KIND_LABELS[filing.kind]} · ${filing.authority.name}`}
            today={today}
            canEdit={canEdit}
            actions={ACTIONS}
            designRevision={design?.revision ?? null}
            nextStatuses={NEXT_STATUSES[filing.status].filter((s) => s !== "corrections_requested")}
            revisions={packets
              .filter((p) => p.status === "ready" && (filing.kind === "other" || p.kind === filing.kind))
              .map((p) => ({ id: p.id, label: `Rev ${p.revision}` }))
              .reverse()}
            payments={payments}
            takesRound={WITH_THE_AUTHORITY.includes(filing.status)}
            inspectionKinds={filing.kind === "permit" ? (filing.status === "approved" ? kinds : []) : isFiled(filing.status) ? kinds : []}
            plan={inspectionPlan(kinds, requiredOf(filing), filing.inspections)}
            failedInspections={filing.inspections
              .filter((i) => needsReinspection(i.result) && !filing.inspections.some((r) => r.reinspectionOf === i.id))
              .map((i) => ({
                id: i.id,
                label: `${INSPECTION_KIND_LABELS[i.kind]} of ${i.resultOn ? calendarDayText(i.resultOn) : i.scheduledFor ? calendarDayText(i.scheduledFor) : "an unknown day"}`,
              }))}
          />
        );
      })}
      {canEdit ? (
        <details className="panel" data-testid="add-filing">
          <summary className="cursor-pointer text-sm font-medium">Add another approval (an HOA, a separate electrical permit…)</summary>
          <div className="mt-3">
            <AddFilingForm projectId={project.id} authorities={authorities} add={addFilingAction} />
          </div>
        </details>
      ) : null}
    </div>
  );
}

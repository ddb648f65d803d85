import type { Metadata } from "next";
import Link from "next/link";
import { CheckStatusChip } from "@/components/review/check-status";
import { LocalTime } from "@/components/time/local-time";
import { StageBadge } from "@/components/ui/stage-badge";
import { WAITING_PARTY_LABELS } from "@/lib/domain/filings";
import { can } from "@/lib/domain/permissions";
import { requireUser } from "@/lib/server/auth";
import { getFieldSummary } from "@/lib/server/data/commissioning";
import { getDesignStatus } from "@/lib/server/data/designs";
import { listStageChanges } from "@/lib/server/data/projects";
import { loadProjectOr404 } from "@/lib/server/pages";
import { StageChangeForm } from "./_components/stage-change-form";
import { StageTimeline } from "./_components/stage-timeline";
import { changeStageAction, setHoldAction } from "../actions";
import { HoldForm } from "./_components/hold-form";

export const metadata: Metadata = { title: "Project" };

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <dt className="text-xs uppercase tracking-wide text-ink-faint">{label}</dt>
      <dd className="mt-0.5">{children ?? <span className="text-ink-faint">—</span>}</dd>
    </div>
  );
}

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const viewer = await requireUser();
  const project = await loadProjectOr404(viewer, (await params).projectId);
  const [timeline, design, field] = await Promise.all([
    listStageChanges({ viewer, projectId: project.id }),
    getDesignStatus({ viewer, projectId: project.id }),
    getFieldSummary({ viewer, projectId: project.id }),
  ]);
  const amps = (v: number | null) => (v === null ? null : <span className="measure">{v} A</span>);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="measure text-sm text-ink-faint">Project No. {project.number}</p>
          <h1>{project.customerName}</h1>
          <p className="text-ink-soft">{project.address}</p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Link
            href={`/projects/${project.id}/design`}
            className="rounded bg-copper px-4 py-2 text-sm font-medium text-white no-underline hover:bg-copper-dark hover:no-underline"
          >
            Design and review
          </Link>
          <Link
            href={`/projects/${project.id}/documents`}
            className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
          >
            Documents
          </Link>
          <Link
            href={`/projects/${project.id}/filings`}
            className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
          >
            Filings
          </Link>
          <Link
            href={`/projects/${project.id}/field`}
            className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
          >
            Field record
          </Link>
          <Link
            href={`/projects/${project.id}/fees`}
            className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
          >
            Fees
          </Link>
          {can(viewer, "project:edit") ? (
            <Link
              href={`/projects/${project.id}/edit`}
              className="rounded border border-paper-edge bg-white px-4 py-2 text-sm no-underline hover:bg-paper-deep hover:no-underline"
            >
              Edit project
            </Link>
          ) : null}
        </div>
      </div>

      {project.holdState ? (
        <section
          className="rounded border border-result-warn/40 bg-result-warn/10 px-3 py-2 text-sm"
          aria-label="Set aside"
          data-testid="project-hold"
        >
          <strong>{project.holdState === "on_hold" ? "On hold" : "Cancelled"}</strong>: {project.holdReason}. It waits on nobody and is left
          out of the active projects.
        </section>
      ) : null}
      <section className="panel flex flex-wrap items-center gap-x-8 gap-y-2" aria-label="Current stage">
        <StageBadge stage={project.stage} />
        <span className="text-sm text-ink-soft">
          <span className="measure">{project.daysInStage}</span> day{project.daysInStage === 1 ? "" : "s"} in this stage
        </span>
        <span className="text-sm">
          Next: <strong>{project.nextAction}</strong>
        </span>
        <span className="text-sm" data-testid="project-waiting-on">
          {project.waitingOn ? (
            <>
              Waiting on <strong>{WAITING_PARTY_LABELS[project.waitingOn]}</strong>
              {project.waitingSince ? (
                <>
                  {" "}
                  since <LocalTime iso={project.waitingSince} style="date" />
                </>
              ) : null}
            </>
          ) : (
            "Nobody is holding it"
          )}
        </span>
      </section>

      <section className="panel flex flex-wrap items-center gap-3" aria-label="Design review" data-testid="design-status">
        <h2 className="text-base">Design review</h2>
        {!design ? (
          <span className="text-sm text-ink-faint">No design yet.</span>
        ) : design.reviewStatus === "incomplete" ? (
          <span className="text-sm text-ink-soft">The design is not complete enough to check yet.</span>
        ) : (
          <>
            <CheckStatusChip status={design.reviewStatus} />
            {design.counts ? (
              <span className="measure text-sm text-ink-soft">
                {design.counts.fail} fail · {design.counts.warn} warn · {design.counts.pass} pass
              </span>
            ) : null}
          </>
        )}
        {design ? <span className="text-xs text-ink-faint">revision {design.revision}</span> : null}
        <Link href={`/projects/${project.id}/design`} className="ml-auto text-sm">
          Open the design
        </Link>
      </section>

      <section className="panel flex flex-wrap items-center gap-x-4 gap-y-2" aria-label="Field work" data-testid="field-status">
        <h2 className="text-base">Field work</h2>
        <span className="text-sm text-ink-soft">
          Commissioning:{" "}
          <strong>
            {field.status === "complete" ? (
              <>
                complete
                {field.completedAt ? (
                  <>
                    {" "}
                    (<LocalTime iso={field.completedAt} style="date" />)
                  </>
                ) : null}
              </>
            ) : field.status === "open" ? (
              "started, not complete"
            ) : (
              "not started"
            )}
          </strong>
        </span>
        <span className="text-sm text-ink-soft">
          Signed completion form: <strong>{field.signedForms ? "received" : "not yet"}</strong>
        </span>
        <span className="measure text-sm text-ink-faint">
          {field.photos} site photo{field.photos === 1 ? "" : "s"}
        </span>
        <Link href={`/projects/${project.id}/field`} className="ml-auto text-sm">
          Open the field record
        </Link>
      </section>

      <div className="grid gap-6 lg:grid-cols-3">
        <section className="panel lg:col-span-2" aria-labelledby="overview-heading">
          <h2 id="overview-heading" className="mb-3">
            Overview
          </h2>
          <dl className="grid gap-4 sm:grid-cols-2">
            <Fact label="Customer contact">{[project.customerEmail, project.customerPhone].filter(Boolean).join(" · ") || null}</Fact>
            <Fact label="AHJ">{project.jurisdiction ? `${project.jurisdiction.name} (NEC ${project.jurisdiction.necEdition})` : null}</Fact>
            <Fact label="Utility">{project.utility?.name}</Fact>
            <Fact label="Utility account / meter">
              {project.utilityAccountNumber || project.meterNumber ? (
                <span className="measure">{[project.utilityAccountNumber, project.meterNumber].filter(Boolean).join(" / ")}</span>
              ) : null}
            </Fact>
            <Fact label="Main breaker">{amps(project.mainBreakerA)}</Fact>
            <Fact label="Busbar rating">{amps(project.busbarA)}</Fact>
            <Fact label="Service">
              {project.serviceVoltageV ? (
                <span className="measure">
                  {project.serviceVoltageV} V, {project.servicePhases === 3 ? "three" : "single"} phase
                </span>
              ) : null}
            </Fact>
            <Fact label="Coordinator / installer">
              {project.coordinator?.name ?? "—"} / {project.installer?.name ?? "not assigned"}
            </Fact>
          </dl>
        </section>

        <section className="panel space-y-4" aria-labelledby="timeline-heading">
          <h2 id="timeline-heading">Stage timeline</h2>
          {can(viewer, "project:change-stage", { organizationId: viewer.organizationId, installerId: project.installer?.id ?? null }) ? (
            <>
              <StageChangeForm changeStage={changeStageAction} key={project.stage} projectId={project.id} current={project.stage} />
              <HoldForm projectId={project.id} holdState={project.holdState} setHold={setHoldAction} />
            </>
          ) : null}
          <StageTimeline entries={timeline} />
        </section>
      </div>
    </div>
  );
}

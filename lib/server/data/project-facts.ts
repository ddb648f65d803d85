import "server-only";
import type { Transaction } from "sequelize";
import { CommissioningRecord, CorrectionRound, Filing, Inspection, Organization, Project, StageChange } from "@/models";
import {
  stageFromFacts,
  resolveStage,
  waitingOn,
  type FilingFacts,
  type StageFacts,
  type WaitingFacts,
  type WaitingFiling,
} from "@/lib/domain/filings";
import { STAGE_LABELS, stageIndex, type Stage } from "@/lib/domain/stages";
import { DEFAULT_TIME_ZONE, localIsoDate } from "@/lib/domain/time-zones";

const earliest = (...dates: (string | null | undefined)[]) => dates.filter((d): d is string => Boolean(d)).sort()[0] ?? null;

type Loaded = { project: Project; filings: Filing[]; record: CommissioningRecord | null; timeZone: string };

async function load(projectId: string, transaction: Transaction): Promise<Loaded> {
  const project = await Project.findByPk(projectId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!project) throw new Error(`project ${projectId} vanished`);
  const [filings, record, organization] = await Promise.all([
    // Moments become the organization's calendar days, as every date it reads.
    Filing.findAll({
      where: { projectId },
      include: [
        { model: Inspection, as: "inspections" },
        { model: CorrectionRound, as: "rounds" },
      ],
      order: [["createdAt", "ASC"]],
      transaction,
    }),
    CommissioningRecord.findOne({ where: { projectId }, attributes: ["createdAt", "status", "completedAt"], transaction }),
    Organization.findByPk(project.organizationId, { attributes: ["timeZone"], transaction }),
  ]);
  return { project, filings, record, timeZone: organization?.timeZone ?? DEFAULT_TIME_ZONE };
}

const filingFacts = (f: Filing | undefined): FilingFacts | null =>
  f ? { status: f.status, referenceNumber: f.referenceNumber, submittedAt: f.submittedOn, decidedAt: f.decidedOn } : null;

/** The facts of one project as the stage and waiting-on rules read them. */
function factsOf({ project, filings, record, timeZone }: Loaded): { stage: StageFacts; permit?: Filing; interconnection?: Filing } {
  const day = (d: Date | null | undefined) => (d ? localIsoDate(d.toISOString(), timeZone) : null);
  const permit = filings.find((f) => f.kind === "permit");
  const interconnection = filings.find((f) => f.kind === "interconnection");
  const permitInspections = permit?.inspections ?? [];
  const firstInspection = earliest(
    ...permitInspections.filter((i) => i.result && i.result !== "cancelled").map((i) => i.resultOn ?? day(i.recordedAt)),
  );
  const finalPassed = earliest(
    ...permitInspections.filter((i) => i.kind === "final" && i.result === "passed").map((i) => i.resultOn ?? day(i.recordedAt)),
  );
  const stage: StageFacts = {
    // The office marks a design checked by hand once it has read the review; a filed permit implies it.
    designChecked: project.handStage !== null && stageIndex(project.handStage) >= stageIndex("design_checked"),
    permit: filingFacts(permit),
    interconnection: filingFacts(interconnection),
    installedAt: earliest(firstInspection, day(record?.createdAt)),
    finalInspectionPassedAt: finalPassed,
    commissionedAt: record?.status === "complete" ? (day(record.completedAt) ?? day(record.createdAt)) : null,
    ptoAt: interconnection?.ptoOn ?? null,
  };
  return { stage, permit, interconnection };
}

function waitingFacts(loaded: Loaded, stage: StageFacts, now: Date): WaitingFacts {
  const filings: WaitingFiling[] = loaded.filings.map((f) => ({
    kind: f.kind,
    authority: f.authorityKind === "jurisdiction" ? "ahj" : f.authorityKind === "utility" ? "utility" : "other",
    status: f.status,
    since: f.statusSince.toISOString(),
    revisionNeeded: f.revisionNeededSince !== null,
    customerSince: f.customerSince?.toISOString() ?? null,
    inspections: (f.inspections ?? []).map((i) => ({
      scheduledFor: i.scheduledFor,
      result: i.result,
      recordedAt: i.recordedAt?.toISOString() ?? null,
    })),
  }));
  return {
    today: localIsoDate(now.toISOString(), loaded.timeZone),
    createdAt: loaded.project.createdAt.toISOString(),
    hold: loaded.project.holdState,
    ptoAt: stage.ptoAt,
    installed: stage.installedAt !== null || stage.finalInspectionPassedAt !== null,
    installedAt: stage.installedAt,
    commissionedAt: stage.commissionedAt,
    filings,
  };
}

/** The facts' reading of a project: its stage, with the fact that reached it, and who it waits on. */
export async function readProjectFacts(projectId: string, transaction: Transaction, now = new Date()) {
  const loaded = await load(projectId, transaction);
  const { stage: facts, permit, interconnection } = factsOf(loaded);
  const derived = stageFromFacts(facts);
  return {
    loaded,
    facts,
    derived,
    stage: resolveStage(facts, loaded.project.handStage),
    waiting: waitingOn(waitingFacts(loaded, facts, now)),
    permit,
    interconnection,
  };
}

/**
 * Brings a project's stage and waiting-on in line with its facts, inside the caller's transaction. A
 * stage the facts move is recorded on the timeline with the fact that moved it; a hand-set stage stands
 * until the facts pass it.
 */
export async function refreshProjectFacts(
  projectId: string,
  { transaction, actorId = null, now = new Date() }: { transaction: Transaction; actorId?: string | null; now?: Date },
) {
  const { loaded, derived, stage, waiting, permit, interconnection } = await readProjectFacts(projectId, transaction, now);
  const project = loaded.project;
  const from = project.stage as Stage;
  const waitingSince = waiting ? new Date(waiting.since) : null;
  await project.update(
    {
      stage,
      ...(stage !== from ? { stageChangedAt: now } : {}),
      waitingOn: waiting?.party ?? null,
      waitingSince: waitingSince && !Number.isNaN(waitingSince.getTime()) ? waitingSince : null,
      permitStatus: permit?.status ?? null,
      interconnectionStatus: interconnection?.status ?? null,
    },
    { transaction },
  );
  if (stage !== from) {
    const reason = derived.reached.find((r) => r.stage === stage);
    const note = reason ? reason.fact : `Set by hand earlier: ${STAGE_LABELS[stage]}`;
    await StageChange.create(
      { organizationId: project.organizationId, projectId, fromStage: from, toStage: stage, changedById: actorId, note, cause: "facts" },
      { transaction },
    );
  }
  return { stage, waiting };
}

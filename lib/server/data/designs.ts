import "server-only";
import { Design, Jurisdiction, Project } from "@/models";
import { newDesignDraft } from "@/lib/design/defaults";
import { runDesignReview, type DesignReviewOutcome } from "@/lib/design/run-review";
import { toEngineInput, type SiteConditions } from "@/lib/design/to-engine";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import type { NecEdition } from "@/lib/engineering";
import { DesignDraft, DesignInput } from "@/lib/schemas/design";
import type { EquipmentDto } from "@/lib/schemas/equipment";
import { db } from "../db";
import { isUuid } from "./ids";
import { essSitingOf } from "@/lib/authorities/ess-siting";
import { adoptedEssSiting } from "./authorities";
import { recordAudit } from "./audit";
import { markRevisionNeeded } from "./filings";
import { refreshProjectFacts } from "./project-facts";
import { getEquipmentByIds } from "./equipment";
import { getProjectById } from "./projects";
import type { ProjectDto } from "@/lib/dto/projects";
import type { DesignDto, DesignStatusDto } from "@/lib/dto/designs";

/** An AHJ's design temperatures, edition and adopted ESS siting limits, as the review's site takes them. */
export function siteConditionsOf(j: Jurisdiction): SiteConditions {
  const essSiting = essSitingOf(adoptedEssSiting(j));
  return {
    recordLowTempC: j.recordLowTempC,
    highDesignTempC: j.highDesignTempC,
    necEdition: j.necEdition as NecEdition,
    ...(essSiting ? { essSiting } : {}),
  };
}

async function siteConditions(viewer: Viewer, jurisdictionId: string | null): Promise<SiteConditions | null> {
  if (!jurisdictionId) return null;
  const j = await Jurisdiction.findOne({ where: { id: jurisdictionId, organizationId: viewer.organizationId } });
  return j ? siteConditionsOf(j) : null;
}

/** Every catalog id the draft mentions, whatever its shape, for one lookup. */
export function referencedIds(draft: DesignDraft): string[] {
  const e = draft.equipment ?? {};
  // Storage's couplings hold different entries; any of them may name catalog items.
  const s = (draft.storage ?? {}) as { batteryInverterId?: unknown; banks?: ({ equipmentId?: unknown } | null | undefined)[] };
  const ids = [
    e.moduleId,
    e.deviceId,
    ...(e.inverters ?? []).map((l) => l?.equipmentId),
    s.batteryInverterId,
    ...(s.banks ?? []).map((l) => l?.equipmentId),
  ];
  return ids.filter((v): v is string => typeof v === "string" && isUuid(v));
}

export async function savedOrNewDesign(viewer: Viewer, project: ProjectDto): Promise<DesignDto> {
  const row = await Design.findOne({ where: { projectId: project.id, organizationId: viewer.organizationId } });
  if (!row)
    return {
      projectId: project.id,
      draft: newDesignDraft(project) as DesignDraft,
      isSaved: false,
      revision: 0,
      reviewStatus: "incomplete",
      updatedAt: null,
    };
  return {
    projectId: project.id,
    draft: row.draft as DesignDraft,
    isSaved: true,
    revision: row.revision,
    reviewStatus: row.reviewStatus,
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function contextFor(viewer: Viewer, project: ProjectDto, draft: DesignDraft) {
  const [catalog, conditions] = await Promise.all([
    getEquipmentByIds({ viewer, ids: referencedIds(draft) }),
    siteConditions(viewer, project.jurisdiction?.id ?? null),
  ]);
  return { catalog: catalog as EquipmentDto[], conditions };
}

/** The project's design, or a new draft prefilled from the project when none is saved. */
export async function getDesignForProject({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<DesignDto> {
  db();
  return savedOrNewDesign(viewer, await getProjectById({ viewer, projectId }));
}

/** The catalog items and site conditions a review of this draft needs. */
export async function getReviewContext({ viewer, projectId, draft }: { viewer: Viewer; projectId: string; draft: DesignDraft }) {
  db();
  return contextFor(viewer, await getProjectById({ viewer, projectId }), draft);
}

/** The project, its saved design and what a review of it needs, reading the project once. */
export async function getDesignWithContext({ viewer, projectId }: { viewer: Viewer; projectId: string }) {
  db();
  const project = await getProjectById({ viewer, projectId });
  const design = await savedOrNewDesign(viewer, project);
  return { project, design, ...(await contextFor(viewer, project, design.draft)) };
}

/** Reviews the saved design (or the new draft) exactly as the editor would. */
export async function reviewProjectDesign({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<DesignReviewOutcome> {
  const { design, catalog, conditions } = await getDesignWithContext({ viewer, projectId });
  return runDesignReview(design.draft, catalog, conditions);
}

/**
 * Saves the draft as typed (never refused for being incomplete), reviews it
 * and keeps the outcome, so lists and packets know whether the design passes.
 */
export async function saveDesignDraft({ viewer, projectId, draft: raw }: { viewer: Viewer; projectId: string; draft: unknown }) {
  const sequelize = db();
  const parsed = DesignDraft.safeParse(raw);
  if (!parsed.success) throw new AppError("INVALID_INPUT", "The design could not be read; nothing was saved.");
  const draft = parsed.data;
  const { catalog, conditions } = await getReviewContext({ viewer, projectId, draft });
  const outcome = runDesignReview(draft, catalog, conditions);
  const reviewStatus = outcome.status === "reviewed" ? outcome.review.summary.status : "incomplete";
  const reviewSummary = outcome.status === "reviewed" ? { ...outcome.review.summary } : null;
  const saved = await sequelize.transaction(async (transaction) => {
    const project = await Project.findOne({
      where: { id: projectId, organizationId: viewer.organizationId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!project || !can(viewer, "project:edit", project)) throw new AppError("NOT_FOUND", "No such project.");
    const existing = await Design.findOne({ where: { projectId }, transaction });
    const before = existing?.reviewStatus ?? null;
    const changed = !existing || JSON.stringify(existing.draft) !== JSON.stringify(draft);
    const row = existing
      ? await existing.update(
          {
            draft: draft as Record<string, unknown>,
            reviewStatus,
            reviewSummary,
            revision: changed ? existing.revision + 1 : existing.revision,
            updatedById: viewer.id,
          },
          { transaction },
        )
      : await Design.create(
          {
            organizationId: viewer.organizationId,
            projectId,
            draft: draft as Record<string, unknown>,
            reviewStatus,
            reviewSummary,
            updatedById: viewer.id,
          },
          { transaction },
        );
    // Autosave writes often; the trail records what matters: the review's outcome changing.
    if (before !== reviewStatus) {
      await recordAudit(
        {
          viewer,
          action: "design.review-changed",
          entityType: "project",
          entityId: projectId,
          changes: { reviewStatus: { before, after: reviewStatus } },
        },
        { transaction },
      );
    }
    // A changed design owes every authority still reviewing its packet a new revision.
    if (changed && (await markRevisionNeeded(projectId, { transaction })))
      await refreshProjectFacts(projectId, { transaction, actorId: viewer.id });
    return row;
  });
  return { revision: saved.revision, updatedAt: saved.updatedAt.toISOString(), outcome };
}

/** The outcome of the saved design's last review, for the project page; null when nothing is saved. */
export async function getDesignStatus({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<DesignStatusDto> {
  db();
  await getProjectById({ viewer, projectId });
  const row = await Design.findOne({ where: { projectId, organizationId: viewer.organizationId } });
  if (!row) return null;
  const s = row.reviewSummary as { pass?: number; warn?: number; fail?: number } | null;
  return {
    reviewStatus: row.reviewStatus,
    revision: row.revision,
    updatedAt: row.updatedAt.toISOString(),
    counts: s ? { pass: s.pass ?? 0, warn: s.warn ?? 0, fail: s.fail ?? 0 } : null,
  };
}

/** The saved design as the review engine reads it, for drawing its single-line diagram; null while incomplete. */
export async function getEngineDesign({ viewer, projectId }: { viewer: Viewer; projectId: string }) {
  const { design, catalog, conditions } = await getDesignWithContext({ viewer, projectId });
  const parsed = DesignInput.safeParse(design.draft);
  if (!parsed.success || !conditions) return null;
  const engine = toEngineInput(parsed.data, catalog, conditions);
  return engine.ok ? { design: engine.design, site: engine.site } : null;
}

import "server-only";
import { countSignedCertificates } from "./customer-signatures";
import { CommissioningRecord, Project, ProjectFile, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { checkCommissioning, commissioningComplete, type CommissioningCompletion } from "@/lib/engineering/commissioning";
import { AppError } from "@/lib/errors";
import {
  commissioningFacts,
  emptyReadings,
  moduleMonitoringOf,
  toCommissioningRecord,
  type CommissioningFacts,
} from "@/lib/field/commissioning-facts";
import type { CommissioningDocumentInput, CommissioningDocumentKind } from "@/lib/documents/commissioning/input";
import { openCountsInWords } from "@/lib/field/completion-words";
import type { ReviewedDesign } from "@/lib/dto/reviewed-design";
import { CommissioningReadings, SaveCommissioningInput } from "@/lib/schemas/commissioning";
import type { CommissioningStatus } from "@/lib/domain/stored-values";
import { db } from "../db";
import { recordAudit } from "./audit";
import { documentOrganization, getOrganization } from "./organizations";
import { getReviewedDesign } from "./reviewed-design";
import { getProjectById } from "./projects";
import { refreshProjectFacts } from "./project-facts";
import type { CommissioningDto, SaveCommissioningResult, FieldSummaryDto } from "@/lib/dto/commissioning";

export type CommissioningContext = { reviewed: ReviewedDesign; facts: CommissioningFacts };

/** The design facts a record is checked against; CONFLICT while the design cannot be reviewed. */
export async function getCommissioningContext({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<CommissioningContext> {
  const snapshot = await getReviewedDesign({ viewer, projectId });
  if (snapshot.status !== "reviewed")
    throw new AppError(
      "CONFLICT",
      "Commissioning is checked against the project's design, and the design is not complete yet. Ask the office to finish it.",
    );
  const { reviewed } = snapshot;
  const { ratings } = reviewed.review.summary;
  const facts = commissioningFacts({
    design: reviewed.design,
    edition: reviewed.site.necEdition,
    acceptedGridProfiles: reviewed.utility?.acceptedGridProfiles ?? [],
    moduleCount: ratings.moduleCount,
    acKw: ratings.acKw,
    moduleMonitoring: moduleMonitoringOf(reviewed.equipment),
  });
  return { reviewed, facts };
}

/** Stored readings written before a design change may not parse any more; the installer then starts the changed parts again. */
function storedReadings(row: CommissioningRecord | null, facts: CommissioningFacts) {
  const parsed = row ? CommissioningReadings.safeParse(row.readings) : null;
  return parsed?.success ? parsed.data : emptyReadings(facts);
}

function toDto(
  projectId: string,
  facts: CommissioningFacts,
  readings: CommissioningReadings,
  row: CommissioningRecord | null,
): CommissioningDto {
  const record = toCommissioningRecord(facts, readings);
  const results = checkCommissioning(record);
  return {
    projectId,
    facts,
    readings,
    record,
    results,
    completion: commissioningComplete(results),
    status: row?.status ?? "open",
    updatedAt: row?.updatedAt.toISOString() ?? null,
    completedAt: row?.completedAt?.toISOString() ?? null,
  };
}

/** The project's commissioning record (empty until first saved), checked against the current design. */
export async function getCommissioning({
  viewer,
  projectId,
}: {
  viewer: Viewer;
  projectId: string;
}): Promise<CommissioningDto & { context: CommissioningContext }> {
  db();
  const context = await getCommissioningContext({ viewer, projectId });
  const row = await CommissioningRecord.findOne({ where: { projectId, organizationId: viewer.organizationId } });
  return { ...toDto(projectId, context.facts, storedReadings(row, context.facts), row), context };
}

/**
 * Saves the readings as typed, always, so nothing entered on site is lost. Marking the record
 * complete is refused, with the reason, while any check fails or a reading is missing; a complete
 * record whose readings change is checked again and reopens if it no longer passes.
 */
export async function saveCommissioning({
  viewer,
  input,
}: {
  viewer: Viewer;
  input: SaveCommissioningInput;
}): Promise<SaveCommissioningResult> {
  const sequelize = db();
  const { projectId, readings, complete } = SaveCommissioningInput.parse(input);
  const { facts } = await getCommissioningContext({ viewer, projectId });
  const dto = toDto(projectId, facts, readings, null);
  const passes = dto.completion.complete;
  const row = await sequelize.transaction(async (transaction) => {
    const project = await Project.findOne({
      where: { id: projectId, organizationId: viewer.organizationId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!project || !can(viewer, "field:record", project)) throw new AppError("NOT_FOUND", "No such project.");
    const existing = await CommissioningRecord.findOne({ where: { projectId }, transaction });
    const before: CommissioningStatus = existing?.status ?? "open";
    const wasComplete = before === "complete";
    const status: CommissioningStatus = passes && (complete || wasComplete) ? "complete" : "open";
    const values = {
      readings: readings as unknown as Record<string, unknown>,
      status,
      completedAt: status === "complete" ? (wasComplete ? existing!.completedAt : new Date()) : null,
      completedById: status === "complete" ? (wasComplete ? existing!.completedById : viewer.id) : null,
      updatedById: viewer.id,
    };
    const saved = existing
      ? await existing.update(values, { transaction })
      : await CommissioningRecord.create({ organizationId: viewer.organizationId, projectId, ...values }, { transaction });
    if (status !== before) {
      await recordAudit(
        {
          viewer,
          action: status === "complete" ? "commissioning.completed" : "commissioning.reopened",
          entityType: "project",
          entityId: projectId,
          changes: { status: { before, after: status } },
        },
        { transaction },
      );
    }
    // The field record is a fact of the project's stage: begun (the work is installed) and completed.
    if (!existing || status !== before) await refreshProjectFacts(projectId, { transaction, actorId: viewer.id });
    return saved;
  });
  const refused = complete && !passes ? refusal(dto.completion) : null;
  return { ...toDto(projectId, facts, readings, row), completeRefused: refused };
}

function refusal({ failing, missing, waiting }: CommissioningCompletion): string {
  const open = openCountsInWords({ failing: failing.length, notRecorded: missing.length, waiting: waiting.length });
  return `Saved, but not marked complete: ${open}. Correct, record or wait for them, then mark it complete.`;
}

/** What the certificate of completion and the commissioning report print, from the saved record and the current design. */
export async function buildCommissioningDocumentInput({
  viewer,
  projectId,
  kind,
}: {
  viewer: Viewer;
  projectId: string;
  kind: CommissioningDocumentKind;
}): Promise<CommissioningDocumentInput> {
  const dto = await getCommissioning({ viewer, projectId });
  const input = dto.context.reviewed;
  const [organization, installer] = await Promise.all([
    getOrganization({ viewer }),
    input.project.installer
      ? User.findOne({ where: { id: input.project.installer.id, organizationId: viewer.organizationId }, attributes: ["name", "email"] })
      : null,
  ]);
  const { ratings } = input.review.summary;
  const m = input.equipment.module;
  const device = input.equipment.device;
  return {
    kind,
    generatedAt: new Date().toISOString(),
    organization: documentOrganization(organization),
    project: {
      number: input.project.number,
      customerName: input.project.customerName,
      address: `${input.project.street}, ${input.project.city}, ${input.project.state} ${input.project.postalCode}`,
      jurisdictionName: input.jurisdiction.name,
      utilityName: input.utility?.name ?? null,
      utilityAccountNumber: input.project.utilityAccountNumber,
      meterNumber: input.project.meterNumber,
    },
    system: {
      dcKw: ratings.dcKw,
      acKw: ratings.acKw,
      moduleCount: ratings.moduleCount,
      moduleSummary: `${ratings.moduleCount} × ${m.maker} ${m.model} (${m.specs.powerW} W)`,
      inverterSummary: input.equipment.inverters
        .map((l) => `${l.quantity} × ${l.item.maker} ${l.item.model} (${l.item.specs.acPowerW.toLocaleString("en-US")} W AC)`)
        .join("; "),
      shutdownSummary: device
        ? `${device.maker} ${device.model} ${device.specs.deviceKind === "optimizer" ? "optimizers" : "rapid shutdown devices"}, one per module`
        : null,
    },
    installer: installer ? { name: installer.name, email: installer.email } : null,
    record: dto.record,
    results: dto.results,
    completion: dto.completion,
    recordUpdatedAt: dto.updatedAt,
    completedAt: dto.completedAt,
  };
}

/** What the project page shows of the field work, without reviewing the design again. */
export async function getFieldSummary({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<FieldSummaryDto> {
  db();
  await getProjectById({ viewer, projectId });
  const where = { projectId, organizationId: viewer.organizationId };
  const [record, uploadedForms, signedHere, photos] = await Promise.all([
    CommissioningRecord.findOne({ where, attributes: ["status", "completedAt"] }),
    ProjectFile.count({ where: { ...where, kind: "signed-completion" } }),
    countSignedCertificates(projectId),
    ProjectFile.count({ where: { ...where, kind: "site-photo" } }),
  ]);
  return {
    status: record?.status ?? "not-started",
    completedAt: record?.completedAt?.toISOString() ?? null,
    signedForms: uploadedForms + signedHere,
    photos,
  };
}

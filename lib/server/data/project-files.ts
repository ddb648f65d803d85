import "server-only";
import { createHash, randomUUID } from "node:crypto";
import type { Transaction } from "sequelize";
import { CommissioningRecord, ProjectFile, User } from "@/models";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import {
  ALLOWED_TYPES,
  FIELD_WORK_ENDS_AT,
  MAX_UPLOAD_BYTES,
  allowedTypesText,
  displayFileName,
  hasThumbnail,
  mayRemoveUpload,
  tooLargeMessage,
} from "@/lib/field/upload-rules";
import { STAGE_LABELS, stageIndex } from "@/lib/domain/stages";
import { PROJECT_FILE_KINDS, type ProjectFileKind } from "@/lib/domain/stored-values";
import { completionReceivedEmail } from "@/templates/email/completion-received";
import { db } from "../db";
import { env } from "../env";
import { enqueueMail } from "./outbox";
import { sniffMimeType } from "../services/file-sniffing";
import { deleteObject, putObject } from "../services/storage";
import { recordAudit } from "./audit";
import { isUuid } from "./ids";
import { getProjectById } from "./projects";
import type { ProjectDto } from "@/lib/dto/projects";
import { queueStorageRemovals, sweepStorageRemovals } from "./storage-removals";
import type { ProjectFileDto } from "@/lib/dto/project-files";

const scopeOf = (viewer: Viewer, project: ProjectDto) => ({
  organizationId: viewer.organizationId,
  installerId: project.installer?.id ?? null,
  stage: project.stage,
});

const toDto = (f: ProjectFile, viewer: Viewer, project: ProjectDto): ProjectFileDto => ({
  id: f.id,
  kind: f.kind,
  fileName: f.fileName,
  contentType: f.contentType,
  sizeBytes: f.sizeBytes,
  uploadedBy: f.uploadedBy?.name ?? null,
  createdAt: f.createdAt.toISOString(),
  hasThumbnail: hasThumbnail(f.contentType),
  canRemove: mayRemoveUpload(viewer, scopeOf(viewer, project), f),
});

export function isProjectFileKind(value: unknown): value is ProjectFileKind {
  return typeof value === "string" && (PROJECT_FILE_KINDS as readonly string[]).includes(value);
}

/** Refuses a file whose bytes are not an allowed type, whatever its name says. */
async function judgeFile(kind: ProjectFileKind, bytes: Uint8Array): Promise<string> {
  if (bytes.length === 0) throw new AppError("INVALID_INPUT", "The file is empty.");
  if (bytes.length > MAX_UPLOAD_BYTES) throw new AppError("TOO_LARGE", tooLargeMessage(bytes.length));
  const mime = await sniffMimeType(bytes);
  if (!mime || !(mime in ALLOWED_TYPES[kind])) {
    throw new AppError(
      "UNSUPPORTED_TYPE",
      `This file's contents are not ${allowedTypesText(kind)} (the type is read from the file itself, not its name). Nothing was saved.`,
    );
  }
  return mime;
}

/**
 * Stores one upload under a key the server makes, then records it. A signed completion form also
 * puts a notice to the project's coordinator in the outbox, in the same transaction as the record.
 */
export async function uploadProjectFile({
  viewer,
  projectId,
  kind,
  fileName,
  bytes,
}: {
  viewer: Viewer;
  projectId: string;
  kind: ProjectFileKind;
  fileName: string;
  bytes: Uint8Array;
}): Promise<ProjectFileDto> {
  const sequelize = db();
  const project = await getProjectById({ viewer, projectId });
  const scope = { organizationId: viewer.organizationId, installerId: project.installer?.id ?? null };
  // A comment letter is office work on a filing; everything else is the field record.
  const letter = kind === "comment-letter";
  if (!can(viewer, letter ? "filings:edit" : "field:record", scope))
    throw letter ? new AppError("FORBIDDEN", "You cannot change this project's filings.") : new AppError("NOT_FOUND", "No such project.");
  const contentType = await judgeFile(kind, bytes);
  const name = displayFileName(fileName, contentType);
  const objectKey = `projects/${projectId}/${letter ? "letters" : "field"}/${randomUUID()}.${name.split(".").pop()}`;
  await putObject({ key: objectKey, body: bytes, contentType });
  try {
    const id = await sequelize.transaction(async (transaction) => {
      const row = await ProjectFile.create(
        {
          organizationId: viewer.organizationId,
          projectId,
          kind,
          objectKey,
          fileName: name,
          contentType,
          sizeBytes: bytes.length,
          sha256: createHash("sha256").update(bytes).digest("hex"),
          uploadedById: viewer.id,
        },
        { transaction },
      );
      await recordAudit(
        {
          viewer,
          action: "file.uploaded",
          entityType: "project",
          entityId: projectId,
          changes: { file: { before: null, after: `${kind}: ${name}` } },
        },
        { transaction },
      );
      if (kind === "signed-completion") {
        const to = await coordinatorAddress(viewer, project.coordinator?.id ?? null, transaction);
        const record = await CommissioningRecord.findOne({ where: { projectId }, transaction });
        const mail = completionReceivedEmail({
          installerName: viewer.name,
          projectNumber: project.number,
          siteAddress: project.address,
          fileName: name,
          commissioning: record?.status === "complete" ? "complete, every check passed." : "still open: some readings fail or are missing.",
          url: `${env().APP_URL}/projects/${projectId}/field`,
        });
        if (to) await enqueueMail({ to, ...mail, organizationId: viewer.organizationId }, { transaction });
      }
      return row.id;
    });
    return toDto(
      (await ProjectFile.findByPk(id, { include: [{ model: User, as: "uploadedBy", attributes: ["name"] }] }))!,
      viewer,
      project,
    );
  } catch (error) {
    await deleteObject(objectKey).catch(() => undefined);
    throw error;
  }
}

/** The project's coordinator, or else the organization's longest-standing active admin, so a notice always has someone to go to. */
export async function coordinatorAddress(
  viewer: Pick<Viewer, "organizationId">,
  coordinatorId: string | null,
  transaction: Transaction,
): Promise<string | null> {
  const active = { organizationId: viewer.organizationId, isActive: true };
  const coordinator = coordinatorId ? await User.findOne({ where: { ...active, id: coordinatorId }, transaction }) : null;
  const admin = coordinator
    ? null
    : await User.findOne({ where: { ...active, role: "admin" }, order: [["createdAt", "ASC"]], transaction });
  return (coordinator ?? admin)?.email ?? null;
}

export async function listProjectFiles({ viewer, projectId }: { viewer: Viewer; projectId: string }): Promise<ProjectFileDto[]> {
  db();
  const project = await getProjectById({ viewer, projectId });
  const rows = await ProjectFile.findAll({
    where: { projectId, organizationId: viewer.organizationId },
    include: [{ model: User, as: "uploadedBy", attributes: ["name"] }],
    order: [["createdAt", "DESC"]],
  });
  return rows.map((row) => toDto(row, viewer, project));
}

/**
 * Removes an upload made by mistake: its record goes and the removal is audited in one transaction,
 * which also marks the stored object for removal; the object is removed after the commit. If storage
 * fails then, the failure is logged and the worker's sweep tries again: the caller is never told the
 * removal failed, because as far as anyone can see, it did not.
 */
export async function deleteProjectFile({
  viewer,
  projectId,
  fileId,
}: {
  viewer: Viewer;
  projectId: string;
  fileId: string;
}): Promise<void> {
  const sequelize = db();
  const project = await getProjectById({ viewer, projectId });
  if (!isUuid(fileId)) throw new AppError("NOT_FOUND", "No such file.");
  const objectKey = await sequelize.transaction(async (transaction) => {
    const row = await ProjectFile.findOne({
      where: { id: fileId, projectId, organizationId: viewer.organizationId },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!row) throw new AppError("NOT_FOUND", "No such file.");
    if (!mayRemoveUpload(viewer, scopeOf(viewer, project), row)) {
      const fieldWorkOpen = stageIndex(project.stage) < stageIndex(FIELD_WORK_ENDS_AT);
      throw new AppError(
        "FORBIDDEN",
        fieldWorkOpen
          ? "Only the person who uploaded this file, or the project's coordinator or an admin, can remove it."
          : `Uploads are kept as filed once the project reaches ${STAGE_LABELS[FIELD_WORK_ENDS_AT]}.`,
      );
    }
    await row.destroy({ transaction });
    await recordAudit(
      {
        viewer,
        action: "file.removed",
        entityType: "project",
        entityId: projectId,
        changes: { file: { before: `${row.kind}: ${row.fileName} (SHA-256 ${row.sha256.slice(0, 12)}…)`, after: null } },
      },
      { transaction },
    );
    await queueStorageRemovals([row.objectKey], { transaction });
    return row.objectKey;
  });
  await sweepStorageRemovals({ objectKeys: [objectKey] }).catch((error: unknown) =>
    console.error("storage removal after a file was removed; the worker will sweep it", error),
  );
}

/** Where an uploaded file is kept, for a viewer who may see the project; NOT_FOUND otherwise. */
export async function getProjectFileLocation({ viewer, projectId, fileId }: { viewer: Viewer; projectId: string; fileId: string }) {
  db();
  await getProjectById({ viewer, projectId });
  if (!isUuid(fileId)) throw new AppError("NOT_FOUND", "No such file.");
  const row = await ProjectFile.findOne({ where: { id: fileId, projectId, organizationId: viewer.organizationId } });
  if (!row) throw new AppError("NOT_FOUND", "No such file.");
  return { key: row.objectKey, fileName: row.fileName, contentType: row.contentType, hasThumbnail: hasThumbnail(row.contentType) };
}

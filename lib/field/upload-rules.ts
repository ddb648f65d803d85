import { can, type Viewer } from "@/lib/domain/permissions";
import { stageIndex, type Stage } from "@/lib/domain/stages";
import type { ProjectFileKind } from "@/lib/domain/stored-values";

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;
export const MAX_UPLOAD_LABEL = "20 MB";

/** What each kind of upload may be, judged by the file's bytes; the extension is only a hint for the picker. */
export const ALLOWED_TYPES: Record<ProjectFileKind, Record<string, string[]>> = {
  "signed-completion": { "application/pdf": [".pdf"], "image/jpeg": [".jpg", ".jpeg"], "image/png": [".png"] },
  "site-photo": { "image/jpeg": [".jpg", ".jpeg"], "image/png": [".png"] },
  "comment-letter": { "application/pdf": [".pdf"], "image/jpeg": [".jpg", ".jpeg"], "image/png": [".png"] },
};

/** The uploads of the field record; an authority's comment letter belongs to the office's filing. */
export const FIELD_FILE_KINDS: readonly ProjectFileKind[] = ["signed-completion", "site-photo"];

export const KIND_LABELS: Record<ProjectFileKind, string> = {
  "signed-completion": "Signed completion form",
  "site-photo": "Site photo",
  "comment-letter": "Comment letter",
};

export function allowedTypesText(kind: ProjectFileKind): string {
  return kind === "site-photo" ? "JPEG or PNG" : "PDF, JPEG or PNG";
}

export function tooLargeMessage(sizeBytes: number): string {
  return `The file is ${(sizeBytes / 1024 / 1024).toFixed(1)} MB; files may be at most ${MAX_UPLOAD_LABEL}.`;
}

const EXTENSION: Record<string, string> = { "application/pdf": "pdf", "image/jpeg": "jpg", "image/png": "png" };

/**
 * The name shown and offered for download: the uploader's base name without path or control
 * characters, ending in the extension of the type the bytes revealed (a renamed file cannot pose as another type).
 */
export function displayFileName(original: string, mime: string): string {
  const base = original.split(/[\\/]/).pop() ?? "";
  const stem = base
    .replace(/\.[^.]*$/, "")
    .normalize("NFKC")
    .replace(/[^\p{L}\p{N} ._()-]+/gu, "_")
    .replace(/^[.\s_]+/, "")
    .slice(0, 120)
    .trim();
  return `${stem || "upload"}.${EXTENSION[mime] ?? "bin"}`;
}

/** Longest side of a site photo's thumbnail, in pixels: two across a phone screen at twice its density. */
export const THUMBNAIL_PX = 320;

/** Uploads whose bytes are a picture get a thumbnail; a PDF is shown as a file. */
export function hasThumbnail(contentType: string): boolean {
  return contentType === "image/jpeg" || contentType === "image/png";
}

/**
 * The field work ends when the utility grants permission to operate: from then on the signed form and
 * photos are the record as filed and stay.
 */
export const FIELD_WORK_ENDS_AT: Stage = "pto_received";

/**
 * Who may remove an upload: someone who may record the field work of the project (an installer only on
 * a project assigned to them) and either uploaded it or runs the project's office work (a coordinator or
 * an admin of its organization), while the field work is open. API tokens only read.
 */
export function mayRemoveUpload(
  viewer: Pick<Viewer, "id" | "role" | "organizationId" | "apiTokenId">,
  project: { organizationId: string; installerId: string | null; stage: Stage },
  file: { uploadedById: string | null },
): boolean {
  if (stageIndex(project.stage) >= stageIndex(FIELD_WORK_ENDS_AT)) return false;
  if (!can(viewer, "field:record", project)) return false;
  return file.uploadedById === viewer.id || can(viewer, "project:edit", project);
}

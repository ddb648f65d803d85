import type { ProjectFileKind } from "@/models/project-file";

export const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;
export const MAX_UPLOAD_LABEL = "20 MB";

/** What each kind of upload may be, judged by the file's bytes; the extension is only a hint for the picker. */
export const ALLOWED_TYPES: Record<ProjectFileKind, Record<string, string[]>> = {
  "signed-completion": { "application/pdf": [".pdf"], "image/jpeg": [".jpg", ".jpeg"], "image/png": [".png"] },
  "site-photo": { "image/jpeg": [".jpg", ".jpeg"], "image/png": [".png"] },
};

export const KIND_LABELS: Record<ProjectFileKind, string> = {
  "signed-completion": "Signed completion form",
  "site-photo": "Site photo",
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

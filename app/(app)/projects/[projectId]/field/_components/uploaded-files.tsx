"use client";

import { useState } from "react";
import { LocalTime } from "@/components/time/local-time";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { KIND_LABELS, THUMBNAIL_PX } from "@/lib/field/upload-rules";
import type { ProjectFileDto } from "@/lib/dto/project-files";

const sizeText = (bytes: number) =>
  bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;

/** The files received from the field as tiles: a thumbnail for pictures, the type for a PDF, and Remove for whoever may. */
export function UploadedFiles({
  projectId,
  files,
  onRemoved,
}: {
  projectId: string;
  files: ProjectFileDto[];
  onRemoved: (file: ProjectFileDto, error?: string) => void;
}) {
  const [asking, setAsking] = useState<ProjectFileDto | null>(null);
  const [pending, setPending] = useState(false);
  const [noPreview, setNoPreview] = useState<Set<string>>(new Set());
  const url = (f: ProjectFileDto) => `/api/v1/projects/${projectId}/files/${f.id}`;

  async function remove(file: ProjectFileDto) {
    setPending(true);
    try {
      const response = await fetch(url(file), { method: "DELETE" });
      const json = response.status === 204 ? null : await response.json().catch(() => null);
      onRemoved(file, response.ok ? undefined : (json?.error?.message ?? `The file could not be removed (${response.status}).`));
    } catch {
      onRemoved(file, "No connection: the file was not removed. Try again when you have signal.");
    } finally {
      setPending(false);
      setAsking(null);
    }
  }

  if (files.length === 0) return <p className="text-sm text-ink-faint">Nothing uploaded yet.</p>;
  return (
    <>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" data-testid="uploaded-files">
        {files.map((f) => (
          <li
            key={f.id}
            className="flex min-w-0 flex-col overflow-hidden rounded border border-paper-edge bg-white"
            data-testid="uploaded-file"
          >
            {f.hasThumbnail && !noPreview.has(f.id) ? (
              // A plain img: the file route checks the session and already resized the picture on the server.
              // eslint-disable-next-line @next/next/no-img-element -- next/image would proxy a session-guarded file through its optimizer
              <img
                src={`${url(f)}?size=thumbnail`}
                alt={`${KIND_LABELS[f.kind]}: ${f.fileName}`}
                width={THUMBNAIL_PX}
                height={THUMBNAIL_PX}
                loading="lazy"
                className="aspect-square w-full bg-paper-deep object-cover"
                onError={() => setNoPreview((all) => new Set(all).add(f.id))}
              />
            ) : (
              <div
                className="flex aspect-square w-full items-center justify-center bg-paper-deep text-sm font-semibold text-ink-soft"
                aria-hidden
              >
                {f.contentType === "application/pdf" ? "PDF" : "No preview"}
              </div>
            )}
            <div className="flex flex-1 flex-col gap-0.5 p-2 text-xs">
              <a href={url(f)} download className="truncate text-sm font-medium" title={f.fileName}>
                {f.fileName}
              </a>
              <span className="text-ink-soft">{KIND_LABELS[f.kind]}</span>
              <span className="measure text-ink-faint">
                {sizeText(f.sizeBytes)} · {f.uploadedBy ?? "someone"}
              </span>
              <span className="measure text-ink-faint">
                <LocalTime iso={f.createdAt} />
              </span>
              {f.canRemove ? (
                <button
                  type="button"
                  className="mt-1 self-start rounded px-2 py-1.5 text-sm text-result-fail hover:bg-result-fail/10"
                  onClick={() => setAsking(f)}
                  aria-label={`Remove ${f.fileName}`}
                >
                  Remove
                </button>
              ) : null}
            </div>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        open={asking !== null}
        title={`Remove ${asking?.fileName ?? "this file"}?`}
        confirmLabel={pending ? "Removing…" : "Remove"}
        pending={pending}
        onConfirm={() => asking && remove(asking)}
        onCancel={() => setAsking(null)}
      >
        <p>
          The {asking ? KIND_LABELS[asking.kind].toLowerCase() : "file"} is taken off the project&apos;s field record for everyone, and the
          removal is recorded in the project&apos;s history. It cannot be undone.
        </p>
      </ConfirmDialog>
    </>
  );
}

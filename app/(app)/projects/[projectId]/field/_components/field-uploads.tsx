"use client";

import { clsx } from "clsx";
import { useRef, useState } from "react";
import { useDropzone, type FileRejection } from "react-dropzone";
import { ALLOWED_TYPES, MAX_UPLOAD_BYTES, MAX_UPLOAD_LABEL, allowedTypesText, tooLargeMessage } from "@/lib/field/upload-rules";
import type { ProjectFileDto } from "@/lib/dto/project-files";
import type { ProjectFileKind } from "@/lib/domain/stored-values";
import { UploadedFiles } from "./uploaded-files";

type Notice = { key: string; name: string; kind: "uploading" | "done" | "refused"; text: string };

function rejectionText(kind: ProjectFileKind, rejection: FileRejection): string {
  const code = rejection.errors[0]?.code;
  if (code === "file-too-large") return tooLargeMessage(rejection.file.size);
  if (code === "file-invalid-type") return `Only ${allowedTypesText(kind)} files can be uploaded here.`;
  return rejection.errors[0]?.message ?? "This file cannot be uploaded.";
}

export function FieldUploads({
  projectId,
  initialFiles,
  mayUpload,
}: {
  projectId: string;
  initialFiles: ProjectFileDto[];
  mayUpload: boolean;
}) {
  const [files, setFiles] = useState(initialFiles);
  const [notices, setNotices] = useState<Notice[]>([]);
  const note = (n: Notice) => setNotices((all) => [n, ...all.filter((x) => x.key !== n.key)].slice(0, 8));

  async function upload(kind: ProjectFileKind, file: File) {
    const key = `${kind}:${file.name}:${file.size}:${file.lastModified}`;
    note({ key, name: file.name, kind: "uploading", text: "Uploading…" });
    const body = new FormData();
    body.set("kind", kind);
    body.set("file", file);
    try {
      const response = await fetch(`/api/v1/projects/${projectId}/files`, { method: "POST", body });
      const json = await response.json().catch(() => ({}));
      if (!response.ok) {
        note({ key, name: file.name, kind: "refused", text: json?.error?.message ?? `The upload was refused (${response.status}).` });
        return;
      }
      setFiles((all) => [json.file as ProjectFileDto, ...all]);
      note({
        key,
        name: file.name,
        kind: "done",
        text: kind === "signed-completion" ? "Received. The coordinator has been notified." : "Received.",
      });
    } catch {
      note({ key, name: file.name, kind: "refused", text: "No connection: the file was not sent. Try again when you have signal." });
    }
  }

  const sendAll = (kind: ProjectFileKind) => async (accepted: File[], rejected: FileRejection[]) => {
    for (const r of rejected)
      note({ key: `${kind}:${r.file.name}:rejected`, name: r.file.name, kind: "refused", text: rejectionText(kind, r) });
    for (const file of accepted) await upload(kind, file);
  };

  return (
    <section className="panel space-y-4" aria-labelledby="uploads-heading">
      <div>
        <h2 id="uploads-heading">Signed form and site photos</h2>
        <p className="text-sm text-ink-soft">
          {mayUpload
            ? `Drop files here or use the phone's camera. ${MAX_UPLOAD_LABEL} at most per file; the type is checked from the file's contents.`
            : "Uploads from the field."}
        </p>
      </div>
      {mayUpload ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <DropArea kind="signed-completion" multiple={false} onFiles={sendAll("signed-completion")} />
          <DropArea kind="site-photo" multiple onFiles={sendAll("site-photo")} />
        </div>
      ) : null}
      {notices.length > 0 ? (
        <ul className="space-y-1" aria-live="polite" data-testid="upload-notices">
          {notices.map((n) => (
            <li
              key={n.key}
              className={clsx(
                "text-sm",
                n.kind === "refused" ? "text-result-fail" : n.kind === "done" ? "text-result-pass" : "text-ink-soft",
              )}
              role={n.kind === "refused" ? "alert" : undefined}
            >
              <span className="font-medium">{n.name}</span>: {n.text}
            </li>
          ))}
        </ul>
      ) : null}
      <div>
        <h3 className="mb-1 text-sm font-semibold">Received files</h3>
        <UploadedFiles
          projectId={projectId}
          files={files}
          onRemoved={(file, error) => {
            if (!error) setFiles((all) => all.filter((f) => f.id !== file.id));
            note({ key: `removed:${file.id}`, name: file.fileName, kind: error ? "refused" : "done", text: error ?? "Removed." });
          }}
        />
      </div>
    </section>
  );
}

function DropArea({
  kind,
  multiple,
  onFiles,
}: {
  kind: ProjectFileKind;
  multiple: boolean;
  onFiles: (accepted: File[], rejected: FileRejection[]) => void;
}) {
  const camera = useRef<HTMLInputElement>(null);
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept: ALLOWED_TYPES[kind],
    maxSize: MAX_UPLOAD_BYTES,
    multiple,
    onDrop: onFiles,
  });
  const label = kind === "signed-completion" ? "Signed certificate of completion" : "Site photos";
  return (
    <div className="space-y-2">
      <div
        {...getRootProps({ "aria-label": `${label}: choose or drop files` })}
        className={clsx(
          "flex min-h-28 cursor-pointer flex-col items-center justify-center rounded border-2 border-dashed p-4 text-center text-sm",
          isDragActive ? "border-copper bg-copper-light/40" : "border-paper-edge bg-white hover:bg-paper-deep",
        )}
      >
        <input {...getInputProps()} data-testid={`upload-${kind}`} />
        <span className="font-medium">{label}</span>
        <span className="text-xs text-ink-faint">
          {allowedTypesText(kind)}, up to {MAX_UPLOAD_LABEL}. Tap to choose, or drop here.
        </span>
      </div>
      <button
        type="button"
        className="w-full rounded border border-paper-edge bg-white px-3 py-2 text-sm hover:bg-paper-deep"
        onClick={() => camera.current?.click()}
      >
        Take a photo{kind === "signed-completion" ? " of the signed form" : ""}
      </button>
      <input
        ref={camera}
        type="file"
        accept="image/jpeg,image/png"
        capture="environment"
        className="hidden"
        onChange={(e) => {
          const picked = Array.from(e.target.files ?? []);
          e.target.value = "";
          const rejected = picked
            .filter((f) => f.size > MAX_UPLOAD_BYTES)
            .map((file) => ({ file, errors: [{ code: "file-too-large", message: "" }] }) as unknown as FileRejection);
          onFiles(
            picked.filter((f) => f.size <= MAX_UPLOAD_BYTES),
            rejected,
          );
        }}
      />
    </div>
  );
}

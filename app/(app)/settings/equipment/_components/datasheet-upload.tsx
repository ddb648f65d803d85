"use client";

import { useRouter } from "next/navigation";
import { useRef, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { DATASHEET_MAX_BYTES, type EquipmentDto } from "@/lib/schemas/equipment";
import { formatFileSize } from "./key-figures";

const MAX_MB = DATASHEET_MAX_BYTES / 1024 / 1024;

/** Sends the PDF to the upload route (server actions cap their bodies far below a data sheet's size). */
export function DatasheetUpload({ equipmentId, current }: { equipmentId: string; current: EquipmentDto["datasheet"] }) {
  const router = useRouter();
  const formRef = useRef<HTMLFormElement>(null);
  const [message, setMessage] = useState<{ kind: "error" | "info"; text: string }>();
  const [busy, setBusy] = useState(false);

  async function upload(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const file = new FormData(event.currentTarget).get("file");
    if (!(file instanceof File) || file.size === 0) return setMessage({ kind: "error", text: "Choose a PDF file first." });
    if (file.size > DATASHEET_MAX_BYTES) return setMessage({ kind: "error", text: `The file is larger than ${MAX_MB} MB.` });
    setBusy(true);
    setMessage(undefined);
    const body = new FormData();
    body.set("file", file);
    const response = await fetch(`/api/v1/equipment/${equipmentId}/datasheet`, { method: "POST", body }).catch(() => null);
    setBusy(false);
    if (!response?.ok) {
      const payload = await response?.json().catch(() => null);
      return setMessage({ kind: "error", text: payload?.error?.message ?? "The upload did not go through. Try again." });
    }
    formRef.current?.reset();
    setMessage({ kind: "info", text: `${file.name} is stored as the data sheet.` });
    router.refresh();
  }

  return (
    <form ref={formRef} onSubmit={upload} className="space-y-3" noValidate>
      <p className="text-sm text-ink-soft">
        {current ? (
          <>
            Current:{" "}
            <a href={`/api/v1/equipment/${equipmentId}/datasheet`} target="_blank" rel="noreferrer">
              {current.fileName}
            </a>{" "}
            <span className="measure text-xs text-ink-faint">{formatFileSize(current.sizeBytes)}</span>
          </>
        ) : (
          "No data sheet yet."
        )}
      </p>
      <FormMessage kind={message?.kind ?? "info"}>{message?.text}</FormMessage>
      <div className="grid gap-3 sm:grid-cols-[1fr_auto] sm:items-end">
        <Field label={current ? "Replace with (PDF)" : "Data sheet (PDF)"} htmlFor="datasheet-file" hint={`PDF up to ${MAX_MB} MB`}>
          <input id="datasheet-file" name="file" type="file" accept="application/pdf,.pdf" className="input" />
        </Field>
        <Button type="submit" variant="secondary" disabled={busy}>
          {busy ? "Uploading…" : "Upload"}
        </Button>
      </div>
    </form>
  );
}

"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { attachLetterAction } from "../actions";
import { uploadLetter } from "./upload-letter";

/** Attaches the authority's letter to a round recorded before the letter was at hand. */
export function LetterForm({
  projectId,
  roundId,
  number,
  attach,
}: {
  projectId: string;
  roundId: string;
  number: number;
  attach: typeof attachLetterAction;
}) {
  const router = useRouter();
  const [file, setFile] = useState<File | null>(null);
  const [message, setMessage] = useState<string>();
  const [busy, start] = useTransition();
  const send = () =>
    start(async () => {
      setMessage(undefined);
      if (!file) return setMessage("Choose the letter first.");
      const uploaded = await uploadLetter(projectId, file);
      const result = uploaded.ok ? await attach({ roundId, letterFileId: uploaded.data.id }) : uploaded;
      if (!result.ok) return setMessage(result.message);
      setFile(null);
      router.refresh();
    });
  return (
    <div className="flex flex-wrap items-end gap-2 text-sm">
      <FormMessage kind="error">{message}</FormMessage>
      <label className="space-y-1">
        <span className="block text-ink-soft">Comment letter of round {number} (PDF, JPEG or PNG)</span>
        <input type="file" accept=".pdf,.jpg,.jpeg,.png" onChange={(e) => setFile(e.target.files?.[0] ?? null)} />
      </label>
      <Button type="button" disabled={busy} onClick={send}>
        {busy ? "Uploading…" : "Attach the letter"}
      </Button>
    </div>
  );
}

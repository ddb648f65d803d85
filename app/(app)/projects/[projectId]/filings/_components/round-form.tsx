"use client";

import { useState } from "react";
import type { Control, UseFormRegister } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { RecordRoundInput } from "@/lib/schemas/filings";
import type { recordRoundAction } from "../actions";
import { ItemFields } from "./item-fields";
import { uploadLetter } from "./upload-letter";
import { useFilingForm } from "./use-filing-form";

type Values = { filingId: string; receivedOn: string; items: { text: string; reference: string }[] };
type Items = { items: Values["items"] };

/** The authority's comments came back: round N, each comment an item to answer. */
export function RoundForm({
  projectId,
  filingId,
  number,
  today,
  record,
}: {
  projectId: string;
  filingId: string;
  number: number;
  today: string;
  record: typeof recordRoundAction;
}) {
  const blank = { filingId, receivedOn: today, items: [{ text: "", reference: "" }] };
  const [letter, setLetter] = useState<File | null>(null);
  const [letterKey, setLetterKey] = useState(0);
  // The letter is stored first; a refused upload keeps the typed comments and records nothing.
  const { form, submit, message, errors, busy } = useFilingForm<Values, { number: number }>(
    RecordRoundInput,
    blank,
    async (raw) => {
      if (!letter) return record(raw);
      const uploaded = await uploadLetter(projectId, letter);
      return uploaded.ok ? record({ ...raw, letterFileId: uploaded.data.id }) : uploaded;
    },
    (saved) => {
      saved.reset(blank);
      setLetter(null);
      setLetterKey((k) => k + 1);
    },
  );
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label={`Record correction round ${number}`}>
      <FormMessage kind="error">{message}</FormMessage>
      <div className="max-w-xs">
        <Field label="Comments received on" htmlFor={`${filingId}-round-received`} error={errors.receivedOn?.message}>
          <input id={`${filingId}-round-received`} type="date" className="input" {...form.register("receivedOn")} />
        </Field>
      </div>
      <Field label="Comment letter (optional: PDF, JPEG or PNG)" htmlFor={`${filingId}-round-letter`}>
        <input
          key={letterKey}
          id={`${filingId}-round-letter`}
          type="file"
          accept=".pdf,.jpg,.jpeg,.png"
          className="block text-sm"
          onChange={(e) => setLetter(e.target.files?.[0] ?? null)}
        />
      </Field>
      <ItemFields
        idPrefix={`${filingId}-round`}
        control={form.control as unknown as Control<Items>}
        register={form.register as unknown as UseFormRegister<Items>}
        errors={errors}
        noun="comment"
      />
      <Button type="submit" disabled={busy}>
        {busy ? "Saving…" : `Record round ${number}`}
      </Button>
    </form>
  );
}

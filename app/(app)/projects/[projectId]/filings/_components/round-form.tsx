"use client";

import type { Control, UseFormRegister } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { RecordRoundInput } from "@/lib/schemas/filings";
import type { recordRoundAction } from "../actions";
import { ItemFields } from "./item-fields";
import { useFilingForm } from "./use-filing-form";

type Values = { filingId: string; receivedOn: string; items: { text: string; reference: string }[] };
type Items = { items: Values["items"] };

/** The authority's comments came back: round N, each comment an item to answer. */
export function RoundForm({
  filingId,
  number,
  today,
  record,
}: {
  filingId: string;
  number: number;
  today: string;
  record: typeof recordRoundAction;
}) {
  const blank = { filingId, receivedOn: today, items: [{ text: "", reference: "" }] };
  const { form, submit, message, errors, busy } = useFilingForm<Values, { number: number }>(
    RecordRoundInput,
    blank,
    (raw) => record(raw),
    (saved) => saved.reset(blank),
  );
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label={`Record correction round ${number}`}>
      <FormMessage kind="error">{message}</FormMessage>
      <div className="max-w-xs">
        <Field label="Comments received on" htmlFor={`${filingId}-round-received`} error={errors.receivedOn?.message}>
          <input id={`${filingId}-round-received`} type="date" className="input" {...form.register("receivedOn")} />
        </Field>
      </div>
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

"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { RecordPtoInput } from "@/lib/schemas/filings";
import type { recordPtoAction } from "../actions";
import { useFilingForm } from "./use-filing-form";

/** The day the utility granted permission to operate. */
export function PtoForm({ filingId, today, record }: { filingId: string; today: string; record: typeof recordPtoAction }) {
  const { form, submit, message, errors, busy } = useFilingForm<{ filingId: string; ptoOn: string }, { ptoOn: string }>(
    RecordPtoInput,
    { filingId, ptoOn: today },
    (raw) => record(raw),
  );
  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-end gap-3" aria-label="Record permission to operate">
      <FormMessage kind="error">{message}</FormMessage>
      <Field label="Permission to operate received on" htmlFor={`${filingId}-pto`} error={errors.ptoOn?.message}>
        <input id={`${filingId}-pto`} type="date" className="input" {...form.register("ptoOn")} />
      </Field>
      <Button type="submit" disabled={busy}>
        {busy ? "Saving…" : "Record PTO"}
      </Button>
    </form>
  );
}

"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { FilingDetailsInput } from "@/lib/schemas/filings";
import type { updateFilingDetailsAction } from "../actions";
import { useFilingForm } from "./use-filing-form";

type Values = {
  filingId: string;
  referenceNumber: string;
  nextFollowUpOn: string;
  paymentId: string;
  waitingOnCustomer: boolean;
  notes: string;
};

/** What the office keeps about a filing besides its status: the number, the next follow-up, the fee paid, the customer's turn. */
export function FilingDetailsForm(props: {
  filingId: string;
  initial: Omit<Values, "filingId">;
  payments: { id: string; label: string }[];
  update: typeof updateFilingDetailsAction;
}) {
  const { filingId } = props;
  const { form, submit, message, errors, busy } = useFilingForm<Values, { filingId: string }>(
    FilingDetailsInput,
    { filingId, ...props.initial },
    (raw) => props.update(raw as never),
  );
  const id = (name: string) => `${filingId}-details-${name}`;
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Filing details">
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Reference number" htmlFor={id("ref")} error={errors.referenceNumber?.message}>
          <input id={id("ref")} className="input measure" autoComplete="off" {...form.register("referenceNumber")} />
        </Field>
        <Field label="Next follow-up" htmlFor={id("follow")} error={errors.nextFollowUpOn?.message}>
          <input id={id("follow")} type="date" className="input" {...form.register("nextFollowUpOn")} />
        </Field>
        <Field label="Fee paid with it" htmlFor={id("payment")} error={errors.paymentId?.message}>
          <select id={id("payment")} className="input" {...form.register("paymentId")}>
            <option value="">None recorded</option>
            {props.payments.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label}
              </option>
            ))}
          </select>
        </Field>
      </div>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...form.register("waitingOnCustomer")} />
        Waiting for the customer (a signature, a document, a decision)
      </label>
      <Field label="Notes" htmlFor={id("notes")} error={errors.notes?.message}>
        <textarea id={id("notes")} rows={2} className="input" {...form.register("notes")} />
      </Field>
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? "Saving…" : "Save the details"}
      </Button>
    </form>
  );
}

"use client";

import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { AnswerItemInput } from "@/lib/schemas/filings";
import type { answerItemAction } from "../actions";
import { useFilingForm } from "./use-filing-form";

type Values = { itemId: string; response: string; designRevision: string };

/** The office's answer to one comment, naming the design revision that answers it when the design changed. */
export function ItemAnswerForm({
  itemId,
  designRevision,
  answer,
}: {
  itemId: string;
  designRevision: number | null;
  answer: typeof answerItemAction;
}) {
  const { form, submit, message, errors, busy } = useFilingForm<Values, { itemId: string }>(
    AnswerItemInput,
    { itemId, response: "", designRevision: "" },
    (raw) => answer(raw as never),
  );
  return (
    <form onSubmit={submit} noValidate className="mt-2 space-y-2" aria-label="Answer this item">
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-2 sm:grid-cols-[1fr_9rem]">
        <Field label="Response" htmlFor={`${itemId}-response`} error={errors.response?.message}>
          <textarea id={`${itemId}-response`} rows={2} className="input" {...form.register("response")} />
        </Field>
        <Field
          label="Design revision"
          htmlFor={`${itemId}-revision`}
          error={errors.designRevision?.message}
          hint={
            designRevision ? `Now at revision ${designRevision}; blank if the design did not change` : "Blank if the design did not change"
          }
        >
          <input id={`${itemId}-revision`} className="input measure" inputMode="numeric" {...form.register("designRevision")} />
        </Field>
      </div>
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? "Saving…" : "Save the answer"}
      </Button>
    </form>
  );
}

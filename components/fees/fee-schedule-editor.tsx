"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState } from "react";
import { FormProvider, useFieldArray, useForm } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import type { ActionResult } from "@/lib/dto/action-result";
import { FormMessage } from "@/components/ui/form-message";
import type { FeeAuthorityKind, FeeLine } from "@/lib/fees";
import { feeLineToFormValues } from "@/lib/schemas/fee-schedule";
import { FeeLineFields } from "./fee-line-fields";
import { FeePreview } from "./fee-preview";
import { FeeScheduleForm, newFeeLine, type FeeScheduleFormInput, type FeeScheduleFormValues } from "./fee-schedule-form";

/** The server action that replaces a schedule, handed down by the page that shows the editor. */
export type SaveFeeSchedule = (input: {
  authorityKind: FeeAuthorityKind;
  authorityId: string;
  lines: FeeScheduleFormInput["lines"];
}) => Promise<ActionResult<{ lineCount: number }>>;

type Props = {
  authorityKind: FeeAuthorityKind;
  authorityId: string;
  authorityName: string;
  initialLines: FeeLine[];
  save: SaveFeeSchedule;
};

/**
 * An AHJ's or a utility's fee schedule, line by line, with a preview of what it charges.
 * Saving replaces the whole schedule; a refusal leaves every typed value in place.
 */
export function FeeScheduleEditor({ authorityKind, authorityId, authorityName, initialLines, save }: Props) {
  const formId = useId();
  const form = useForm<FeeScheduleFormInput, unknown, FeeScheduleFormValues>({
    resolver: zodResolver(FeeScheduleForm),
    defaultValues: { lines: initialLines.map(feeLineToFormValues) },
  });
  const lines = useFieldArray({ control: form.control, name: "lines" });
  const { errors, isSubmitting, isDirty } = form.formState;
  const [savedCount, setSavedCount] = useState<number | null>(null);
  const { submit, message } = useActionSubmit(
    form,
    (raw) => save({ authorityKind, authorityId, lines: raw.lines }),
    ({ lineCount }) => {
      // What was saved becomes the new starting point, so the next edit shows as unsaved again.
      form.reset(form.getValues());
      setSavedCount(lineCount);
    },
  );
  const listError = errors.lines?.root?.message ?? errors.lines?.message;
  const saved = savedCount !== null && !isDirty && !message;
  const who = authorityKind === "jurisdiction" ? "this AHJ" : "this utility";

  return (
    <FormProvider {...form}>
      <div className="space-y-4">
        <form id={formId} onSubmit={submit} noValidate aria-label={`Fee schedule of ${authorityName}`} className="space-y-4">
          {listError ? (
            <p className="text-sm text-result-fail" role="alert">
              {listError}
            </p>
          ) : null}
          {lines.fields.length === 0 ? (
            <p className="text-sm text-ink-soft">
              No fee lines yet. Add one for each fee {who} charges; a new version of a fee is a line with the same name and a later start.
            </p>
          ) : null}
          {lines.fields.map((field, index) => (
            <FeeLineFields key={field.id} idPrefix={formId} index={index} onRemove={() => lines.remove(index)} />
          ))}
          <Button
            type="button"
            variant="secondary"
            onClick={() => lines.append(newFeeLine(), { focusName: `lines.${lines.fields.length}.name` })}
          >
            Add fee line
          </Button>
        </form>
        <FeePreview control={form.control} authorityName={authorityName} />
        <FormMessage kind="error">{message}</FormMessage>
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" form={formId} disabled={isSubmitting}>
            {isSubmitting ? "Saving…" : "Save fee schedule"}
          </Button>
          <span role="status" data-testid="fee-schedule-save-state" className="text-sm text-ink-soft">
            {saved ? `Saved: ${savedCount === 1 ? "1 fee line" : `${savedCount} fee lines`}.` : isDirty ? "Unsaved changes" : ""}
          </span>
        </div>
      </div>
    </FormProvider>
  );
}

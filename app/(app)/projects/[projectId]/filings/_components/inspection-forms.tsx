"use client";

import type { Control, UseFormRegister } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import {
  INSPECTION_KIND_LABELS,
  INSPECTION_RESULTS,
  INSPECTION_RESULT_LABELS,
  type InspectionKind,
  type InspectionPlanRow,
} from "@/lib/domain/filings";
import { InspectionResultInput, ScheduleInspectionInput } from "@/lib/schemas/filings";
import type { recordInspectionResultAction, scheduleInspectionAction } from "../actions";
import { ItemFields } from "./item-fields";
import { useFilingForm } from "./use-filing-form";

type BookValues = {
  filingId: string;
  kind: string;
  scheduledFor: string;
  timeWindow: string;
  inspectorName: string;
  reinspectionOfId: string;
};

/** Books an inspection, or a re-inspection of one that failed. */
export function BookInspectionForm(props: {
  filingId: string;
  kinds: readonly InspectionPlanRow[];
  next: InspectionKind | null;
  failed: { id: string; label: string }[];
  today: string;
  book: typeof scheduleInspectionAction;
}) {
  const { filingId } = props;
  const blank = {
    filingId,
    kind: props.next ?? props.kinds[0]?.kind ?? "",
    scheduledFor: props.today,
    timeWindow: "",
    inspectorName: "",
    reinspectionOfId: props.failed[0]?.id ?? "",
  };
  const { form, submit, message, errors, busy } = useFilingForm<BookValues, { inspectionId: string }>(
    ScheduleInspectionInput,
    blank,
    (raw) => props.book(raw as never),
    (saved) => saved.reset(blank),
  );
  const id = (name: string) => `${filingId}-book-${name}`;
  return (
    <form onSubmit={submit} noValidate className="space-y-3" aria-label="Book an inspection">
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Field label="Kind" htmlFor={id("kind")} error={errors.kind?.message}>
          <select id={id("kind")} className="input" {...form.register("kind")}>
            {props.kinds.map((k) => (
              <option key={k.kind} value={k.kind}>
                {INSPECTION_KIND_LABELS[k.kind]}
                {k.required ? " (required)" : ""}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Date" htmlFor={id("date")} error={errors.scheduledFor?.message}>
          <input id={id("date")} type="date" className="input" {...form.register("scheduledFor")} />
        </Field>
        <Field label="Window" htmlFor={id("window")} error={errors.timeWindow?.message} hint="e.g. 8–12">
          <input id={id("window")} className="input" {...form.register("timeWindow")} />
        </Field>
        <Field label="Inspector" htmlFor={id("inspector")} error={errors.inspectorName?.message}>
          <input id={id("inspector")} className="input" {...form.register("inspectorName")} />
        </Field>
      </div>
      {props.failed.length ? (
        <Field label="Re-inspects" htmlFor={id("re")} error={errors.reinspectionOfId?.message}>
          <select id={id("re")} className="input" {...form.register("reinspectionOfId")}>
            <option value="">A first inspection</option>
            {props.failed.map((f) => (
              <option key={f.id} value={f.id}>
                {f.label}
              </option>
            ))}
          </select>
        </Field>
      ) : null}
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? "Saving…" : "Book it"}
      </Button>
    </form>
  );
}

type ResultValues = {
  inspectionId: string;
  result: string;
  resultOn: string;
  inspectorName: string;
  notes: string;
  items: { text: string; reference: string }[];
};
type Items = { items: ResultValues["items"] };

/** What the inspector decided, with the corrections a failed or partly passed inspection left. */
export function InspectionResultForm(props: {
  inspectionId: string;
  inspectorName: string;
  today: string;
  record: typeof recordInspectionResultAction;
}) {
  const { inspectionId } = props;
  const blank = { inspectionId, result: "passed", resultOn: props.today, inspectorName: props.inspectorName, notes: "", items: [] };
  const { form, submit, message, errors, busy } = useFilingForm<ResultValues, { inspectionId: string }>(
    InspectionResultInput,
    blank,
    (raw) => props.record(raw as never),
  );
  const id = (name: string) => `${inspectionId}-result-${name}`;
  return (
    <form onSubmit={submit} noValidate className="mt-2 space-y-3" aria-label="Record the result">
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Result" htmlFor={id("result")} error={errors.result?.message}>
          <select id={id("result")} className="input" {...form.register("result")}>
            {INSPECTION_RESULTS.map((r) => (
              <option key={r} value={r}>
                {INSPECTION_RESULT_LABELS[r]}
              </option>
            ))}
          </select>
        </Field>
        <Field label="On" htmlFor={id("on")} error={errors.resultOn?.message}>
          <input id={id("on")} type="date" className="input" {...form.register("resultOn")} />
        </Field>
        <Field label="Inspector" htmlFor={id("inspector")} error={errors.inspectorName?.message}>
          <input id={id("inspector")} className="input" {...form.register("inspectorName")} />
        </Field>
      </div>
      <ItemFields
        idPrefix={id("item")}
        control={form.control as unknown as Control<Items>}
        register={form.register as unknown as UseFormRegister<Items>}
        errors={errors}
        noun="correction"
      />
      <Field label="Notes" htmlFor={id("notes")} error={errors.notes?.message}>
        <input id={id("notes")} className="input" {...form.register("notes")} />
      </Field>
      <Button type="submit" variant="secondary" disabled={busy}>
        {busy ? "Saving…" : "Save the result"}
      </Button>
    </form>
  );
}

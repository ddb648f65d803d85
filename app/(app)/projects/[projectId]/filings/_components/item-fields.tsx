"use client";

import { useFieldArray, type Control, type UseFormRegister } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { errorAt } from "./use-filing-form";

type WithItems = { items: { text: string; reference: string }[] };

/** The comments of a round or the corrections of an inspection, one row each, with the sheet or clause they name. */
export function ItemFields({
  idPrefix,
  control,
  register,
  errors,
  noun,
}: {
  idPrefix: string;
  control: Control<WithItems>;
  register: UseFormRegister<WithItems>;
  errors: Record<string, unknown>;
  noun: string;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: "items" });
  return (
    <fieldset className="space-y-3">
      <legend className="label">{noun[0]!.toUpperCase() + noun.slice(1)}s</legend>
      {fields.map((field, i) => (
        <div key={field.id} className="grid gap-2 rounded border border-paper-edge p-2 sm:grid-cols-[1fr_10rem_auto] sm:items-start">
          <Field
            label={`${noun[0]!.toUpperCase() + noun.slice(1)} ${i + 1}`}
            htmlFor={`${idPrefix}-text-${i}`}
            error={errorAt(errors, `items.${i}.text`)}
          >
            <textarea id={`${idPrefix}-text-${i}`} rows={2} className="input" {...register(`items.${i}.text`)} />
          </Field>
          <Field label="Sheet or clause" htmlFor={`${idPrefix}-ref-${i}`} error={errorAt(errors, `items.${i}.reference`)}>
            <input id={`${idPrefix}-ref-${i}`} className="input" placeholder="e.g. PV-3" {...register(`items.${i}.reference`)} />
          </Field>
          <Button type="button" variant="quiet" className="sm:mt-6" onClick={() => remove(i)} aria-label={`Remove ${noun} ${i + 1}`}>
            Remove
          </Button>
        </div>
      ))}
      {errorAt(errors, "items") ? (
        <p className="text-sm text-result-fail" role="alert">
          {errorAt(errors, "items")}
        </p>
      ) : null}
      <Button type="button" variant="secondary" onClick={() => append({ text: "", reference: "" })}>
        Add a {noun}
      </Button>
    </fieldset>
  );
}

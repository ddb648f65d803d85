"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { NEC_EDITIONS } from "@/lib/engineering/types";
import { JurisdictionInput, type JurisdictionValues } from "@/lib/schemas/reference-data";
import { createJurisdictionAction, updateJurisdictionAction } from "../actions";

const EMPTY: JurisdictionInput = { name: "", state: "", necEdition: "2023", recordLowTempC: "", highDesignTempC: "", notes: "" };

/** Adds a jurisdiction (no id) or edits one. */
export function JurisdictionForm({ jurisdictionId, initial = EMPTY }: { jurisdictionId?: string; initial?: JurisdictionInput }) {
  const router = useRouter();
  const form = useForm<JurisdictionInput, unknown, JurisdictionValues>({ resolver: zodResolver(JurisdictionInput), defaultValues: initial });
  const { errors, isSubmitting } = form.formState;
  const { submit, message } = useActionSubmit(
    form,
    (raw) => (jurisdictionId ? updateJurisdictionAction({ ...raw, jurisdictionId }) : createJurisdictionAction(raw)),
    () => {
      if (jurisdictionId) router.push("/settings/jurisdictions");
      else form.reset(EMPTY);
      router.refresh();
    },
  );
  const field = (name: keyof JurisdictionInput, label: string, hint?: string) => (
    <Field label={label} htmlFor={`jurisdiction-${name}`} error={errors[name]?.message} hint={hint}>
      <input id={`jurisdiction-${name}`} className="input" aria-invalid={Boolean(errors[name])} {...form.register(name)} />
    </Field>
  );

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-4 sm:grid-cols-[2fr_5rem_1fr]">
        {field("name", "Authority")}
        {field("state", "State")}
        <Field label="Adopted NEC edition" htmlFor="jurisdiction-necEdition" error={errors.necEdition?.message}>
          <select id="jurisdiction-necEdition" className="input" {...form.register("necEdition")}>
            {NEC_EDITIONS.map((edition) => (
              <option key={edition} value={String(edition)}>
                NEC {edition}
              </option>
            ))}
          </select>
        </Field>
      </div>
      <div className="grid gap-4 sm:grid-cols-2">
        {field("recordLowTempC", "Record low (°C)", "ASHRAE extreme annual mean minimum design dry-bulb")}
        {field("highDesignTempC", "High design temperature (°C)", "Hot-day air temperature for the string voltage and ampacity checks")}
      </div>
      <Field label="Notes" htmlFor="jurisdiction-notes" error={errors.notes?.message}>
        <textarea id="jurisdiction-notes" rows={2} className="input" {...form.register("notes")} />
      </Field>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : jurisdictionId ? "Save changes" : "Add jurisdiction"}
      </Button>
    </form>
  );
}

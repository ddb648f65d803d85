"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { UtilityInput, type UtilityValues } from "@/lib/schemas/reference-data";
import { createUtilityAction, updateUtilityAction } from "../actions";

const EMPTY: UtilityInput = { name: "", serviceVoltages: "", acceptedGridProfiles: "", notes: "" };

/** Adds a utility (no id) or edits one; service voltages and accepted grid profiles are typed one per line. */
export function UtilityForm({ utilityId, initial = EMPTY }: { utilityId?: string; initial?: UtilityInput }) {
  const router = useRouter();
  const form = useForm<UtilityInput, unknown, UtilityValues>({ resolver: zodResolver(UtilityInput), defaultValues: initial });
  const { errors, isSubmitting } = form.formState;
  const { submit, message } = useActionSubmit(
    form,
    (raw) => (utilityId ? updateUtilityAction({ ...raw, utilityId }) : createUtilityAction(raw)),
    () => {
      if (utilityId) router.push("/settings/utilities");
      else form.reset(EMPTY);
      router.refresh();
    },
  );

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <FormMessage kind="error">{message}</FormMessage>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Utility" htmlFor="utility-name" error={errors.name?.message}>
          <input id="utility-name" className="input" aria-invalid={Boolean(errors.name)} {...form.register("name")} />
        </Field>
        <Field label="Service voltages" htmlFor="utility-serviceVoltages" error={errors.serviceVoltages?.message} hint="One per line, e.g. 120/240 V split-phase">
          <textarea id="utility-serviceVoltages" rows={2} className="input" aria-invalid={Boolean(errors.serviceVoltages)} {...form.register("serviceVoltages")} />
        </Field>
      </div>
      <Field
        label="Accepted grid profiles"
        htmlFor="utility-acceptedGridProfiles"
        error={errors.acceptedGridProfiles?.message}
        hint="One per line, as the utility words each, e.g. IEEE 1547-2018 Category B, utility's default settings. The crew chooses from these on site."
      >
        <textarea id="utility-acceptedGridProfiles" rows={3} className="input" aria-invalid={Boolean(errors.acceptedGridProfiles)} {...form.register("acceptedGridProfiles")} />
      </Field>
      <Field label="Notes" htmlFor="utility-notes" error={errors.notes?.message}>
        <textarea id="utility-notes" rows={2} className="input" {...form.register("notes")} />
      </Field>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : utilityId ? "Save changes" : "Add utility"}
      </Button>
    </form>
  );
}

"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { US_TIME_ZONES } from "@/lib/domain/time-zones";
import { OrganizationInput, type OrganizationValues } from "@/lib/schemas/organization";
import type { updateOrganizationAction } from "../actions";

export function OrganizationForm({ initial, update }: { initial: OrganizationInput; update: typeof updateOrganizationAction }) {
  const router = useRouter();
  const [saved, setSaved] = useState(false);
  const form = useForm<OrganizationInput, unknown, OrganizationValues>({
    resolver: zodResolver(OrganizationInput),
    defaultValues: initial,
  });
  const { errors, isSubmitting } = form.formState;
  const { submit, message } = useActionSubmit(form, update, () => {
    setSaved(true);
    form.reset(form.getValues());
    router.refresh();
  });
  return (
    <form onSubmit={submit} onChange={() => setSaved(false)} className="space-y-4" noValidate>
      <FormMessage kind="error">{message}</FormMessage>
      <Field label="Company name" htmlFor="org-name" error={errors.name?.message}>
        <input id="org-name" className="input" aria-invalid={Boolean(errors.name)} {...form.register("name")} />
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label="Contractor license number"
          htmlFor="org-license"
          error={errors.licenseNumber?.message}
          hint="Printed in every title block"
        >
          <input id="org-license" className="input measure" {...form.register("licenseNumber")} />
        </Field>
        <Field label="Phone" htmlFor="org-phone" error={errors.phone?.message}>
          <input id="org-phone" className="input measure" type="tel" {...form.register("phone")} />
        </Field>
      </div>
      <Field
        label="Time zone"
        htmlFor="org-timeZone"
        error={errors.timeZone?.message}
        hint="Times on field reports and receipts are printed in this zone"
      >
        <select id="org-timeZone" className="input" {...form.register("timeZone")}>
          {US_TIME_ZONES.map((t) => (
            <option key={t.id} value={t.id}>
              {t.label} ({t.id})
            </option>
          ))}
        </select>
      </Field>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : "Save changes"}
        </Button>
        {saved ? (
          <span role="status" className="text-sm text-ink-faint">
            Saved.
          </span>
        ) : null}
      </div>
    </form>
  );
}

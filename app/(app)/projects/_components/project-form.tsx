"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { applyFieldErrors } from "@/components/forms/apply-field-errors";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { ProjectInput, SERVICE_VOLTAGES } from "@/lib/schemas/project";
import type { createProjectAction, updateProjectAction } from "../actions";

type FormValues = z.input<typeof ProjectInput>;
type Option = { id: string; name: string };
export type ProjectFormOptions = { jurisdictions: Option[]; utilities: Option[]; coordinators: Option[]; installers: Option[] };

const EMPTY: FormValues = {
  customerName: "",
  customerEmail: "",
  customerPhone: "",
  street: "",
  city: "",
  state: "",
  postalCode: "",
  jurisdictionId: "",
  utilityId: "",
  utilityAccountNumber: "",
  meterNumber: "",
  mainBreakerA: "",
  busbarA: "",
  serviceVoltageV: "240",
  servicePhases: "1",
  coordinatorId: "",
  installerId: "",
};

/** `defaultCoordinatorId`: on a new project, the coordinator creating it looks after it unless they choose otherwise. */
/** The page hands in the action that saves: creating a project or updating this one. */
export type SaveProject = { create: typeof createProjectAction } | { update: typeof updateProjectAction; projectId: string };

export function ProjectForm({
  initial,
  options,
  defaultCoordinatorId = "",
  save,
}: {
  initial?: FormValues;
  options: ProjectFormOptions;
  defaultCoordinatorId?: string;
  save: SaveProject;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const form = useForm<FormValues, unknown, z.output<typeof ProjectInput>>({
    resolver: zodResolver(ProjectInput),
    defaultValues: initial ?? { ...EMPTY, coordinatorId: defaultCoordinatorId },
  });
  const { errors, isSubmitting } = form.formState;
  const err = (name: keyof FormValues) => errors[name]?.message as string | undefined;

  async function onSubmit() {
    setMessage(undefined);
    // The server parses the raw form values again with the same schema.
    const raw = form.getValues();
    const result = "update" in save ? await save.update({ projectId: save.projectId, values: raw }) : await save.create(raw);
    if (!result.ok) {
      applyFieldErrors(form, Object.fromEntries(Object.entries(result.fieldErrors ?? {}).map(([k, v]) => [k.replace(/^values\./, ""), v])));
      setMessage(result.message);
      return;
    }
    router.push(`/projects/${result.data.id}`);
    router.refresh();
  }

  const text = (name: keyof FormValues, label: string, props: React.InputHTMLAttributes<HTMLInputElement> = {}) => (
    <Field label={label} htmlFor={name} error={err(name)}>
      <input id={name} className="input" aria-invalid={Boolean(err(name))} {...props} {...form.register(name)} />
    </Field>
  );
  const select = (name: keyof FormValues, label: string, items: Option[], empty: string) => (
    <Field label={label} htmlFor={name} error={err(name)}>
      <select id={name} className="input" {...form.register(name)}>
        <option value="">{empty}</option>
        {items.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </select>
    </Field>
  );

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-6" noValidate>
      <FormMessage kind="error">{message}</FormMessage>
      <fieldset className="panel grid gap-4 sm:grid-cols-2">
        <legend className="px-1 text-sm font-semibold">Customer</legend>
        {text("customerName", "Customer name", { autoComplete: "off" })}
        {text("customerEmail", "E-mail", { type: "email" })}
        {text("customerPhone", "Phone", { type: "tel" })}
      </fieldset>
      <fieldset className="panel grid gap-4 sm:grid-cols-2">
        <legend className="px-1 text-sm font-semibold">Site</legend>
        <div className="sm:col-span-2">{text("street", "Street address")}</div>
        {text("city", "City or town")}
        <div className="grid grid-cols-2 gap-4">
          {text("state", "State", { maxLength: 2, placeholder: "CO" })}
          {text("postalCode", "ZIP code", { inputMode: "numeric" })}
        </div>
        {select("jurisdictionId", "Authority having jurisdiction (AHJ)", options.jurisdictions, "Not chosen yet")}
        {select("utilityId", "Utility", options.utilities, "Not chosen yet")}
        {text("utilityAccountNumber", "Utility account number")}
        {text("meterNumber", "Meter number")}
      </fieldset>
      <fieldset className="panel grid gap-4 sm:grid-cols-4">
        <legend className="px-1 text-sm font-semibold">Electrical service</legend>
        {text("mainBreakerA", "Main breaker (A)", { inputMode: "numeric" })}
        {text("busbarA", "Busbar rating (A)", { inputMode: "numeric" })}
        <Field label="Service voltage (V)" htmlFor="serviceVoltageV" error={err("serviceVoltageV")}>
          <select id="serviceVoltageV" className="input" {...form.register("serviceVoltageV")}>
            <option value="">Not known yet</option>
            {SERVICE_VOLTAGES.map((v) => (
              <option key={v} value={String(v)}>
                {v}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Phases" htmlFor="servicePhases" error={err("servicePhases")}>
          <select id="servicePhases" className="input" {...form.register("servicePhases")}>
            <option value="">Not known yet</option>
            <option value="1">Single phase</option>
            <option value="3">Three phase</option>
          </select>
        </Field>
      </fieldset>
      <fieldset className="panel grid gap-4 sm:grid-cols-2">
        <legend className="px-1 text-sm font-semibold">Team</legend>
        {select("coordinatorId", "Permit coordinator", options.coordinators, "Nobody yet")}
        {select("installerId", "Installer (crew lead)", options.installers, "Not assigned")}
      </fieldset>
      <div className="flex gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : "update" in save ? "Save changes" : "Create project"}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.back()}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { get, useForm, type FieldPath } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import type { EquipmentKind } from "@/lib/domain/stored-values";
import { EquipmentInput, type EquipmentValues } from "@/lib/schemas/equipment";
import type { createEquipmentAction, updateEquipmentAction } from "../actions";
import { SPEC_FIELDS, type SpecField } from "./spec-fields";

type Path = FieldPath<EquipmentInput>;

const LISTING_HINTS: Record<EquipmentKind, string> = {
  module: "e.g. UL 61730",
  inverter: "e.g. UL 1741",
  device: "e.g. UL 1741",
  battery: "Separate with commas, e.g. UL 9540, UL 9540A",
};

/** The page hands in the action that saves: adding to the catalog or updating this item. */
export type SaveEquipment = { create: typeof createEquipmentAction } | { update: typeof updateEquipmentAction; equipmentId: string };

export function EquipmentForm({ kind, initial, save }: { kind: EquipmentKind; initial: EquipmentInput; save: SaveEquipment }) {
  const equipmentId = "update" in save ? save.equipmentId : undefined;
  const router = useRouter();
  const form = useForm<EquipmentInput, unknown, EquipmentValues>({ resolver: zodResolver(EquipmentInput), defaultValues: initial });
  const { errors, isSubmitting } = form.formState;
  const errorOf = (path: string) => (get(errors, path) as { message?: string } | undefined)?.message;
  const { submit, message } = useActionSubmit(
    form,
    (raw) => ("update" in save ? save.update({ ...raw, equipmentId: save.equipmentId }) : save.create(raw)),
    ({ id }) => {
      router.push(equipmentId ? "/settings/equipment" : `/settings/equipment/${id}?added=1`);
      router.refresh();
    },
  );

  const input = (path: string, label: string, { hint, unit }: { hint?: string; unit?: string } = {}) => (
    <Field label={unit ? `${label} (${unit})` : label} htmlFor={path} error={errorOf(path)} hint={hint}>
      <input
        id={path}
        className="input"
        inputMode={unit === undefined ? undefined : "decimal"}
        aria-invalid={Boolean(errorOf(path))}
        {...form.register(path as Path)}
      />
    </Field>
  );

  const specField = (f: SpecField) => {
    const path = `specs.${f.name}`;
    if (f.type === "number") return input(path, f.label, { hint: f.hint, unit: f.unit });
    if (f.type === "text") return input(path, f.label, { hint: f.hint });
    if (f.type === "checkbox") {
      return (
        <label className="flex items-start gap-2 text-sm" htmlFor={path}>
          <input id={path} type="checkbox" className="mt-1" {...form.register(path as Path)} />
          {f.label}
        </label>
      );
    }
    return (
      <Field label={f.label} htmlFor={path} error={errorOf(path)}>
        <select id={path} className="input" {...form.register(path as Path)}>
          {f.options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      </Field>
    );
  };

  return (
    <form onSubmit={submit} className="space-y-6" noValidate>
      <FormMessage kind="error">{message}</FormMessage>
      <fieldset className="panel grid gap-4 sm:grid-cols-3">
        <legend className="px-1 text-sm font-semibold">Product</legend>
        {input("maker", "Maker")}
        {input("model", "Model")}
        {input("listing", "Listing", { hint: LISTING_HINTS[kind] })}
      </fieldset>
      <fieldset className="panel grid gap-4 sm:grid-cols-3">
        <legend className="px-1 text-sm font-semibold">Data sheet figures</legend>
        {SPEC_FIELDS[kind].map((f) => (
          <div key={f.name} className={f.type === "checkbox" ? "sm:col-span-3" : undefined}>
            {specField(f)}
          </div>
        ))}
      </fieldset>
      <div className="flex gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? "Saving…" : equipmentId ? "Save changes" : "Add to catalog"}
        </Button>
        <Button type="button" variant="secondary" onClick={() => router.push("/settings/equipment")}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm, type Resolver } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { AUTHORITY_SPECS, type AuthorityField } from "@/lib/authorities/specs";
import type { AuthorityKind } from "@/lib/domain/authorities";
import type { ActionResult } from "@/lib/dto/action-result";

type Values = Record<string, string | string[]>;
type Save = (input: { kind: AuthorityKind; authorityId?: string; values: Values }) => Promise<ActionResult<{ id: string }>>;

const ROW_GRID: Record<string, string> = { "3": "sm:grid-cols-[2fr_5rem_1fr]", "2": "sm:grid-cols-2", "1": "" };

/** Adds an authority (no id) or edits one; its fields come from the kind's declaration. The save action is passed in by the page. */
export function AuthorityForm({
  kind,
  authorityId,
  initial,
  save,
}: {
  kind: AuthorityKind;
  authorityId?: string;
  initial?: Values;
  save: Save;
}) {
  const spec = AUTHORITY_SPECS[kind];
  const router = useRouter();
  const form = useForm<Values>({
    resolver: zodResolver(spec.schema as never) as unknown as Resolver<Values>,
    defaultValues: initial ?? spec.empty,
  });
  const { errors, isSubmitting } = form.formState;
  const { submit, message } = useActionSubmit(
    form,
    (values) => save({ kind, authorityId, values }),
    () => {
      if (authorityId) router.push(spec.path);
      else form.reset(spec.empty);
      router.refresh();
    },
  );
  const id = (f: AuthorityField) => `${kind}-${f.name}`;
  const control = (f: AuthorityField) => {
    const common = { id: id(f), className: "input", "aria-invalid": Boolean(errors[f.name]), ...form.register(f.name) };
    if (f.input === "select")
      return (
        <select {...common}>
          {f.options!.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
      );
    if (f.input === "checks")
      return (
        <span className="flex flex-wrap gap-x-4 gap-y-1 pt-2" role="group" aria-label={f.label}>
          {f.options!.map((o, i) => (
            <label key={o.value} className="inline-flex items-center gap-2 text-sm">
              <input type="checkbox" value={o.value} id={i === 0 ? id(f) : `${id(f)}-${o.value}`} {...form.register(f.name)} />
              {o.label}
            </label>
          ))}
        </span>
      );
    if (f.input === "lines") return <textarea rows={f.row === 1 ? 2 : 3} {...common} />;
    if (f.input === "note") return <textarea rows={2} {...common} />;
    return <input {...common} />;
  };
  const rows = [...new Set(spec.fields.map((f) => f.row))];

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <FormMessage kind="error">{message}</FormMessage>
      {rows.map((row) => {
        const fields = spec.fields.filter((f) => f.row === row);
        return (
          <div key={row} className={`grid gap-4 ${ROW_GRID[String(fields.length)] ?? ""}`}>
            {fields.map((f) => (
              <Field key={f.name} label={f.label} htmlFor={id(f)} error={errors[f.name]?.message} hint={f.hint}>
                {control(f)}
              </Field>
            ))}
          </div>
        );
      })}
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : authorityId ? "Save changes" : `Add ${spec.noun}`}
      </Button>
    </form>
  );
}

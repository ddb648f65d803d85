"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { applyFieldErrors } from "@/components/forms/apply-field-errors";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { ROLES, ROLE_LABELS } from "@/lib/domain/roles";
import { InviteUserInput } from "@/lib/schemas/user";
import type { inviteUserAction } from "../actions";

export function InviteUserForm({ invite }: { invite: typeof inviteUserAction }) {
  const [result, setResult] = useState<{ kind: "error" | "info"; text: string }>();
  const form = useForm<InviteUserInput>({
    resolver: zodResolver(InviteUserInput),
    defaultValues: { name: "", email: "", role: "installer" },
  });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: InviteUserInput) {
    setResult(undefined);
    const res = await invite(values);
    if (!res.ok) {
      applyFieldErrors(form, res.fieldErrors);
      setResult({ kind: "error", text: res.message });
      return;
    }
    form.reset();
    // The e-mail is in the outbox; the worker sends it and retries while the mail server is away.
    setResult({ kind: "info", text: `Invitation queued for ${res.data.email}.` });
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-3" noValidate>
      {result ? <FormMessage kind={result.kind}>{result.text}</FormMessage> : null}
      <div className="grid gap-3 sm:grid-cols-[1fr_1fr_12rem_auto] sm:items-start">
        <Field label="Name" htmlFor="invite-name" error={errors.name?.message}>
          <input id="invite-name" className="input" {...form.register("name")} />
        </Field>
        <Field label="E-mail address" htmlFor="invite-email" error={errors.email?.message}>
          <input id="invite-email" type="email" className="input" {...form.register("email")} />
        </Field>
        <Field label="Role" htmlFor="invite-role" error={errors.role?.message}>
          <select id="invite-role" className="input" {...form.register("role")}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </Field>
        <Button type="submit" className="sm:mt-6" disabled={isSubmitting}>
          {isSubmitting ? "Sending…" : "Send invitation"}
        </Button>
      </div>
    </form>
  );
}

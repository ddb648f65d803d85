"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { applyFieldErrors } from "@/components/forms/apply-field-errors";
import { SetPasswordInput } from "@/lib/schemas/user";
import type { acceptInvitationAction } from "../actions";

export function SetPasswordForm({ token, email, accept }: { token: string; email: string; accept: typeof acceptInvitationAction }) {
  const router = useRouter();
  const [error, setError] = useState<string>();
  const form = useForm<SetPasswordInput>({ resolver: zodResolver(SetPasswordInput), defaultValues: { token, password: "", confirm: "" } });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: SetPasswordInput) {
    setError(undefined);
    const result = await accept(values);
    if (!result.ok) {
      applyFieldErrors(form, result.fieldErrors);
      setError(result.message);
      return;
    }
    const signedIn = await signIn("credentials", { email, password: values.password, redirect: false });
    router.replace(signedIn?.ok ? "/dashboard" : "/sign-in");
    router.refresh();
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <FormMessage kind="error">{error}</FormMessage>
      <input type="hidden" {...form.register("token")} />
      <Field label="New password" htmlFor="password" error={errors.password?.message} hint="At least 10 characters.">
        <input id="password" type="password" autoComplete="new-password" className="input" {...form.register("password")} />
      </Field>
      <Field label="Repeat the password" htmlFor="confirm" error={errors.confirm?.message}>
        <input id="confirm" type="password" autoComplete="new-password" className="input" {...form.register("confirm")} />
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Saving…" : "Set password and sign in"}
      </Button>
    </form>
  );
}

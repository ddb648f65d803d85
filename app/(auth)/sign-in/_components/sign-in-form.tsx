"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";

const SignInInput = z.object({
  email: z.string().trim().email("Enter your e-mail address"),
  password: z.string().min(1, "Enter your password"),
});
type SignInInput = z.infer<typeof SignInInput>;

export function SignInForm({ next, initialError }: { next: string; initialError?: string }) {
  const router = useRouter();
  const [error, setError] = useState(initialError);
  const form = useForm<SignInInput>({ resolver: zodResolver(SignInInput), defaultValues: { email: "", password: "" } });
  const { errors, isSubmitting } = form.formState;

  async function onSubmit(values: SignInInput) {
    setError(undefined);
    const result = await signIn("credentials", { ...values, redirect: false });
    if (!result || result.error) {
      setError(
        result?.error && result.error !== "CredentialsSignin" ? result.error : "Sign-in failed. Check your e-mail address and password.",
      );
      return;
    }
    router.replace(next);
    router.refresh();
  }

  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <FormMessage kind="error">{error}</FormMessage>
      <Field label="E-mail address" htmlFor="email" error={errors.email?.message}>
        <input id="email" type="email" autoComplete="username" className="input" {...form.register("email")} />
      </Field>
      <Field label="Password" htmlFor="password" error={errors.password?.message}>
        <input id="password" type="password" autoComplete="current-password" className="input" {...form.register("password")} />
      </Field>
      <Button type="submit" className="w-full" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}

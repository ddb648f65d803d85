"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import { Button } from "@/components/ui/button";
import { CopyField } from "@/components/ui/copy-field";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { CreateApiTokenInput } from "@/lib/schemas/api-token";
import type { createApiTokenAction } from "../actions";

/** Names a new token and shows it once: only its hash is kept, so it cannot be shown again. */
export function CreateTokenForm({ create }: { create: typeof createApiTokenAction }) {
  const router = useRouter();
  const [created, setCreated] = useState<{ name: string; token: string }>();
  const form = useForm<CreateApiTokenInput>({ resolver: zodResolver(CreateApiTokenInput), defaultValues: { name: "" } });
  const { errors, isSubmitting } = form.formState;
  const { submit, message } = useActionSubmit(form, create, (data) => {
    setCreated({ name: data.apiToken.name, token: data.token });
    form.reset({ name: "" });
    router.refresh();
  });

  return (
    <div className="space-y-4">
      <form onSubmit={submit} className="space-y-3" noValidate>
        <FormMessage kind="error">{message}</FormMessage>
        <div className="grid gap-3 sm:grid-cols-[1fr_auto] sm:items-start">
          <Field
            label="Token name"
            htmlFor="token-name"
            error={errors.name?.message}
            hint="Name it after the integration that will hold it, e.g. Quote tool"
          >
            <input id="token-name" className="input" aria-invalid={Boolean(errors.name)} {...form.register("name")} />
          </Field>
          <Button type="submit" className="sm:mt-6" disabled={isSubmitting}>
            {isSubmitting ? "Creating…" : "Create token"}
          </Button>
        </div>
      </form>
      {created ? (
        <div className="space-y-2 rounded border border-copper/40 bg-copper-light/30 p-3" data-testid="new-token">
          <p className="text-sm font-medium">
            Copy the token for “{created.name}” now. It is shown only this once; Ohmstead keeps only a fingerprint of it.
          </p>
          <CopyField key={created.token} label="New API token" value={created.token} />
          <p className="text-xs text-ink-soft">
            Send it as the header Authorization: Bearer followed by the token. Store it where your integration keeps secrets; if it leaks,
            revoke it below.
          </p>
        </div>
      ) : null}
    </div>
  );
}

"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useForm, type DefaultValues, type FieldValues, type Resolver, type UseFormReturn } from "react-hook-form";
import type { z } from "zod";
import { useActionSubmit } from "@/components/forms/use-action-submit";
import type { ActionResult } from "@/lib/dto/action-result";

/**
 * A filing form: checked with the server's own schema before it is sent; once saved the page reloads
 * its facts (the stage and waiting-on may have moved). A refusal keeps every typed value.
 */
export function useFilingForm<T extends FieldValues, R>(
  schema: z.ZodType,
  defaults: DefaultValues<T>,
  send: (raw: T) => Promise<ActionResult<R>>,
  onSaved?: (form: UseFormReturn<T>) => void,
) {
  const router = useRouter();
  const form = useForm<T>({ resolver: zodResolver(schema as never) as unknown as Resolver<T>, defaultValues: defaults });
  const { submit, message } = useActionSubmit(form, send, () => {
    onSaved?.(form);
    router.refresh();
  });
  return { form, submit, message, errors: form.formState.errors, busy: form.formState.isSubmitting };
}

/** The field error of a path, whatever its depth ("items.0.text"). */
export function errorAt(errors: Record<string, unknown>, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[key];
  return (node as { message?: string } | undefined)?.message;
}

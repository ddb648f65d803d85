"use client";

import { useState } from "react";
import type { FieldValues, UseFormReturn } from "react-hook-form";
import type { ActionResult } from "@/lib/dto/action-result";
import { applyFieldErrors } from "./apply-field-errors";

/**
 * Submits the raw form values to a server action once the client-side check passes
 * (the server parses them again with the same schema). A refusal puts the field errors
 * beside their fields and keeps every typed value.
 */
export function useActionSubmit<T extends FieldValues, R>(
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- any transformed output type will do
  form: UseFormReturn<T, any, any>,
  send: (raw: T) => Promise<ActionResult<R>>,
  onDone: (data: R) => void,
) {
  const [message, setMessage] = useState<string>();
  const submit = form.handleSubmit(async () => {
    setMessage(undefined);
    const result = await send(form.getValues());
    if (!result.ok) {
      applyFieldErrors(form, result.fieldErrors);
      setMessage(result.message);
      return;
    }
    onDone(result.data);
  });
  return { submit, message };
}

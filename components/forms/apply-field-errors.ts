import type { FieldValues, Path, UseFormReturn } from "react-hook-form";

/** Puts the server's field errors next to their fields, as the client-side check would. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- any transformed output type will do
export function applyFieldErrors<T extends FieldValues>(form: UseFormReturn<T, any, any>, fieldErrors?: Record<string, string[]>) {
  for (const [name, messages] of Object.entries(fieldErrors ?? {})) {
    if (name !== "_form") form.setError(name as Path<T>, { type: "server", message: messages[0] });
  }
}

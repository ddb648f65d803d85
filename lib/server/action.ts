import "server-only";
import { randomUUID } from "node:crypto";
import { z } from "zod";
import { can, type Permission, type Viewer } from "@/lib/domain/permissions";
import { groupFieldErrors, isAppError } from "@/lib/errors";
import { findUnstorableInput } from "@/lib/schemas/fields";
import { getViewer } from "./auth";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "./db-unavailable";
import type { ActionResult } from "@/lib/dto/action-result";

/** zod issues as { "field.path": ["message", …] } for form.setError. */
export function fieldErrorsOf(error: z.ZodError): Record<string, string[]> {
  return groupFieldErrors(error.issues.map((issue) => [issue.path.join(".") || "_form", issue.message] as const));
}

/**
 * Builds a server action that authenticates, checks the permission, parses its
 * input with the shared schema and maps errors to a result the form can show.
 * Server actions are public POST endpoints: this is their only gate.
 */
export function defineAction<S extends z.ZodType, T>(
  { schema, permission }: { schema: S; permission: Permission | null },
  handler: (input: z.output<S>, context: { viewer: Viewer }) => Promise<T>,
) {
  return async (raw: z.input<S>): Promise<ActionResult<T>> => {
    try {
      const viewer = await getViewer();
      if (permission !== null) {
        if (!viewer) return { ok: false, code: "UNAUTHORIZED", message: "Your session has ended. Sign in again." };
        if (!can(viewer, permission)) return { ok: false, code: "FORBIDDEN", message: "Your role does not allow this." };
      }
      // Parsing is inside the try: a schema that throws on hostile input is still answered, never a 500.
      const unstorable = findUnstorableInput(raw);
      if (unstorable)
        return {
          ok: false,
          code: "INVALID_INPUT",
          message: "Check the highlighted fields.",
          fieldErrors: { [unstorable.path]: [unstorable.message] },
        };
      const parsed = schema.safeParse(raw);
      if (!parsed.success)
        return { ok: false, code: "INVALID_INPUT", message: "Check the highlighted fields.", fieldErrors: fieldErrorsOf(parsed.error) };
      return { ok: true, data: await handler(parsed.data, { viewer: viewer as Viewer }) };
    } catch (error) {
      if (isAppError(error)) return { ok: false, code: error.code, message: error.message, fieldErrors: error.fieldErrors };
      if (isDatabaseUnavailable(error)) return { ok: false, code: "UNAVAILABLE", message: DATABASE_UNAVAILABLE_MESSAGE };
      const reference = randomUUID().slice(0, 8);
      console.error(`[action ${reference}]`, error);
      return { ok: false, code: "INTERNAL", message: `Something went wrong on our side (reference ${reference}). Nothing was saved.` };
    }
  };
}

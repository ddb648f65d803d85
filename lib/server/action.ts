import "server-only";
import { randomUUID } from "node:crypto";
import { z } from "zod";
import { can, type Permission, type Viewer } from "@/lib/domain/permissions";
import { isAppError, type ErrorCode } from "@/lib/errors";
import { getViewer } from "./auth";

export type ActionResult<T> = { ok: true; data: T } | { ok: false; code: ErrorCode | "INTERNAL"; message: string; fieldErrors?: Record<string, string[]> };

/** zod issues as { "field.path": ["message", …] } for form.setError. */
export function fieldErrorsOf(error: z.ZodError): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
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
    const viewer = await getViewer();
    if (permission !== null) {
      if (!viewer) return { ok: false, code: "UNAUTHORIZED", message: "Your session has ended. Sign in again." };
      if (!can(viewer, permission)) return { ok: false, code: "FORBIDDEN", message: "Your role does not allow this." };
    }
    const parsed = schema.safeParse(raw);
    if (!parsed.success) return { ok: false, code: "INVALID_INPUT", message: "Check the highlighted fields.", fieldErrors: fieldErrorsOf(parsed.error) };
    try {
      return { ok: true, data: await handler(parsed.data, { viewer: viewer as Viewer }) };
    } catch (error) {
      if (isAppError(error)) return { ok: false, code: error.code, message: error.message, fieldErrors: error.fieldErrors };
      const reference = randomUUID().slice(0, 8);
      console.error(`[action ${reference}]`, error);
      return { ok: false, code: "INTERNAL", message: `Something went wrong on our side (reference ${reference}). Nothing was saved.` };
    }
  };
}

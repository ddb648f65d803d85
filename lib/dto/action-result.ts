// Result types the pages, forms and route handlers share: what a server action answers.
import type { ErrorCode } from "@/lib/errors";

export type ActionResult<T> =
  { ok: true; data: T } | { ok: false; code: ErrorCode | "INTERNAL"; message: string; fieldErrors?: Record<string, string[]> };

import { z } from "zod";

// Building blocks of the input schemas. Numbers arrive as strings from forms
// and as numbers from the API; a blank form field means "not given", never zero.

// PostgreSQL refuses a NUL character in text and JSON, and an unpaired UTF-16 surrogate cannot be
// stored as UTF-8: both would surface as a server error, so they are refused where text comes in.
const UNSTORABLE = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
export const UNSTORABLE_TEXT_MESSAGE = "Remove the hidden control character or broken symbol from this text (it was probably pasted in)";

/** True when PostgreSQL can store the text as it is. */
export const isStorableText = (value: string) => !UNSTORABLE.test(value);

/** `z.string()` that refuses text PostgreSQL cannot store, with a field error; every input schema builds on it. */
export const safeString = (params?: Parameters<typeof z.string>[0]) => z.string(params).refine(isStorableText, UNSTORABLE_TEXT_MESSAGE);

/** How deep a request body may nest; real input is a few levels deep, and a deeper one is refused before any schema walks it. */
export const MAX_INPUT_DEPTH = 32;

/**
 * The first problem a schema cannot name in raw input: a key or string that PostgreSQL cannot store
 * (keys too, since some inputs are kept as JSON), or nesting deeper than any real input.
 * Walked without recursion, so a hostile depth cannot overflow the stack.
 */
export function findUnstorableInput(input: unknown): { path: string; message: string } | null {
  const stack: { value: unknown; path: string; depth: number }[] = [{ value: input, path: "", depth: 0 }];
  while (stack.length) {
    const { value, path, depth } = stack.pop()!;
    if (typeof value === "string") {
      if (!isStorableText(value)) return { path: path || "_form", message: UNSTORABLE_TEXT_MESSAGE };
      continue;
    }
    if (typeof value !== "object" || value === null) continue;
    if (depth >= MAX_INPUT_DEPTH) return { path: path || "_form", message: `The input is nested more than ${MAX_INPUT_DEPTH} levels deep` };
    for (const [key, child] of Object.entries(value)) {
      const childPath = Array.isArray(value) ? `${path}[${key}]` : path ? `${path}.${key}` : key;
      if (!isStorableText(key)) return { path: path || "_form", message: UNSTORABLE_TEXT_MESSAGE };
      stack.push({ value: child, path: childPath, depth: depth + 1 });
    }
  }
  return null;
}

export type Range = { min: number; max: number; unit: string };

export const blankToUndefined = (v: unknown) => (v === null || (typeof v === "string" && v.trim() === "") ? undefined : v);

export const toNumber = (v: unknown) => {
  const given = blankToUndefined(v);
  return typeof given === "string" ? Number(given.trim()) : given;
};

const between = (label: string, { min, max, unit }: Range) => `${label} must be between ${min} and ${max}${unit ? ` ${unit}` : ""}`;

/** A required number within a range, with messages that name the field and its unit. */
export const numberField = (label: string, range: Range) =>
  z.preprocess(
    toNumber,
    z
      .number({ error: (issue) => (issue.input === undefined ? `${label} is required` : `${label} must be a number`) })
      .min(range.min, between(label, range))
      .max(range.max, between(label, range)),
  );

/** Like numberField, but blank means "not given". */
export const optionalNumberField = (label: string, range: Range) =>
  z.preprocess(
    toNumber,
    z
      .number({ error: `${label} must be a number` })
      .min(range.min, between(label, range))
      .max(range.max, between(label, range))
      .optional(),
  );

export const requiredText = (label: string, max: number) =>
  safeString().trim().min(1, `Enter the ${label}`).max(max, `At most ${max} characters`);

export const optionalText = (max: number) => safeString().trim().max(max, `At most ${max} characters`).default("");

/**
 * A cross-field rule runs once the fields it reads are valid, so its message shows beside the others.
 * It never runs on a value that is not an object at all (null, a list, a number): zod still calls
 * refinements then, and reading a field of null would throw instead of answering with an issue.
 */
export const whenValid =
  (...fields: string[]) =>
  (payload: { value: unknown; issues: readonly { path?: readonly PropertyKey[] }[] }) =>
    typeof payload.value === "object" &&
    payload.value !== null &&
    !Array.isArray(payload.value) &&
    !payload.issues.some((issue) => !issue.path?.length || fields.includes(String(issue.path[0])));

import { z } from "zod";

// Building blocks of the input schemas. Numbers arrive as strings from forms
// and as numbers from the API; a blank form field means "not given", never zero.

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
  z.preprocess(toNumber, z.number({ error: `${label} must be a number` }).min(range.min, between(label, range)).max(range.max, between(label, range)).optional());

export const requiredText = (label: string, max: number) => z.string().trim().min(1, `Enter the ${label}`).max(max, `At most ${max} characters`);

export const optionalText = (max: number) => z.string().trim().max(max, `At most ${max} characters`).default("");

/** A cross-field rule runs once the fields it reads are valid, so its message shows beside the others. */
export const whenValid =
  (...fields: string[]) =>
  (payload: { issues: readonly { path?: readonly PropertyKey[] }[] }) =>
    !payload.issues.some((issue) => fields.includes(String(issue.path?.[0])));

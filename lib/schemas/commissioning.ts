import { z } from "zod";
import { safeString } from "./fields";

/**
 * A meter reading as typed on a phone: empty means "not taken yet" (null), anything else must be a
 * number. Negative or implausible numbers pass through so the checks can flag them with a reason.
 */
const reading = z
  .union([z.number(), safeString(), z.null()])
  .optional()
  .transform((value, ctx): number | null => {
    if (value === null || value === undefined) return null;
    const text = String(value).trim().replace(/,/g, "");
    if (text === "") return null;
    const number = Number(text);
    if (!Number.isFinite(number)) {
      ctx.addIssue({ code: "custom", message: "Enter the reading as a number, for example 241.5" });
      return z.NEVER;
    }
    return number;
  });

const wholeReading = reading.refine((v) => v === null || Number.isInteger(v), "Enter a whole number");

export const BOUNDARIES = ["outside", "inside"] as const;

/** What the installer records on site; the facts they are checked against come from the design. */
export const CommissioningReadings = z.object({
  gridProfileSet: z
    .string()
    .trim()
    .max(300, "At most 300 characters")
    .nullish()
    .transform((v) => (v ? v : null)),
  acVoltageV: reading,
  strings: z
    .array(z.object({ id: safeString().trim().min(1).max(80), measuredV: reading }))
    .max(200, "At most 200 strings")
    .default([]),
  modulesReporting: wholeReading,
  firstPowerW: reading,
  firstPowerTime: z
    .string()
    .trim()
    .nullish()
    .transform((v) => (v ? v : null))
    .refine((v) => v === null || /^([01]?\d|2[0-3]):[0-5]\d$/.test(v), "Enter the time as HH:MM, 24-hour"),
  rapidShutdown: z
    .object({ boundary: z.enum(BOUNDARIES, { error: "Choose where the test was read" }).default("outside"), measuredV: reading, seconds: reading })
    .default({ boundary: "outside", measuredV: null, seconds: null }),
});
export type CommissioningReadingsInput = z.input<typeof CommissioningReadings>;
export type CommissioningReadings = z.output<typeof CommissioningReadings>;

export const SaveCommissioningInput = z.object({
  projectId: safeString().uuid("Unknown project"),
  readings: CommissioningReadings,
  /** Ask to mark the record complete; refused (and the readings still saved) while anything fails or is missing. */
  complete: z.boolean().default(false),
});
export type SaveCommissioningInput = z.input<typeof SaveCommissioningInput>;

import { z } from "zod";
import { safeString } from "./fields";

// "2026-02-30" parses to a later day (or to nothing): it must print back as itself.
const isCalendarDay = (v: string) => {
  const t = Date.parse(`${v}T00:00:00Z`);
  return !Number.isNaN(t) && new Date(t).toISOString().startsWith(v);
};

const isoDay = (label: string) =>
  z.union([
    safeString()
      .trim()
      .regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date written YYYY-MM-DD`)
      .refine(isCalendarDay, `${label} is not a calendar date`),
    z.literal(""),
  ]);

const RANGE = { from: isoDay("from").default(""), to: isoDay("to").default("") };
const inOrder = (v: { from: string; to: string }) => !v.from || !v.to || v.from <= v.to;
const ORDER_PROBLEM = { path: ["to"], message: "to must not be before from" };

/** A range of calendar days in the organization's zone, both ends included; a blank end takes the report's default. */
export const DateRangeQuery = z.object(RANGE).refine(inOrder, ORDER_PROBLEM);
export type DateRangeQuery = z.infer<typeof DateRangeQuery>;

export const REPORT_GROUPS = ["ahj", "utility"] as const;
export type ReportGroup = (typeof REPORT_GROUPS)[number];

export const CycleTimesQuery = z
  .object({ groupBy: z.enum(REPORT_GROUPS, { error: "groupBy must be ahj or utility" }).default("ahj"), ...RANGE })
  .refine(inOrder, ORDER_PROBLEM);
export type CycleTimesQuery = z.infer<typeof CycleTimesQuery>;

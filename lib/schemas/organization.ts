import { z } from "zod";
import { safeString } from "./fields";
import { US_TIME_ZONES } from "@/lib/domain/time-zones";

const optional = (max: number) =>
  safeString()
    .trim()
    .max(max, `At most ${max} characters`)
    .transform((v) => (v === "" ? null : v));

/** The company's details as packets, field reports and receipts print them. */
export const OrganizationInput = z.object({
  name: safeString().trim().min(2, "Enter the company's name").max(200, "At most 200 characters"),
  licenseNumber: optional(60),
  phone: optional(40),
  timeZone: z.enum(US_TIME_ZONES.map((t) => t.id) as [string, ...string[]], { error: "Choose one of the listed time zones" }),
});
export type OrganizationInput = z.input<typeof OrganizationInput>;
export type OrganizationValues = z.output<typeof OrganizationInput>;

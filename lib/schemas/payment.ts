import { z } from "zod";
import { safeString } from "./fields";
import { parseUsd } from "@/lib/fees/money";

const dollars = (label: string, { allowEmpty }: { allowEmpty: boolean }) =>
  z
    .union([safeString(), z.number()])
    .transform((v, ctx): number | null => {
      const text = String(v).trim();
      if (text === "" && allowEmpty) return null;
      const cents = parseUsd(text);
      if (cents === null) {
        ctx.addIssue({ code: "custom", message: `Enter the ${label} in dollars, e.g. 25,000 or 1250.50` });
        return z.NEVER;
      }
      return cents;
    });

/** The lines to pay, by key; the amounts are worked out on the server, never taken from here. */
export const PayFeesInput = z.object({
  projectId: safeString().uuid("Unknown project"),
  feeKeys: z.array(safeString().min(1).max(200)).min(1, "Choose at least one fee to pay").max(50),
});

export const RefundInput = z.object({
  paymentId: safeString().uuid("Unknown payment"),
  amount: dollars("refund amount", { allowEmpty: false }),
  reason: safeString().trim().min(3, "Say why the money is returned").max(500, "At most 500 characters"),
});
export type RefundInput = z.input<typeof RefundInput>;

export const ValuationInput = z.object({
  projectId: safeString().uuid("Unknown project"),
  valuation: dollars("valuation", { allowEmpty: true }).refine((v) => v === null || v <= 100_000_000_00, "At most $100,000,000"),
});
export type ValuationInput = z.input<typeof ValuationInput>;

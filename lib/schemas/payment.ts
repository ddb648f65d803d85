import { z } from "zod";
import { safeString, whenValid } from "./fields";
import { parseUsd } from "@/lib/fees/money";

const dollars = (label: string, { allowEmpty }: { allowEmpty: boolean }) =>
  z.union([safeString(), z.number()]).transform((v, ctx): number | null => {
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

/**
 * A refund names whole fee lines of the payment (the amount is their sum, worked out on the server) or
 * an amount of money not tied to a line; exactly one of the two.
 */
export const RefundInput = z
  .object({
    paymentId: safeString().uuid("Unknown payment"),
    feeKeys: z.array(safeString().min(1).max(200)).max(50).optional(),
    amount: dollars("refund amount", { allowEmpty: true }).optional(),
    reason: safeString().trim().min(3, "Say why the money is returned").max(500, "At most 500 characters"),
  })
  .refine((v) => Boolean(v.feeKeys?.length) !== (v.amount !== undefined && v.amount !== null), {
    path: ["amount"],
    message: "Choose the fees to refund, or enter an amount, not both",
    when: whenValid("feeKeys", "amount"),
  });
export type RefundInput = z.input<typeof RefundInput>;

export const ValuationInput = z.object({
  projectId: safeString().uuid("Unknown project"),
  valuation: dollars("valuation", { allowEmpty: true }).refine((v) => v === null || v <= 100_000_000_00, "At most $100,000,000"),
});
export type ValuationInput = z.input<typeof ValuationInput>;

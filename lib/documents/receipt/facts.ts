import { localDateTime, localLongDate } from "@/lib/domain/time-zones";
import { formatUsd } from "@/lib/fees";
import type { ReceiptInput } from "@/lib/documents/receipt/input";

// The words and figures the payment receipt prints, computed from the receipt input so the
// template only lays them out and the tests can check the same strings.

/** "December 3, 2026" in the organization's zone. */
export function receiptDate(iso: string, timeZone: string): string {
  return localLongDate(iso, timeZone);
}

/** "December 3, 2026, 11:05 MST" in the organization's zone. */
export function receiptDateTime(iso: string, timeZone: string): string {
  return `${receiptDate(iso, timeZone)}, ${localDateTime(iso, timeZone).split(" ").slice(1).join(" ")}`;
}

/** Amounts as the receipt prints them: "$1,234.50". */
export const money = formatUsd;

/** A refund as a deduction: "−$25.00" (with a true minus sign). */
export function deduction(cents: number): string {
  return `\u2212${formatUsd(Math.abs(cents))}`;
}

/** "Brand •••• 4242" as far as the processor reported it. */
export function methodText(method: ReceiptInput["method"]): string {
  const brand = method.brand?.trim() ? method.brand.trim().replace(/^./, (c) => c.toUpperCase()) : null;
  if (brand && method.last4) return `${brand} •••• ${method.last4}`;
  if (method.last4) return `Card •••• ${method.last4}`;
  if (brand) return `${brand} card`;
  return "Card (details not reported by the processor)";
}

/** A refund reason as a sentence: codes such as "requested_by_customer" read as words. */
export function refundReason(reason: string | null): string {
  const text = reason?.trim();
  if (!text) return "No reason given";
  const words = /^[a-z0-9_]+$/.test(text) ? text.replaceAll("_", " ") : text;
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/**
 * A line of fee arithmetic as printed. The fonts have no arrow, and the general fallback
 * ("→" as "to") would read as a range here, so a result arrow reads ", so".
 */
export function arithmeticText(line: string): string {
  return line.replace(/\s*→\s*/g, ", so ");
}

export type ReceiptTotals = {
  refundedCents: number;
  netCents: number;
  /** "Paid", "Partly refunded" or "Refunded in full". */
  status: string;
};

export function receiptTotals(input: ReceiptInput): ReceiptTotals {
  const refundedCents = input.refunds.reduce((sum, r) => sum + r.amountCents, 0);
  const netCents = input.totalCents - refundedCents;
  const status = refundedCents === 0 ? "Paid" : netCents <= 0 ? "Refunded in full" : "Partly refunded";
  return { refundedCents, netCents, status };
}

/** Text for a field that may have been left empty. */
export function orNotRecorded(text: string | null | undefined): string {
  return text?.trim() ? text.trim() : "Not recorded";
}

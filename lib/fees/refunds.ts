// Which fees a refund gives back. The rule, kept simple so that a line's state can always be explained:
// a refund made in Ohmstead either names whole lines of the payment (its amount is their sum, worked
// out here) or is an amount of money not tied to a line. Lines a refund names are returned: the fee is
// unpaid again. An amount not tied to a line (typed by an admin, or refunded at the payment service
// directly) returns money but no fee: the lines stay paid, until the payment's refunds add up to all of
// it, and then every line is returned. Exact integer cents throughout.
import { formatUsd } from "./money";

export type PaidLine = { feeKey: string; name: string; amountCents: number };
/** A refund that stands (the processor did not refuse it), with the lines it named, if any. */
export type StandingRefund = { amountCents: number; feeKeys: readonly string[] };
export type PaidPayment = { amountCents: number; lines: readonly PaidLine[]; refunds: readonly StandingRefund[] };

/** Money of the payment not yet returned. */
export function refundableCents(payment: PaidPayment): number {
  const returned = payment.refunds.reduce((sum, r) => sum + r.amountCents, 0);
  return Math.max(0, payment.amountCents - returned);
}

/** The fee keys of the payment's lines that its refunds gave back (see the rule above). */
export function returnedFeeKeys(payment: PaidPayment): Set<string> {
  if (payment.lines.length && refundableCents(payment) === 0) return new Set(payment.lines.map((l) => l.feeKey));
  const named = new Set(payment.refunds.flatMap((r) => r.feeKeys));
  return new Set(payment.lines.filter((l) => named.has(l.feeKey)).map((l) => l.feeKey));
}

export type LineRefundPlan = { ok: true; amountCents: number; lines: PaidLine[] } | { ok: false; message: string };

/**
 * A refund of whole lines: each must be a line of this payment not returned yet, and together they
 * must fit in what is left of the payment (an earlier refund of an amount may have taken part of it).
 */
export function planLineRefund(payment: PaidPayment, feeKeys: readonly string[]): LineRefundPlan {
  const wanted = new Set(feeKeys);
  if (wanted.size === 0) return { ok: false, message: "Choose at least one fee to refund." };
  const lines = payment.lines.filter((l) => wanted.has(l.feeKey));
  if (lines.length !== wanted.size) return { ok: false, message: "A chosen fee is not part of this payment." };
  const returned = returnedFeeKeys(payment);
  const again = lines.find((l) => returned.has(l.feeKey));
  if (again) return { ok: false, message: `${again.name} was already refunded.` };
  const amountCents = lines.reduce((sum, l) => sum + l.amountCents, 0);
  const left = refundableCents(payment);
  if (amountCents > left)
    return {
      ok: false,
      message: `The chosen fees come to ${formatUsd(amountCents)}, but only ${formatUsd(left)} of this payment is left to refund.`,
    };
  return { ok: true, amountCents, lines };
}

import type { PaymentStatus } from "@/lib/domain/stored-values";
import type { FeeLineProblem } from "@/lib/fees";

/** refunded: paid once, then given back by a refund that named it (lib/fees/refunds.ts); owed again like an unpaid line. */
export type FeeLineState = "unpaid" | "in-progress" | "paid" | "refunded";
export type ProjectFeeLineDto = {
  feeKey: string;
  authority: string;
  authorityKind: "jurisdiction" | "utility";
  name: string;
  arithmetic: string[];
  /** The fee; while `problem` is set, the least it comes to (its minimum, or 0). */
  amountCents: number;
  problem: string | null; // why the line cannot be paid yet
  problemCode: FeeLineProblem["code"] | null;
  state: FeeLineState;
  /** Can be chosen for a card payment now. */
  payable: boolean;
  paymentId: string | null;
};
export type PaymentDto = {
  id: string;
  status: PaymentStatus;
  amountCents: number;
  refundedCents: number;
  card: string | null;
  failureMessage: string | null;
  receiptNumber: string | null;
  hasReceipt: boolean;
  paidAt: string | null;
  createdAt: string;
  createdBy: string | null;
  lines: { feeKey: string; name: string; authority: string; amountCents: number; refunded: boolean }[];
  refunds: {
    id: string;
    amountCents: number;
    lineNames: string[];
    reason: string | null;
    createdAt: string;
    createdBy: string | null;
    failed: boolean;
  }[];
  /** A failed attempt whose fees are still unpaid: the page tells the payer to try another card. */
  failureStillOpen: boolean;
};
export type ProjectFeesDto = {
  asOf: string;
  sizes: { dcKw: number; acKw: number } | null; // null while the design cannot be reviewed
  valuationCents: number | null;
  lines: ProjectFeeLineDto[];
  unpaidTotalCents: number;
  /** True while an unpaid line waits for the valuation or the design: the unpaid total is then the least it comes to. */
  unpaidIsAtLeast: boolean;
  payments: PaymentDto[];
};

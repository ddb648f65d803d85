/** What a payment receipt prints; amounts are integer cents and were computed on the server. */
export type ReceiptInput = {
  receiptNumber: string; // e.g. "R-2026-000123"
  issuedAt: string; // ISO date-time of the payment
  organization: { name: string; phone: string | null; timeZone: string }; // IANA zone the dates print in
  project: { number: number; customerName: string; address: string };
  paidBy: { name: string; email: string };
  lines: { name: string; authority: string; arithmetic: string[]; amountCents: number }[];
  totalCents: number;
  currency: "usd";
  /** Card brand and last four digits as the payment processor reported them, when known. */
  method: { brand: string | null; last4: string | null };
  processorReference: string; // the payment's id at the processor
  refunds: { createdAt: string; amountCents: number; reason: string | null }[];
};

// A payment receipt input for template and render tests: invented organization, payer,
// authorities and card brand; amounts in integer cents as the server computes them.
import type { ReceiptInput } from "@/lib/documents/receipt/input";

export const RECEIPT_LINES: ReceiptInput["lines"] = [
  {
    name: "Residential PV building permit",
    authority: "City of Brackenford Building Division",
    arithmetic: ["8.91 kW DC × $18.00/kW = $160.38", "below the $175.00 minimum → $175.00"],
    amountCents: 17500,
  },
  {
    name: "Electrical plan review",
    authority: "City of Brackenford Building Division",
    arithmetic: ["8.91 kW DC is in the bracket over 5 kW up to 10 kW → $95.00"],
    amountCents: 9500,
  },
  {
    name: "Interconnection application, inverter-based up to 25 kW",
    authority: "Brackenford Municipal Light & Power",
    arithmetic: ["flat fee = $100.00"],
    amountCents: 10000,
  },
];

/** `refunds`: "none", one "partial" refund, or "full" (two refunds adding up to the total). */
export function receiptFixture({
  refunds = "none",
  lines = RECEIPT_LINES,
}: { refunds?: "none" | "partial" | "full"; lines?: ReceiptInput["lines"] } = {}): ReceiptInput {
  const totalCents = lines.reduce((sum, l) => sum + l.amountCents, 0);
  const refundLines: ReceiptInput["refunds"] =
    refunds === "none"
      ? []
      : refunds === "partial"
        ? [{ createdAt: "2026-12-09T15:42:00.000Z", amountCents: 9500, reason: "Plan review waived by the building division" }]
        : [
            { createdAt: "2026-12-09T15:42:00.000Z", amountCents: 9500, reason: "requested_by_customer" },
            { createdAt: "2026-12-10T09:05:00.000Z", amountCents: totalCents - 9500, reason: null },
          ];
  return {
    receiptNumber: "R-2026-1042-3F9A2C",
    issuedAt: "2026-12-03T18:05:00.000Z",
    organization: { name: "Quillmoor Solar Electric", phone: "(555) 014-2210", timeZone: "America/Denver" },
    project: { number: 1042, customerName: "Imogen Halvorsen", address: "120 Larkin Mill Rd, Brackenford, CO 80913" },
    paidBy: { name: "Dana Okafor", email: "dana@quillmoor.example" },
    lines,
    totalCents,
    currency: "usd",
    method: { brand: "corvel", last4: "4417" },
    processorReference: "pay_0000demo7Q2k9LmX4v",
    refunds: refundLines,
  };
}

import { longDate, longDateTime, money } from "@/lib/documents/text";
import type { ReceiptInput } from "./input";

// The words and figures the payment receipt prints, computed from the receipt input so the
// template only lays them out and the tests can check the same strings.

/** A refund as a deduction: "−$25.00" (with a true minus sign). */
export function deduction(cents: number): string {
  return `\u2212${money(Math.abs(cents))}`;
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

/** Everything the receipt's layout prints, as printed. */
export type ReceiptFacts = {
  documentInfo: { title: string; author: string };
  receiptNumber: string;
  subtitle: string;
  footerText: string;
  datePaid: string;
  paidAt: string;
  organization: string; // name and phone, one per line
  paidBy: string; // name and e-mail, one per line
  projectLabel: string;
  projectLine: string;
  status: string;
  total: string;
  refunded: { total: string; net: string } | null;
  lines: { name: string; authority: string; arithmetic: string[]; amount: string }[];
  method: string;
  processorReference: string;
  refunds: { date: string; reason: string; amount: string }[];
};

/** The receipt's printed facts from its (printable) input. */
export function receiptFacts(input: ReceiptInput): ReceiptFacts {
  const p = input.project;
  const zone = input.organization.timeZone;
  const totals = receiptTotals(input);
  const datePaid = longDate(input.issuedAt, zone);
  return {
    documentInfo: { title: `Payment receipt ${input.receiptNumber}, project ${p.number}`, author: input.organization.name },
    receiptNumber: input.receiptNumber,
    subtitle: `Receipt ${input.receiptNumber} · ${datePaid}`,
    footerText: `Receipt ${input.receiptNumber} · Project ${p.number} · ${orNotRecorded(input.organization.name)}`,
    datePaid,
    paidAt: longDateTime(input.issuedAt, zone),
    organization: [orNotRecorded(input.organization.name), input.organization.phone?.trim()].filter(Boolean).join("\n"),
    paidBy: [orNotRecorded(input.paidBy.name), input.paidBy.email.trim()].filter(Boolean).join("\n"),
    projectLabel: `Project ${p.number}`,
    projectLine: `${p.customerName}, ${p.address}`,
    status: totals.status,
    total: money(input.totalCents),
    refunded: input.refunds.length > 0 ? { total: deduction(totals.refundedCents), net: money(totals.netCents) } : null,
    lines: input.lines.map((l) => ({
      name: l.name,
      authority: l.authority,
      arithmetic: l.arithmetic.map(arithmeticText),
      amount: money(l.amountCents),
    })),
    method: methodText(input.method),
    processorReference: input.processorReference,
    refunds: input.refunds.map((r) => ({
      date: longDate(r.createdAt, zone),
      reason: refundReason(r.reason),
      amount: deduction(r.amountCents),
    })),
  };
}

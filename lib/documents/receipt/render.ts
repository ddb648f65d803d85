import { createElement } from "react";
import { PaymentReceipt } from "@/templates/pdf/receipt/payment-receipt";
import { renderPdf } from "../render";
import { printableDeep } from "../text";
import { arithmeticText, receiptFacts } from "./facts";
import type { ReceiptInput } from "./input";

/** Renders a payment receipt to PDF bytes. Pure apart from reading the shipped font files once. */
export async function renderReceiptPdf(input: ReceiptInput): Promise<Uint8Array> {
  // The working's result arrows are worded first (the general fallback would print "to"), then
  // every other character the PDF fonts cannot draw is spelled out.
  const worded = { ...input, lines: input.lines.map((l) => ({ ...l, arithmetic: l.arithmetic.map(arithmeticText) })) };
  return renderPdf(createElement(PaymentReceipt, { receipt: receiptFacts(printableDeep(worded)) }));
}

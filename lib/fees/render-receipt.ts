import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { printableDeep } from "@/lib/packets/pdf-facts";
import { preparePdfFonts } from "@/templates/pdf/fonts";
import { PaymentReceipt } from "@/templates/pdf/payment-receipt";
import { arithmeticText } from "@/templates/pdf/receipt-pdf-facts";
import type { ReceiptInput } from "./receipt-input";

/** Renders a payment receipt to PDF bytes. Pure apart from reading the shipped font files once. */
export async function renderReceiptPdf(input: ReceiptInput): Promise<Uint8Array> {
  await preparePdfFonts();
  // The working's result arrows are worded first (the general fallback would print "to"), then
  // every other character the PDF fonts cannot draw is spelled out.
  const worded = { ...input, lines: input.lines.map((l) => ({ ...l, arithmetic: l.arithmetic.map(arithmeticText) })) };
  const document = createElement(PaymentReceipt, { input: printableDeep(worded) });
  // renderToBuffer is typed for a <Document> element; the receipt renders one.
  const buffer = await renderToBuffer(document as Parameters<typeof renderToBuffer>[0]);
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}

import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { printableDeep } from "@/lib/documents/packets/facts";
import { preparePdfFonts } from "@/templates/pdf/shared/fonts";
import { PaymentReceipt } from "@/templates/pdf/receipt/payment-receipt";
import { arithmeticText } from "@/lib/documents/receipt/facts";
import type { ReceiptInput } from "./input";

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

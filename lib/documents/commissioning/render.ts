import { renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { printableDeep } from "@/lib/documents/packets/facts";
import { CommissioningReport } from "@/templates/pdf/commissioning/commissioning-report";
import { CompletionCertificate } from "@/templates/pdf/commissioning/completion-certificate";
import { preparePdfFonts } from "@/templates/pdf/shared/fonts";
import type { CommissioningDocumentInput } from "./input";

/**
 * Renders the certificate of completion or the commissioning report (by `input.kind`) to PDF
 * bytes. Pure apart from reading the shipped font files once.
 */
export async function renderCommissioningPdf(input: CommissioningDocumentInput): Promise<Uint8Array> {
  await preparePdfFonts();
  // Typed text (grid profiles, names) may hold characters the PDF fonts cannot draw.
  const printable = printableDeep(input);
  const document = printable.kind === "certificate" ? createElement(CompletionCertificate, { input: printable }) : createElement(CommissioningReport, { input: printable });
  // renderToBuffer is typed for a <Document> element; both components render one.
  const buffer = await renderToBuffer(document as Parameters<typeof renderToBuffer>[0]);
  return new Uint8Array(buffer.buffer, buffer.byteOffset, buffer.byteLength);
}

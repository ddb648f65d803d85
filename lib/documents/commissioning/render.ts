import { createElement } from "react";
import { CommissioningReport } from "@/templates/pdf/commissioning/commissioning-report";
import { CompletionCertificate } from "@/templates/pdf/commissioning/completion-certificate";
import { renderPdf } from "../render";
import { printableDeep } from "../text";
import { commissioningFacts } from "./facts";
import type { CommissioningDocumentInput } from "./input";

/**
 * Renders the certificate of completion or the commissioning report (by `input.kind`) to PDF
 * bytes. Pure apart from reading the shipped font files once.
 */
export async function renderCommissioningPdf(input: CommissioningDocumentInput): Promise<Uint8Array> {
  // Typed text (grid profiles, names) may hold characters the PDF fonts cannot draw.
  const printable = printableDeep(input);
  const document = { ...printable, facts: commissioningFacts(printable) };
  return renderPdf(
    document.kind === "certificate"
      ? createElement(CompletionCertificate, { input: document })
      : createElement(CommissioningReport, { input: document }),
  );
}

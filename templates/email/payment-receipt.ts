import { renderEmail } from "./layout";

/** To whoever paid, with the receipt PDF attached by the outbox. */
export function receiptEmail({ receiptNumber, projectNumber, siteAddress, total, lines }: { receiptNumber: string; projectNumber: number; siteAddress: string; total: string; lines: string[] }) {
  const subject = `Receipt ${receiptNumber}: ${total} in fees for project ${projectNumber}`;
  const body = renderEmail({
    paragraphs: [`Payment received for the permit and interconnection fees of the PV system at ${siteAddress}.`, ...lines, `Total paid: ${total}.`, `The receipt ${receiptNumber} is attached as a PDF.`],
  });
  return { subject, ...body };
}

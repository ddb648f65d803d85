import { renderEmail } from "./layout";

/** To whoever paid, with the receipt PDF attached by the outbox. */
export function receiptEmail({
  receiptNumber,
  projectNumber,
  siteAddress,
  total,
  lines,
}: {
  receiptNumber: string;
  projectNumber: number;
  siteAddress: string;
  total: string;
  lines: string[];
}) {
  const subject = `Receipt ${receiptNumber}: ${total} in fees for project ${projectNumber}`;
  const body = renderEmail({
    paragraphs: [
      `Payment received for the permit and interconnection fees of the PV system at ${siteAddress}.`,
      ...lines,
      `Total paid: ${total}.`,
      `The receipt ${receiptNumber} is attached as a PDF.`,
    ],
  });
  return { subject, ...body };
}

/** To whoever paid, when an admin returns some or all of a payment. */
export function refundEmail({
  receiptNumber,
  projectNumber,
  siteAddress,
  refunded,
  remaining,
  reason,
}: {
  receiptNumber: string | null;
  projectNumber: number;
  siteAddress: string;
  refunded: string;
  remaining: string;
  reason: string;
}) {
  const subject = `Refund of ${refunded} for project ${projectNumber}`;
  const body = renderEmail({
    paragraphs: [
      `${refunded} of the fees paid for the PV system at ${siteAddress}${receiptNumber ? ` (receipt ${receiptNumber})` : ""} is being returned to the card that paid.`,
      `Reason: ${reason}`,
      `Still paid after this refund: ${remaining}. Card refunds usually take several business days to appear.`,
    ],
  });
  return { subject, ...body };
}

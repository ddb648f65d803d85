import "server-only";
import { formatUsd } from "@/lib/fees";
import { renderReceiptPdf } from "@/lib/documents/receipt/render";
import { receiptEmail } from "@/templates/email/payment-receipt";
import { db } from "../db";
import { enqueueMail } from "../data/outbox";
import { claimDueReceipt, markReceiptIssued } from "../data/receipts";
import { putObject } from "../services/storage";

/**
 * Issues the receipt of every paid payment that has none yet: the PDF goes to storage and an e-mail
 * with it attached goes into the outbox, in one transaction with the payment's receipt fields, so a
 * crash at any point leaves the payment to be picked up again on the next pass. Run by the worker.
 */
export async function issueDueReceipts({ limit = 10 }: { limit?: number } = {}): Promise<number> {
  let issued = 0;
  for (let i = 0; i < limit; i++) {
    const done = await db().transaction(async (transaction) => {
      const due = await claimDueReceipt(transaction);
      if (!due) return false;
      const { input, objectKey } = due;
      await putObject({ key: objectKey, body: await renderReceiptPdf(input), contentType: "application/pdf" });
      await markReceiptIssued({ paymentId: due.paymentId, receiptNumber: input.receiptNumber, objectKey }, transaction);
      if (due.payerEmail) {
        const mail = receiptEmail({
          receiptNumber: input.receiptNumber,
          projectNumber: input.project.number,
          siteAddress: input.project.address,
          total: formatUsd(input.totalCents),
          lines: input.lines.map((l) => `${l.authority}: ${l.name}, ${formatUsd(l.amountCents)}`),
        });
        await enqueueMail(
          {
            to: due.payerEmail,
            ...mail,
            organizationId: due.organizationId,
            attachments: [{ fileName: `${input.receiptNumber}.pdf`, objectKey, contentType: "application/pdf" }],
          },
          { transaction },
        );
      }
      return true;
    });
    if (!done) break;
    issued++;
  }
  return issued;
}

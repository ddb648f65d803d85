import "server-only";
import { Op } from "sequelize";
import { Organization, Payment, PaymentLine, Project, Refund, User } from "@/models";
import { DEFAULT_TIME_ZONE } from "@/lib/domain/time-zones";
import type { ReceiptInput } from "@/lib/documents/receipt/input";
import { renderReceiptPdf } from "@/lib/documents/receipt/render";
import { formatUsd } from "@/lib/fees";
import { receiptEmail } from "@/templates/email/payment-receipt";
import { db } from "../db";
import { enqueueMail } from "./outbox";
import { putObject } from "./storage";

const RECEIPTED: Payment["status"][] = ["paid", "partially_refunded", "refunded"];

export function receiptNumberFor(payment: { id: string; paidAt: Date | null }, projectNumber: number): string {
  const year = (payment.paidAt ?? new Date()).getUTCFullYear();
  return `R-${year}-${projectNumber}-${payment.id.slice(0, 6).toUpperCase()}`;
}

/**
 * Issues the receipt of every paid payment that has none yet: the PDF goes to storage and an e-mail
 * with it attached goes into the outbox, in one transaction with the payment's receipt fields, so a
 * crash at any point leaves the payment to be picked up again on the next pass. Run by the worker.
 */
export async function issueDueReceipts({ limit = 10 }: { limit?: number } = {}): Promise<number> {
  let issued = 0;
  for (let i = 0; i < limit; i++) {
    const done = await db().transaction(async (transaction) => {
      const payment = await Payment.findOne({ where: { status: { [Op.in]: RECEIPTED }, receiptKey: null }, order: [["paidAt", "ASC"]], lock: transaction.LOCK.UPDATE, skipLocked: true, transaction });
      if (!payment) return false;
      // One after another: a transaction has one connection, which runs one query at a time.
      const project = await Project.findByPk(payment.projectId, { transaction });
      const organization = await Organization.findByPk(payment.organizationId, { transaction });
      const payer = payment.createdById ? await User.findByPk(payment.createdById, { transaction }) : null;
      const lines = await PaymentLine.findAll({ where: { paymentId: payment.id }, transaction });
      const refunds = await Refund.findAll({ where: { paymentId: payment.id }, order: [["createdAt", "ASC"]], transaction });
      const receiptNumber = receiptNumberFor(payment, project!.number);
      const input: ReceiptInput = {
        receiptNumber,
        issuedAt: (payment.paidAt ?? new Date()).toISOString(),
        organization: { name: organization?.name ?? "", phone: organization?.phone ?? null, timeZone: organization?.timeZone ?? DEFAULT_TIME_ZONE },
        project: { number: project!.number, customerName: project!.customerName, address: `${project!.street}, ${project!.city}, ${project!.state} ${project!.postalCode}` },
        paidBy: { name: payer?.name ?? "", email: payer?.email ?? "" },
        lines: lines.map((l) => ({ name: l.name, authority: l.authority, arithmetic: l.arithmetic, amountCents: l.amountCents })),
        totalCents: payment.amountCents,
        currency: "usd",
        method: { brand: payment.cardBrand, last4: payment.cardLast4 },
        processorReference: payment.paymentIntentId ?? payment.checkoutSessionId ?? payment.id,
        refunds: refunds.map((r) => ({ createdAt: r.createdAt.toISOString(), amountCents: r.amountCents, reason: r.reason })),
      };
      const key = `projects/${payment.projectId}/receipts/${receiptNumber}.pdf`;
      await putObject({ key, body: await renderReceiptPdf(input), contentType: "application/pdf" });
      await payment.update({ receiptNumber, receiptKey: key }, { transaction });
      if (payer?.email) {
        const mail = receiptEmail({ receiptNumber, projectNumber: project!.number, siteAddress: input.project.address, total: formatUsd(payment.amountCents), lines: input.lines.map((l) => `${l.authority}: ${l.name}, ${formatUsd(l.amountCents)}`) });
        await enqueueMail({ to: payer.email, ...mail, organizationId: payment.organizationId, attachments: [{ fileName: `${receiptNumber}.pdf`, objectKey: key, contentType: "application/pdf" }] }, { transaction });
      }
      return true;
    });
    if (!done) break;
    issued++;
  }
  return issued;
}

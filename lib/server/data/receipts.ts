import "server-only";
import { Op, type Transaction } from "sequelize";
import { Organization, Payment, PaymentLine, Project, Refund, User } from "@/models";
import { DEFAULT_TIME_ZONE } from "@/lib/domain/time-zones";
import type { ReceiptInput } from "@/lib/documents/receipt/input";
import { db } from "../db";

const RECEIPTED: Payment["status"][] = ["paid", "partially_refunded", "refunded"];

export function receiptNumberFor(payment: { id: string; paidAt: Date | null }, projectNumber: number): string {
  const year = (payment.paidAt ?? new Date()).getUTCFullYear();
  return `R-${year}-${projectNumber}-${payment.id.slice(0, 6).toUpperCase()}`;
}

/** A paid payment still without its receipt, with what the receipt prints and who it goes to. */
export type DueReceipt = {
  paymentId: string;
  organizationId: string;
  projectId: string;
  objectKey: string;
  payerEmail: string | null;
  input: ReceiptInput;
};

/**
 * Takes the oldest paid payment that has no receipt yet, locked (FOR UPDATE SKIP LOCKED) for the
 * caller's transaction so parallel workers never issue it twice, and gathers what its receipt prints.
 */
export async function claimDueReceipt(transaction: Transaction): Promise<DueReceipt | null> {
  db();
  const payment = await Payment.findOne({
    where: { status: { [Op.in]: RECEIPTED }, receiptKey: null },
    order: [["paidAt", "ASC"]],
    lock: transaction.LOCK.UPDATE,
    skipLocked: true,
    transaction,
  });
  if (!payment) return null;
  // One after another: a transaction has one connection, which runs one query at a time.
  const project = await Project.findByPk(payment.projectId, { transaction });
  const organization = await Organization.findByPk(payment.organizationId, { transaction });
  const payer = payment.createdById ? await User.findByPk(payment.createdById, { transaction }) : null;
  const lines = await PaymentLine.findAll({ where: { paymentId: payment.id }, transaction });
  const refunds = await Refund.findAll({ where: { paymentId: payment.id }, order: [["createdAt", "ASC"]], transaction });
  const receiptNumber = receiptNumberFor(payment, project!.number);
  return {
    paymentId: payment.id,
    organizationId: payment.organizationId,
    projectId: payment.projectId,
    objectKey: `projects/${payment.projectId}/receipts/${receiptNumber}.pdf`,
    payerEmail: payer?.email ?? null,
    input: {
      receiptNumber,
      issuedAt: (payment.paidAt ?? new Date()).toISOString(),
      organization: {
        name: organization?.name ?? "",
        phone: organization?.phone ?? null,
        timeZone: organization?.timeZone ?? DEFAULT_TIME_ZONE,
      },
      project: {
        number: project!.number,
        customerName: project!.customerName,
        address: `${project!.street}, ${project!.city}, ${project!.state} ${project!.postalCode}`,
      },
      paidBy: { name: payer?.name ?? "", email: payer?.email ?? "" },
      lines: lines.map((l) => ({ name: l.name, authority: l.authority, arithmetic: l.arithmetic, amountCents: l.amountCents })),
      totalCents: payment.amountCents,
      currency: "usd",
      method: { brand: payment.cardBrand, last4: payment.cardLast4 },
      processorReference: payment.paymentIntentId ?? payment.checkoutSessionId ?? payment.id,
      refunds: refunds.map((r) => ({ createdAt: r.createdAt.toISOString(), amountCents: r.amountCents, reason: r.reason })),
    },
  };
}

/** Writes the issued receipt's number and stored object on its payment. */
export async function markReceiptIssued(
  { paymentId, receiptNumber, objectKey }: { paymentId: string; receiptNumber: string; objectKey: string },
  transaction: Transaction,
): Promise<void> {
  await Payment.update({ receiptNumber, receiptKey: objectKey }, { where: { id: paymentId }, transaction });
}

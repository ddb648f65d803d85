import "server-only";
import { Op, type Transaction } from "sequelize";
import { Payment, PaymentLine, Project, Refund, User } from "@/models";
import type { Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { formatUsd, type PaidPayment } from "@/lib/fees";
import type { PaymentDto, ProjectFeeLineDto } from "@/lib/dto/fees";
import { db } from "../db";
import { recordAudit } from "./audit";
import { isUuid } from "./ids";
import { PAYMENT_INCLUDE, paidPaymentOf, toPaymentDto } from "./project-fees";
import { getProjectById } from "./projects";

/** A payment's processor ids, for asking the processor about it. */
export type PaymentRef = { id: string; checkoutSessionId: string | null };

/** Records a pending payment of the chosen fee lines, with its lines and audit row, in one transaction. */
export async function createPendingPayment({
  viewer,
  projectId,
  lines,
  amountCents,
}: {
  viewer: Viewer;
  projectId: string;
  lines: ProjectFeeLineDto[];
  amountCents: number;
}): Promise<{ id: string }> {
  return db().transaction(async (transaction) => {
    const created = await Payment.create(
      { organizationId: viewer.organizationId, projectId, amountCents, createdById: viewer.id },
      { transaction },
    );
    await PaymentLine.bulkCreate(
      lines.map((l) => ({
        paymentId: created.id,
        feeKey: l.feeKey,
        authority: l.authority,
        name: l.name,
        arithmetic: l.arithmetic,
        amountCents: l.amountCents,
      })),
      { transaction },
    );
    await recordAudit(
      {
        viewer,
        action: "payment.started",
        entityType: "project",
        entityId: projectId,
        changes: { payment: { before: null, after: `${formatUsd(amountCents)} for ${lines.map((l) => l.name).join(", ")}` } },
      },
      { transaction },
    );
    return { id: created.id };
  });
}

/** Remembers the processor's checkout session a payment is paid through. */
export async function setCheckoutSession(paymentId: string, checkoutSessionId: string): Promise<void> {
  db();
  await Payment.update({ checkoutSessionId }, { where: { id: paymentId } });
}

/** Ends a payment that will not be paid (no checkout, or the checkout could not be opened). */
export async function expirePayment(paymentId: string, failureMessage?: string): Promise<void> {
  db();
  await Payment.update({ status: "expired", ...(failureMessage ? { failureMessage } : {}) }, { where: { id: paymentId } });
}

/** The organization's payments by id, for ending their unfinished checkouts. */
export async function getPaymentRefs({ viewer, paymentIds }: { viewer: Viewer; paymentIds: string[] }): Promise<PaymentRef[]> {
  db();
  const rows = await Payment.findAll({
    where: { id: paymentIds, organizationId: viewer.organizationId },
    attributes: ["id", "checkoutSessionId"],
  });
  return rows.map(({ id, checkoutSessionId }) => ({ id, checkoutSessionId }));
}

/** A paid payment the viewer may refund, with its lines and standing refunds as the refund rule reads them. */
export type RefundablePayment = {
  id: string;
  projectId: string;
  paymentIntentId: string | null;
  refundedCents: number;
  lines: { feeKey: string; name: string }[];
  paid: PaidPayment;
};

/** NOT_FOUND for a payment of another organization or of a project the viewer cannot see; CONFLICT unless it holds money. */
export async function getRefundablePayment({ viewer, paymentId }: { viewer: Viewer; paymentId: string }): Promise<RefundablePayment> {
  db();
  const payment = isUuid(paymentId)
    ? await Payment.findOne({
        where: { id: paymentId, organizationId: viewer.organizationId },
        include: [
          { model: PaymentLine, as: "lines" },
          { model: Refund, as: "refunds" },
        ],
      })
    : null;
  if (!payment) throw new AppError("NOT_FOUND", "No such payment.");
  await getProjectById({ viewer, projectId: payment.projectId });
  if (payment.status !== "paid" && payment.status !== "partially_refunded")
    throw new AppError("CONFLICT", "Only a paid payment can be refunded.");
  return {
    id: payment.id,
    projectId: payment.projectId,
    paymentIntentId: payment.paymentIntentId,
    refundedCents: payment.refundedCents,
    lines: (payment.lines ?? []).map((l) => ({ feeKey: l.feeKey, name: l.name })),
    paid: paidPaymentOf(payment),
  };
}

/** What the refund e-mail says, read inside the refund's transaction: who paid, the site, and what the payment still holds. */
export async function getRefundMailFacts(paymentId: string, transaction: Transaction) {
  const payment = await Payment.findByPk(paymentId, { transaction });
  if (!payment) return null;
  const payer = payment.createdById ? await User.findByPk(payment.createdById, { transaction }) : null;
  const project = await Project.findByPk(payment.projectId, { transaction });
  if (!payer?.email || !project) return null;
  return {
    to: payer.email,
    organizationId: payment.organizationId,
    receiptNumber: payment.receiptNumber,
    projectNumber: project.number,
    siteAddress: `${project.street}, ${project.city}, ${project.state} ${project.postalCode}`,
    remainingCents: payment.amountCents - payment.refundedCents,
  };
}

/** One payment as the Fees page shows it. */
export async function getPaymentDto(paymentId: string): Promise<PaymentDto> {
  db();
  return toPaymentDto((await Payment.findByPk(paymentId, { include: PAYMENT_INCLUDE }))!);
}

/** Pending payments with a checkout, untouched for `olderThanMs`: their webhook may never have come. */
export async function listStalePendingPayments({ olderThanMs }: { olderThanMs: number }): Promise<PaymentRef[]> {
  db();
  const rows = await Payment.findAll({
    where: { status: "pending", checkoutSessionId: { [Op.ne]: null }, updatedAt: { [Op.lt]: new Date(Date.now() - olderThanMs) } },
    limit: 50,
  });
  return rows.map(({ id, checkoutSessionId }) => ({ id, checkoutSessionId }));
}

/** Marks a pending payment as looked at now, so the next look waits for the next interval. */
export async function touchPayment(paymentId: string): Promise<void> {
  db();
  const row = await Payment.findByPk(paymentId);
  if (!row) return;
  row.changed("updatedAt", true);
  await row.save();
}

/** Where a payment's receipt is kept, for a viewer who may see its project. */
export async function getReceiptLocation({ viewer, paymentId }: { viewer: Viewer; paymentId: string }) {
  db();
  const payment = isUuid(paymentId) ? await Payment.findOne({ where: { id: paymentId, organizationId: viewer.organizationId } }) : null;
  if (!payment) throw new AppError("NOT_FOUND", "No such payment.");
  await getProjectById({ viewer, projectId: payment.projectId });
  if (!payment.receiptKey) throw new AppError("NOT_FOUND", "The receipt is not issued yet.");
  return { key: payment.receiptKey, fileName: `${payment.receiptNumber}.pdf` };
}

/** A project's settled payments, newest first, as a filing names the fee that went with it. */
export async function listSettledPayments({ viewer, projectId }: { viewer: Viewer; projectId: string }) {
  db();
  await getProjectById({ viewer, projectId });
  const rows = await Payment.findAll({
    where: { projectId, organizationId: viewer.organizationId, status: { [Op.in]: ["paid", "partially_refunded", "refunded"] } },
    attributes: ["id", "amountCents", "paidAt", "createdAt"],
    order: [["createdAt", "DESC"]],
  });
  return rows.map((p) => ({ id: p.id, amountCents: p.amountCents, paidAt: (p.paidAt ?? p.createdAt).toISOString() }));
}

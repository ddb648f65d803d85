import "server-only";
import { Op, type Transaction } from "sequelize";
import type Stripe from "stripe";
import { Payment, Refund } from "@/models";
import type { RefundStatus } from "@/lib/domain/stored-values";

const refundStatusOf = (status: string | null): RefundStatus =>
  status === "failed" || status === "canceled" ? "failed" : status === "succeeded" ? "succeeded" : "pending";

/** Fee keys a refund carries in the processor's metadata (a JSON list), for a refund the webhook records before the admin's call does. */
function feeKeysOf(refund: { metadata?: Stripe.Metadata | null }): string[] {
  try {
    const keys: unknown = JSON.parse(refund.metadata?.feeKeys ?? "[]");
    return Array.isArray(keys) ? keys.filter((k): k is string => typeof k === "string").slice(0, 50) : [];
  } catch {
    return [];
  }
}

/**
 * Records a refund once, by the processor's id, and brings the payment's refunded total and status
 * along. Failed is final: a late "succeeded" never revives it. `attributed` is true for the one call
 * that first records who asked for the refund, whichever of the admin's request and the webhook came first.
 */
export async function recordRefund(
  paymentId: string,
  refund: Pick<Stripe.Refund, "id" | "amount" | "status"> & { metadata?: Stripe.Metadata | null },
  extra: { reason: string | null; createdById: string | null; feeKeys?: string[] },
  transaction: Transaction,
): Promise<{ attributed: boolean }> {
  const payment = await Payment.findByPk(paymentId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!payment) return { attributed: false };
  const status = refundStatusOf(refund.status);
  const feeKeys = extra.feeKeys ?? feeKeysOf(refund);
  const [row, created] = await Refund.findOrCreate({
    where: { processorRefundId: refund.id },
    defaults: {
      paymentId,
      processorRefundId: refund.id,
      amountCents: refund.amount,
      reason: extra.reason,
      createdById: extra.createdById,
      status,
      feeKeys,
    },
    transaction,
  });
  const changes: Partial<Refund> = {};
  if (!created && row.status !== "failed" && status !== row.status && (status === "failed" || row.status === "pending"))
    changes.status = status;
  const attributed = Boolean(extra.createdById) && (created || !row.createdById);
  // The webhook may have recorded it first; the admin's own call then adds who asked, why and for which fees.
  if (!created && attributed)
    Object.assign(changes, { reason: extra.reason, createdById: extra.createdById, ...(feeKeys.length ? { feeKeys } : {}) });
  if (Object.keys(changes).length) await row.update(changes, { transaction });
  await settleRefunded(payment, transaction);
  return { attributed };
}

/** The refunded total is the sum of the refunds that were not refused; the status follows it, back to paid if none stands. */
export async function settleRefunded(payment: Payment, transaction: Transaction) {
  const counted = (await Refund.sum("amountCents", { where: { paymentId: payment.id, status: { [Op.ne]: "failed" } }, transaction })) ?? 0;
  const total = Math.min(payment.amountCents, counted);
  const holdsMoney = payment.status === "paid" || payment.status === "partially_refunded" || payment.status === "refunded";
  const status = !holdsMoney ? payment.status : total === 0 ? "paid" : total >= payment.amountCents ? "refunded" : "partially_refunded";
  if (total !== payment.refundedCents || status !== payment.status) await payment.update({ refundedCents: total, status }, { transaction });
}

import "server-only";
import type { Transaction } from "sequelize";
import type Stripe from "stripe";
import { Payment, ProcessorEvent } from "@/models";
import { db } from "../db";
import { isUuid } from "./ids";
import { recordRefund } from "./refunds";

export type EventOutcome = "applied" | "duplicate" | "ignored";

const idOf = (v: string | { id: string } | null | undefined) => (typeof v === "string" ? v : (v?.id ?? null));

/** The payment an object belongs to: by our id in its metadata, else by the processor's ids we stored. */
async function findPayment(
  transaction: Transaction,
  { paymentId, sessionId, paymentIntentId }: { paymentId?: string | null; sessionId?: string | null; paymentIntentId?: string | null },
) {
  // Metadata can come from payments Ohmstead did not start; an id that is not ours is simply not found.
  const where =
    paymentId && isUuid(paymentId)
      ? { id: paymentId }
      : sessionId
        ? { checkoutSessionId: sessionId }
        : paymentIntentId
          ? { paymentIntentId }
          : null;
  if (!where) return null;
  return Payment.findOne({ where, transaction, lock: transaction.LOCK.UPDATE });
}

/** Moves a payment to paid once; later or repeated news of the same payment changes nothing. */
async function markPaid(
  payment: Payment,
  facts: { paymentIntentId: string | null; card?: { brand?: string | null; last4?: string | null } | null },
  transaction: Transaction,
) {
  const values: Partial<Payment> = {};
  if (facts.paymentIntentId && !payment.paymentIntentId) values.paymentIntentId = facts.paymentIntentId;
  if (facts.card?.last4 && !payment.cardLast4) Object.assign(values, { cardBrand: facts.card.brand ?? null, cardLast4: facts.card.last4 });
  if (payment.status === "pending" || payment.status === "expired")
    Object.assign(values, { status: "paid", paidAt: new Date(), failureMessage: null });
  if (Object.keys(values).length) await payment.update(values, { transaction });
}

function cardOf(charge: Stripe.Charge | string | null | undefined) {
  const card = typeof charge === "object" && charge ? charge.payment_method_details?.card : null;
  return card ? { brand: card.brand, last4: card.last4 } : null;
}

/** Applies what a checkout session says now (from a webhook or from asking the API); true when something changed. */
export async function applySessionState(session: Stripe.Checkout.Session): Promise<boolean> {
  return db().transaction(async (transaction) => {
    const payment = await findPayment(transaction, { paymentId: session.metadata?.paymentId, sessionId: session.id });
    if (!payment) return false;
    const before = payment.status;
    const intent = typeof session.payment_intent === "object" ? session.payment_intent : null;
    if (session.payment_status === "paid")
      await markPaid(payment, { paymentIntentId: idOf(session.payment_intent), card: cardOf(intent?.latest_charge) }, transaction);
    else if (session.status === "expired" && payment.status === "pending") await payment.update({ status: "expired" }, { transaction });
    return payment.status !== before;
  });
}

/**
 * Applies one verified processor event inside a transaction, once: the event's id is written first,
 * so a duplicate or replay finds it and changes nothing. Each branch only moves a payment forward,
 * which makes the order of arrival irrelevant.
 */
export async function applyProcessorEvent(event: Stripe.Event): Promise<EventOutcome> {
  return db().transaction(async (transaction) => {
    const [, fresh] = await ProcessorEvent.findOrCreate({
      where: { id: event.id },
      defaults: { id: event.id, type: event.type, receivedAt: new Date() },
      transaction,
    });
    if (!fresh) return "duplicate";
    switch (event.type) {
      case "checkout.session.completed":
      case "checkout.session.async_payment_succeeded": {
        const session = event.data.object;
        const payment = await findPayment(transaction, { paymentId: session.metadata?.paymentId, sessionId: session.id });
        if (!payment) return "ignored";
        if (session.payment_status === "paid") await markPaid(payment, { paymentIntentId: idOf(session.payment_intent) }, transaction);
        return "applied";
      }
      case "checkout.session.expired": {
        const session = event.data.object;
        const payment = await findPayment(transaction, { paymentId: session.metadata?.paymentId, sessionId: session.id });
        if (!payment) return "ignored";
        if (payment.status === "pending") await payment.update({ status: "expired" }, { transaction });
        return "applied";
      }
      case "payment_intent.succeeded": {
        const intent = event.data.object;
        const payment = await findPayment(transaction, { paymentId: intent.metadata?.paymentId, paymentIntentId: intent.id });
        if (!payment) return "ignored";
        await markPaid(payment, { paymentIntentId: intent.id, card: cardOf(intent.latest_charge) }, transaction);
        return "applied";
      }
      case "payment_intent.payment_failed": {
        const intent = event.data.object;
        const payment = await findPayment(transaction, { paymentId: intent.metadata?.paymentId, paymentIntentId: intent.id });
        if (!payment) return "ignored";
        // A decline leaves the fees unpaid and the checkout open for another card; the office sees why.
        if (payment.status === "pending")
          await payment.update(
            {
              failureMessage: intent.last_payment_error?.message ?? "The payment was not completed.",
              paymentIntentId: payment.paymentIntentId ?? intent.id,
            },
            { transaction },
          );
        return "applied";
      }
      case "charge.succeeded": {
        const charge = event.data.object;
        const payment = await findPayment(transaction, {
          paymentId: charge.metadata?.paymentId,
          paymentIntentId: idOf(charge.payment_intent),
        });
        if (!payment) return "ignored";
        const card = cardOf(charge);
        if (card?.last4 && !payment.cardLast4) await payment.update({ cardBrand: card.brand, cardLast4: card.last4 }, { transaction });
        return "applied";
      }
      case "charge.refunded": {
        const charge = event.data.object;
        const payment = await findPayment(transaction, {
          paymentId: charge.metadata?.paymentId,
          paymentIntentId: idOf(charge.payment_intent),
        });
        if (!payment) return "ignored";
        // A refund proves the charge went through, even if its success event has not arrived yet. The
        // amounts come from the refund events, one per refund, so a refund that fails later stops counting.
        await markPaid(payment, { paymentIntentId: idOf(charge.payment_intent), card: cardOf(charge) }, transaction);
        return "applied";
      }
      case "refund.created":
      case "refund.updated":
      case "refund.failed": {
        const refund = event.data.object;
        const payment = await findPayment(transaction, {
          paymentId: refund.metadata?.paymentId,
          paymentIntentId: idOf(refund.payment_intent),
        });
        if (!payment) return "ignored";
        await markPaid(payment, { paymentIntentId: idOf(refund.payment_intent) }, transaction);
        await recordRefund(payment.id, refund, { reason: refund.metadata?.note ?? null, createdById: null }, transaction);
        return "applied";
      }
      default:
        return "ignored";
    }
  });
}

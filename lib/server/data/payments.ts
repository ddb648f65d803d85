import "server-only";
import { createHash } from "node:crypto";
import { Op, type Transaction } from "sequelize";
import type Stripe from "stripe";
import { Payment, PaymentLine, Project, Refund, User } from "@/models";
import type { RefundStatus } from "@/lib/domain/stored-values";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { formatUsd, planLineRefund, refundableCents } from "@/lib/fees";
import { refundEmail } from "@/templates/email/payment-receipt";
import { db } from "../db";
import { env } from "../env";
import { enqueueMail } from "../services/outbox";
import { stripe } from "../services/payments";
import { recordAudit } from "./audit";
import { isUuid } from "./ids";
import { applySessionState } from "./payment-events";
import { getProjectFees, PAYMENT_INCLUDE, paidPaymentOf, toPaymentDto } from "./project-fees";
import type { PaymentDto } from "@/lib/dto/fees";
import { getProjectById } from "./projects";

/** Ends an unfinished checkout that holds some of the same lines, so one fee is never being paid twice. */
async function releasePending(payment: Payment) {
  if (!payment.checkoutSessionId) {
    await payment.update({ status: "expired" });
    return;
  }
  const session = await stripe().checkout.sessions.retrieve(payment.checkoutSessionId);
  const settled = session.status === "open" ? await stripe().checkout.sessions.expire(session.id) : session;
  await applySessionState(settled);
}

/**
 * Starts paying the chosen unpaid lines. The amount is worked out here, from the schedules and the
 * design, in integer cents; the browser only names the lines. Returns the hosted checkout page.
 */
export async function startPayment({ viewer, projectId, feeKeys }: { viewer: Viewer; projectId: string; feeKeys: string[] }): Promise<{ paymentId: string; checkoutUrl: string }> {
  const sequelize = db();
  const project = await getProjectById({ viewer, projectId });
  if (!can(viewer, "fees:pay")) throw new AppError("FORBIDDEN", "Your role cannot pay fees.");
  let fees = await getProjectFees({ viewer, projectId });
  const stale = fees.payments.filter((p) => p.status === "pending" && fees.lines.some((l) => feeKeys.includes(l.feeKey) && l.paymentId === p.id));
  if (stale.length) {
    for (const p of await Payment.findAll({ where: { id: stale.map((s) => s.id) } })) await releasePending(p);
    fees = await getProjectFees({ viewer, projectId });
  }
  const chosen = fees.lines.filter((l) => feeKeys.includes(l.feeKey));
  if (chosen.length !== new Set(feeKeys).size) throw new AppError("CONFLICT", "Some of the chosen fees no longer apply to this project. Reload the page.");
  const blocked = chosen.find((l) => !l.payable);
  if (blocked) throw new AppError("CONFLICT", blocked.state === "paid" ? `${blocked.name} is already paid.` : blocked.problem ? `${blocked.name}: ${blocked.problem}` : `${blocked.name} has nothing to pay.`);
  const amountCents = chosen.reduce((sum, l) => sum + l.amountCents, 0);

  const payment = await sequelize.transaction(async (transaction) => {
    const created = await Payment.create({ organizationId: viewer.organizationId, projectId, amountCents, createdById: viewer.id }, { transaction });
    await PaymentLine.bulkCreate(chosen.map((l) => ({ paymentId: created.id, feeKey: l.feeKey, authority: l.authority, name: l.name, arithmetic: l.arithmetic, amountCents: l.amountCents })), { transaction });
    await recordAudit({ viewer, action: "payment.started", entityType: "project", entityId: projectId, changes: { payment: { before: null, after: `${formatUsd(amountCents)} for ${chosen.map((l) => l.name).join(", ")}` } } }, { transaction });
    return created;
  });

  const base = `${env().APP_URL}/projects/${projectId}/fees`;
  try {
    const session = await stripe().checkout.sessions.create(
      {
        mode: "payment",
        line_items: chosen.map((l) => ({ quantity: 1, price_data: { currency: "usd", unit_amount: l.amountCents, product_data: { name: `${l.authority}: ${l.name}` } } })),
        success_url: `${base}?checkout=done`,
        cancel_url: `${base}?checkout=cancelled`,
        client_reference_id: payment.id,
        customer_email: viewer.email,
        metadata: { paymentId: payment.id, projectId, projectNumber: String(project.number) },
        payment_intent_data: { metadata: { paymentId: payment.id, projectId }, description: `Project ${project.number} fees` },
      },
      { idempotencyKey: `checkout-${payment.id}` },
    );
    await payment.update({ checkoutSessionId: session.id });
    return { paymentId: payment.id, checkoutUrl: session.url! };
  } catch (error) {
    await payment.update({ status: "expired", failureMessage: "The payment page could not be opened." });
    console.error("checkout session", error);
    throw new AppError("CONFLICT", "The payment service did not answer. Nothing was charged; try again in a minute.");
  }
}

/** The processor's refusal, in its own words, for the admin to read. */
function refusalOf(error: unknown): AppError {
  const message = error instanceof Error && error.message ? error.message : "no reason given";
  const declined = typeof error === "object" && error !== null && "type" in error && String((error as { type: unknown }).type).startsWith("Stripe") && (error as { type: string }).type !== "StripeConnectionError";
  if (declined) return new AppError("CONFLICT", `The payment service refused the refund: ${message}`);
  console.error("refund", error);
  return new AppError("CONFLICT", "The payment service did not answer. Nothing was refunded; try again in a minute.");
}

/** What a refund returns: whole fee lines of the payment (their sum, worked out here), or an amount of money not tied to a line. */
export type RefundRequest = { feeKeys: string[] } | { amountCents: number };

// The processor keeps a refund's metadata values to 500 characters; longer key lists are recorded from the admin's own call only.
const METADATA_VALUE_MAX = 500;

/**
 * Returns money on a paid payment: whole fee lines, which are then unpaid again, or an amount, which
 * leaves the lines paid (the rule is in lib/fees/refunds.ts). Recorded from the processor's answer. Two
 * admins pressing Refund at once make one refund (the same idempotency key), and only the request that
 * records it audits it and e-mails the payer.
 */
export async function refundPayment({ viewer, paymentId, reason, ...request }: { viewer: Viewer; paymentId: string; reason: string } & RefundRequest): Promise<PaymentDto> {
  const sequelize = db();
  if (!can(viewer, "fees:refund")) throw new AppError("FORBIDDEN", "Only an admin can refund.");
  const payment = isUuid(paymentId) ? await Payment.findOne({ where: { id: paymentId, organizationId: viewer.organizationId }, include: [{ model: PaymentLine, as: "lines" }, { model: Refund, as: "refunds" }] }) : null;
  if (!payment) throw new AppError("NOT_FOUND", "No such payment.");
  await getProjectById({ viewer, projectId: payment.projectId });
  if (payment.status !== "paid" && payment.status !== "partially_refunded") throw new AppError("CONFLICT", "Only a paid payment can be refunded.");
  const paid = paidPaymentOf(payment);
  const left = refundableCents(paid);
  let amountCents: number;
  let feeKeys: string[] = [];
  if ("feeKeys" in request) {
    const plan = planLineRefund(paid, request.feeKeys);
    if (!plan.ok) throw new AppError("CONFLICT", plan.message, { feeKeys: [plan.message] });
    amountCents = plan.amountCents;
    feeKeys = plan.lines.map((l) => l.feeKey);
  } else {
    amountCents = request.amountCents;
    if (!Number.isInteger(amountCents) || amountCents <= 0 || amountCents > left) {
      throw new AppError("INVALID_INPUT", `Refund between $0.01 and ${formatUsd(left)}.`, { amount: [`At most ${formatUsd(left)}`] });
    }
  }
  const keysText = feeKeys.length ? JSON.stringify(feeKeys) : "";
  const refund = await stripe()
    .refunds.create(
      {
        payment_intent: payment.paymentIntentId!,
        amount: amountCents,
        reason: "requested_by_customer",
        metadata: { paymentId: payment.id, note: reason.slice(0, 450), ...(keysText && keysText.length <= METADATA_VALUE_MAX ? { feeKeys: keysText } : {}) },
      },
      { idempotencyKey: `refund-${payment.id}-${payment.refundedCents}-${amountCents}${keysText ? `-${createHash("sha256").update(keysText).digest("hex").slice(0, 16)}` : ""}` },
    )
    .catch((error: unknown) => {
      throw refusalOf(error);
    });
  if (refund.status === "failed" || refund.status === "canceled") {
    throw new AppError("CONFLICT", `The payment service could not return the money${refund.failure_reason ? ` (${refund.failure_reason.replace(/_/g, " ")})` : ""}. Nothing was refunded.`);
  }
  await sequelize.transaction(async (transaction) => {
    const { attributed } = await recordRefund(payment.id, refund, { reason, createdById: viewer.id, feeKeys }, transaction);
    if (!attributed) return;
    const what = feeKeys.length ? `${formatUsd(amountCents)} for ${payment.lines!.filter((l) => feeKeys.includes(l.feeKey)).map((l) => l.name).join(", ")}` : formatUsd(amountCents);
    await recordAudit({ viewer, action: "payment.refunded", entityType: "project", entityId: payment.projectId, changes: { refund: { before: null, after: `${what}: ${reason}` } } }, { transaction });
    const payer = payment.createdById ? await User.findByPk(payment.createdById, { transaction }) : null;
    const project = await Project.findByPk(payment.projectId, { transaction });
    const after = await Payment.findByPk(payment.id, { transaction });
    if (payer?.email && project && after) {
      const mail = refundEmail({ receiptNumber: payment.receiptNumber, projectNumber: project.number, siteAddress: `${project.street}, ${project.city}, ${project.state} ${project.postalCode}`, refunded: formatUsd(amountCents), remaining: formatUsd(after.amountCents - after.refundedCents), reason });
      await enqueueMail({ to: payer.email, ...mail, organizationId: payment.organizationId }, { transaction });
    }
  });
  return toPaymentDto((await Payment.findByPk(payment.id, { include: PAYMENT_INCLUDE }))!);
}

const refundStatusOf = (status: string | null): RefundStatus => (status === "failed" || status === "canceled" ? "failed" : status === "succeeded" ? "succeeded" : "pending");

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
  const [row, created] = await Refund.findOrCreate({ where: { processorRefundId: refund.id }, defaults: { paymentId, processorRefundId: refund.id, amountCents: refund.amount, reason: extra.reason, createdById: extra.createdById, status, feeKeys }, transaction });
  const changes: Partial<Refund> = {};
  if (!created && row.status !== "failed" && status !== row.status && (status === "failed" || row.status === "pending")) changes.status = status;
  const attributed = Boolean(extra.createdById) && (created || !row.createdById);
  // The webhook may have recorded it first; the admin's own call then adds who asked, why and for which fees.
  if (!created && attributed) Object.assign(changes, { reason: extra.reason, createdById: extra.createdById, ...(feeKeys.length ? { feeKeys } : {}) });
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

/** Pending payments older than `olderThanMs` whose webhook never came: asks the processor and applies what it says. */
export async function reconcilePendingPayments({ olderThanMs = 60_000 }: { olderThanMs?: number } = {}): Promise<number> {
  db();
  const pending = await Payment.findAll({ where: { status: "pending", checkoutSessionId: { [Op.ne]: null }, updatedAt: { [Op.lt]: new Date(Date.now() - olderThanMs) } }, limit: 50 });
  let changed = 0;
  for (const payment of pending) {
    const session = await stripe().checkout.sessions.retrieve(payment.checkoutSessionId!, { expand: ["payment_intent.latest_charge"] });
    if (await applySessionState(session)) {
      changed++;
    } else {
      // Still open at the processor: look again after the next interval, not on every pass.
      payment.changed("updatedAt", true);
      await payment.save();
    }
  }
  return changed;
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

import "server-only";
import { createHash } from "node:crypto";
import { can, type Viewer } from "@/lib/domain/permissions";
import { AppError } from "@/lib/errors";
import { formatUsd, planLineRefund, refundableCents } from "@/lib/fees";
import type { PaymentDto } from "@/lib/dto/fees";
import { refundEmail } from "@/templates/email/payment-receipt";
import { db } from "../db";
import { env } from "../env";
import { recordAudit } from "../data/audit";
import { enqueueMail } from "../data/outbox";
import { applySessionState } from "../data/payment-events";
import {
  createPendingPayment,
  expirePayment,
  getPaymentDto,
  getPaymentRefs,
  getRefundablePayment,
  getRefundMailFacts,
  listStalePendingPayments,
  setCheckoutSession,
  touchPayment,
  type PaymentRef,
} from "../data/payments";
import { designSizes, feesForProject } from "../data/project-fees";
import { getProjectById } from "../data/projects";
import { recordRefund } from "../data/refunds";
import { stripe } from "../services/payments";

/** Ends an unfinished checkout that holds some of the same lines, so one fee is never being paid twice. */
async function releasePending(payment: PaymentRef) {
  if (!payment.checkoutSessionId) {
    await expirePayment(payment.id);
    return;
  }
  const session = await stripe().checkout.sessions.retrieve(payment.checkoutSessionId);
  const settled = session.status === "open" ? await stripe().checkout.sessions.expire(session.id) : session;
  await applySessionState(settled);
}

/**
 * Starts paying the chosen unpaid lines. The amount is worked out here, from the schedules and the
 * design, in integer cents; the browser only names the lines. The project is read and its design
 * reviewed once; after unfinished checkouts are ended, only the payments are read again. Returns the
 * hosted checkout page.
 */
export async function startPayment({
  viewer,
  projectId,
  feeKeys,
}: {
  viewer: Viewer;
  projectId: string;
  feeKeys: string[];
}): Promise<{ paymentId: string; checkoutUrl: string }> {
  const project = await getProjectById({ viewer, projectId });
  if (!can(viewer, "fees:pay")) throw new AppError("FORBIDDEN", "Your role cannot pay fees.");
  const sizes = await designSizes({ viewer, project });
  let fees = await feesForProject({ viewer, project, sizes });
  const stale = fees.payments.filter(
    (p) => p.status === "pending" && fees.lines.some((l) => feeKeys.includes(l.feeKey) && l.paymentId === p.id),
  );
  if (stale.length) {
    for (const p of await getPaymentRefs({ viewer, paymentIds: stale.map((s) => s.id) })) await releasePending(p);
    fees = await feesForProject({ viewer, project, sizes });
  }
  const chosen = fees.lines.filter((l) => feeKeys.includes(l.feeKey));
  if (chosen.length !== new Set(feeKeys).size)
    throw new AppError("CONFLICT", "Some of the chosen fees no longer apply to this project. Reload the page.");
  const blocked = chosen.find((l) => !l.payable);
  if (blocked)
    throw new AppError(
      "CONFLICT",
      blocked.state === "paid"
        ? `${blocked.name} is already paid.`
        : blocked.problem
          ? `${blocked.name}: ${blocked.problem}`
          : `${blocked.name} has nothing to pay.`,
    );
  const amountCents = chosen.reduce((sum, l) => sum + l.amountCents, 0);

  const payment = await createPendingPayment({ viewer, projectId, lines: chosen, amountCents });

  const base = `${env().APP_URL}/projects/${projectId}/fees`;
  try {
    const session = await stripe().checkout.sessions.create(
      {
        mode: "payment",
        line_items: chosen.map((l) => ({
          quantity: 1,
          price_data: { currency: "usd", unit_amount: l.amountCents, product_data: { name: `${l.authority}: ${l.name}` } },
        })),
        success_url: `${base}?checkout=done`,
        cancel_url: `${base}?checkout=cancelled`,
        client_reference_id: payment.id,
        customer_email: viewer.email,
        metadata: { paymentId: payment.id, projectId, projectNumber: String(project.number) },
        payment_intent_data: { metadata: { paymentId: payment.id, projectId }, description: `Project ${project.number} fees` },
      },
      { idempotencyKey: `checkout-${payment.id}` },
    );
    await setCheckoutSession(payment.id, session.id);
    return { paymentId: payment.id, checkoutUrl: session.url! };
  } catch (error) {
    await expirePayment(payment.id, "The payment page could not be opened.");
    console.error("checkout session", error);
    throw new AppError("CONFLICT", "The payment service did not answer. Nothing was charged; try again in a minute.");
  }
}

/** The processor's refusal, in its own words, for the admin to read. */
function refusalOf(error: unknown): AppError {
  const message = error instanceof Error && error.message ? error.message : "no reason given";
  const declined =
    typeof error === "object" &&
    error !== null &&
    "type" in error &&
    String((error as { type: unknown }).type).startsWith("Stripe") &&
    (error as { type: string }).type !== "StripeConnectionError";
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
 * records it audits it and e-mails the payer, in the transaction that records it.
 */
export async function refundPayment({
  viewer,
  paymentId,
  reason,
  ...request
}: { viewer: Viewer; paymentId: string; reason: string } & RefundRequest): Promise<PaymentDto> {
  if (!can(viewer, "fees:refund")) throw new AppError("FORBIDDEN", "Only an admin can refund.");
  const payment = await getRefundablePayment({ viewer, paymentId });
  const left = refundableCents(payment.paid);
  let amountCents: number;
  let feeKeys: string[] = [];
  if ("feeKeys" in request) {
    const plan = planLineRefund(payment.paid, request.feeKeys);
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
        metadata: {
          paymentId: payment.id,
          note: reason.slice(0, 450),
          ...(keysText && keysText.length <= METADATA_VALUE_MAX ? { feeKeys: keysText } : {}),
        },
      },
      {
        idempotencyKey: `refund-${payment.id}-${payment.refundedCents}-${amountCents}${keysText ? `-${createHash("sha256").update(keysText).digest("hex").slice(0, 16)}` : ""}`,
      },
    )
    .catch((error: unknown) => {
      throw refusalOf(error);
    });
  if (refund.status === "failed" || refund.status === "canceled") {
    throw new AppError(
      "CONFLICT",
      `The payment service could not return the money${refund.failure_reason ? ` (${refund.failure_reason.replace(/_/g, " ")})` : ""}. Nothing was refunded.`,
    );
  }
  await db().transaction(async (transaction) => {
    const { attributed } = await recordRefund(payment.id, refund, { reason, createdById: viewer.id, feeKeys }, transaction);
    if (!attributed) return;
    const what = feeKeys.length
      ? `${formatUsd(amountCents)} for ${payment.lines
          .filter((l) => feeKeys.includes(l.feeKey))
          .map((l) => l.name)
          .join(", ")}`
      : formatUsd(amountCents);
    await recordAudit(
      {
        viewer,
        action: "payment.refunded",
        entityType: "project",
        entityId: payment.projectId,
        changes: { refund: { before: null, after: `${what}: ${reason}` } },
      },
      { transaction },
    );
    const facts = await getRefundMailFacts(payment.id, transaction);
    if (facts) {
      const mail = refundEmail({
        receiptNumber: facts.receiptNumber,
        projectNumber: facts.projectNumber,
        siteAddress: facts.siteAddress,
        refunded: formatUsd(amountCents),
        remaining: formatUsd(facts.remainingCents),
        reason,
      });
      await enqueueMail({ to: facts.to, ...mail, organizationId: facts.organizationId }, { transaction });
    }
  });
  return getPaymentDto(payment.id);
}

/** Pending payments older than `olderThanMs` whose webhook never came: asks the processor and applies what it says. */
export async function reconcilePendingPayments({ olderThanMs = 60_000 }: { olderThanMs?: number } = {}): Promise<number> {
  let changed = 0;
  for (const payment of await listStalePendingPayments({ olderThanMs })) {
    const session = await stripe().checkout.sessions.retrieve(payment.checkoutSessionId!, { expand: ["payment_intent.latest_charge"] });
    if (await applySessionState(session)) {
      changed++;
    } else {
      // Still open at the processor: look again after the next interval, not on every pass.
      await touchPayment(payment.id);
    }
  }
  return changed;
}

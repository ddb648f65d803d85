import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FAKE_TEST_CARDS } from "../../../payments-fake/server.mjs";
import { PERMIT_FEE_TOTAL, payWith, permitFeeSession, startHarness, type Harness } from "./support";

let h: Harness;
beforeAll(async () => {
  h = await startHarness({ webhooks: true });
});
afterAll(() => h.close());

async function paidIntent() {
  const session = await permitFeeSession(h.stripe);
  const { body } = await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.succeeds);
  const intent = body.payment_intent;
  return { intentId: intent.id, chargeId: (intent.latest_charge as Stripe.Charge).id };
}

describe("refunds", () => {
  it("refunds the whole remaining amount by default and marks the charge refunded", async () => {
    const { intentId, chargeId } = await paidIntent();
    const refund = await h.stripe.refunds.create({
      payment_intent: intentId,
      reason: "requested_by_customer",
      metadata: { ticket: "QM-118" },
    });
    expect(refund).toMatchObject({
      object: "refund",
      status: "succeeded",
      amount: PERMIT_FEE_TOTAL,
      currency: "usd",
      charge: chargeId,
      payment_intent: intentId,
      reason: "requested_by_customer",
      metadata: { ticket: "QM-118" },
    });
    expect(refund.id).toMatch(/^re_/);
    expect(await h.stripe.refunds.retrieve(refund.id)).toEqual(refund);

    const charge = await h.stripe.charges.retrieve(chargeId);
    expect(charge).toMatchObject({ amount_refunded: PERMIT_FEE_TOTAL, refunded: true });

    await h.receiver!.waitFor(() => h.receiver!.types().includes("refund.created"), "refund.created");
    await h.receiver!.waitFor(
      () =>
        h.receiver!.deliveries.some((d) => d.event.type === "charge.refunded" && (d.event.data.object as Stripe.Charge).id === chargeId),
      "charge.refunded",
    );
    const refunded = h.receiver!.deliveries.find(
      (d) => d.event.type === "charge.refunded" && (d.event.data.object as Stripe.Charge).id === chargeId,
    )!;
    expect(refunded.event.data.object).toMatchObject({ refunded: true, amount_refunded: PERMIT_FEE_TOTAL });
    expect(refunded.event.data.previous_attributes).toEqual({ amount_refunded: 0, refunded: false });
    // Events caused by an API call name that call.
    expect(refunded.event.request?.id).toMatch(/^req_/);
  });

  it("refunds in parts, by charge or by payment intent, and refuses more than what remains", async () => {
    const { intentId, chargeId } = await paidIntent();
    const first = await h.stripe.refunds.create({ payment_intent: intentId, amount: 5_000 });
    expect(first.amount).toBe(5_000);
    expect(await h.stripe.charges.retrieve(chargeId)).toMatchObject({ amount_refunded: 5_000, refunded: false });

    const tooMuch = (await h.stripe.refunds
      .create({ charge: chargeId, amount: PERMIT_FEE_TOTAL })
      .catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(tooMuch).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(tooMuch.statusCode).toBe(400);
    expect(tooMuch.param).toBe("amount");
    expect(tooMuch.code).toBe("amount_too_large");

    const rest = await h.stripe.refunds.create({ charge: chargeId });
    expect(rest.amount).toBe(PERMIT_FEE_TOTAL - 5_000);
    expect(await h.stripe.charges.retrieve(chargeId)).toMatchObject({ amount_refunded: PERMIT_FEE_TOTAL, refunded: true });

    const nothingLeft = (await h.stripe.refunds
      .create({ payment_intent: intentId, amount: 1 })
      .catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(nothingLeft.statusCode).toBe(400);
    expect(nothingLeft.code).toBe("charge_already_refunded");
  });

  it("refuses refunds of unpaid or unknown payments and bad reasons", async () => {
    const session = await permitFeeSession(h.stripe);
    const { body } = await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.declined);
    const unpaid = (await h.stripe.refunds
      .create({ payment_intent: body.payment_intent.id })
      .catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(unpaid.statusCode).toBe(400);
    expect(unpaid.param).toBe("payment_intent");

    const unknown = (await h.stripe.refunds.create({ payment_intent: "pi_unknown" }).catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(unknown.statusCode).toBe(404);

    const { intentId } = await paidIntent();
    const reason = (await h.stripe.refunds
      .create({ payment_intent: intentId, reason: "changed_mind" as Stripe.RefundCreateParams.Reason })
      .catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(reason.param).toBe("reason");

    const neither = (await h.stripe.refunds.create({}).catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(neither.statusCode).toBe(400);
  });
});

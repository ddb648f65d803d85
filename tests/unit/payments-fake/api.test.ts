import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FAKE_STRIPE_SECRET_KEY, startPaymentsFake } from "../../../payments-fake/server.mjs";
import { PERMIT_FEE_TOTAL, clientFor, permitFeeSession, startHarness, type Harness } from "./support";

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h.close());

describe("checkout sessions", () => {
  it("creates an open session in the documented shape", async () => {
    const before = Math.floor(Date.now() / 1000);
    const session = await permitFeeSession(h.stripe);
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]{20,}$/);
    expect(session).toMatchObject({
      object: "checkout.session",
      mode: "payment",
      status: "open",
      payment_status: "unpaid",
      amount_total: PERMIT_FEE_TOTAL,
      amount_subtotal: PERMIT_FEE_TOTAL,
      currency: "usd",
      livemode: false,
      payment_intent: null,
      client_reference_id: "project-fernhollow-7",
      customer_email: "ines.marlowe@bramblecourt.example",
      metadata: { projectId: "fernhollow-7", purpose: "permit-fee" },
      success_url: "http://127.0.0.1:3999/projects/fernhollow-7/payment?session={CHECKOUT_SESSION_ID}",
      cancel_url: "http://127.0.0.1:3999/projects/fernhollow-7",
      payment_method_types: ["card"],
    });
    expect(session.url).toBe(`${h.fake.url}/pay/${session.id}`);
    expect(session.created).toBeGreaterThanOrEqual(before);
    expect(session.expires_at - session.created).toBe(24 * 60 * 60);
  });

  it("retrieves the session, and expands its payment intent and line items on request", async () => {
    const created = await permitFeeSession(h.stripe);
    const fetched = await h.stripe.checkout.sessions.retrieve(created.id);
    expect(fetched).toEqual(created);

    const expanded = await h.stripe.checkout.sessions.retrieve(created.id, { expand: ["line_items"] });
    expect(expanded.line_items?.data.map((item) => [item.description, item.quantity, item.amount_total])).toEqual([
      ["Permit packet preparation", 1, 18_500],
      ["Utility interconnection filing", 2, 4_500],
    ]);
    expect(expanded.line_items?.data[0].price).toMatchObject({ object: "price", unit_amount: 18_500, currency: "usd", type: "one_time" });

    const listed = await h.stripe.checkout.sessions.listLineItems(created.id);
    expect(listed.data).toHaveLength(2);
  });

  it("reads `expand[]` written with empty brackets too", async () => {
    const session = await permitFeeSession(h.stripe);
    const response = await fetch(`${h.fake.url}/v1/checkout/sessions/${session.id}?expand[]=payment_intent&expand[]=line_items`, {
      headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}` },
    });
    const body = await response.json();
    expect(response.status).toBe(200);
    expect(body.payment_intent).toBeNull();
    expect(body.line_items.object).toBe("list");
  });

  it("rejects bad input with a 400 that names the parameter", async () => {
    const cases: [Partial<Stripe.Checkout.SessionCreateParams>, string][] = [
      [{ mode: "subscription" }, "mode"],
      [{ line_items: [] }, "line_items"],
      [
        { line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: -5, product_data: { name: "x" } } }] },
        "line_items[0][price_data][unit_amount]",
      ],
      [
        { line_items: [{ quantity: 0, price_data: { currency: "usd", unit_amount: 500, product_data: { name: "x" } } }] },
        "line_items[0][quantity]",
      ],
      [
        { line_items: [{ quantity: 1, price_data: { currency: "eur", unit_amount: 500, product_data: { name: "x" } } }] },
        "line_items[0][price_data][currency]",
      ],
      [
        { line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: 500, product_data: { name: "" } } }] },
        "line_items[0][price_data][product_data][name]",
      ],
      [{ line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: 20, product_data: { name: "Tiny" } } }] }, "line_items"],
      [{ success_url: "not a url" }, "success_url"],
      [{ customer_email: "nobody" }, "customer_email"],
      [{ expires_at: Math.floor(Date.now() / 1000) + 60 }, "expires_at"],
      [{ metadata: { ["k".repeat(41)]: "v" } }, `metadata[${"k".repeat(41)}]`],
    ];
    for (const [extra, param] of cases) {
      const error = await permitFeeSession(h.stripe, extra).catch((e: unknown) => e);
      expect(error, param).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      const stripeError = error as Stripe.errors.StripeInvalidRequestError;
      expect(stripeError.statusCode, param).toBe(400);
      expect(stripeError.param, param).toBe(param);
      expect(stripeError.message, param).toContain(param.split("[")[0]);
    }
  });

  it("keeps numbered metadata keys as keys, not as a list", async () => {
    const session = await permitFeeSession(h.stripe, { metadata: { "7": "seven", phase: "2" } });
    expect(session.metadata).toEqual({ "7": "seven", phase: "2" });
  });

  it("names a parameter it does not know", async () => {
    const error = (await permitFeeSession(h.stripe, { allow_promotion_codes: true }).catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(error.statusCode).toBe(400);
    expect(error.param).toBe("allow_promotion_codes");
  });

  it("accepts an explicit expiry within the allowed window", async () => {
    const expiresAt = Math.floor(Date.now() / 1000) + 2 * 60 * 60;
    const session = await permitFeeSession(h.stripe, { expires_at: expiresAt });
    expect(session.expires_at).toBe(expiresAt);
  });

  it("expires an open session once, then refuses", async () => {
    const session = await permitFeeSession(h.stripe);
    const expired = await h.stripe.checkout.sessions.expire(session.id);
    expect(expired).toMatchObject({ id: session.id, status: "expired", payment_status: "unpaid", url: null });
    const again = (await h.stripe.checkout.sessions.expire(session.id).catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(again).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(again.statusCode).toBe(400);
  });

  it("answers an unknown id with a 404 resource_missing error", async () => {
    const error = (await h.stripe.checkout.sessions.retrieve("cs_test_nothing_here").catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error.statusCode).toBe(404);
    expect(error.code).toBe("resource_missing");
    const intent = (await h.stripe.paymentIntents.retrieve("pi_missing").catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(intent.statusCode).toBe(404);
  });
});

describe("authentication", () => {
  it("refuses a wrong key with 401 and the SDK's authentication error", async () => {
    const wrong = clientFor(h.fake.url, "sk_test_somebody_elses_key");
    const error = (await permitFeeSession(wrong).catch((e: unknown) => e)) as Stripe.errors.StripeError;
    expect(error).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    expect(error.statusCode).toBe(401);
    expect(error.message).not.toContain("sk_test_somebody_elses_key");
  });

  it("refuses a request without a key in the API's error shape", async () => {
    const response = await fetch(`${h.fake.url}/v1/checkout/sessions/cs_test_x`);
    expect(response.status).toBe(401);
    const body = await response.json();
    expect(body).toEqual({ error: { type: "invalid_request_error", message: expect.any(String) } });
  });

  it("accepts the key as a basic-auth user name, as curl sends it", async () => {
    const response = await fetch(`${h.fake.url}/v1/checkout/sessions/cs_test_missing`, {
      headers: { authorization: `Basic ${Buffer.from(`${FAKE_STRIPE_SECRET_KEY}:`).toString("base64")}` },
    });
    expect(response.status).toBe(404);
  });

  it("uses a custom key when started with one", async () => {
    const fake = await startPaymentsFake({ port: 0, apiKey: "sk_test_quillmoor_custom" });
    try {
      await expect(permitFeeSession(clientFor(fake.url, "sk_test_quillmoor_custom"))).resolves.toMatchObject({ status: "open" });
      await expect(permitFeeSession(clientFor(fake.url))).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    } finally {
      await fake.stop();
    }
  });
});

describe("idempotency keys", () => {
  it("returns the stored response for a repeated key on the same route", async () => {
    const params = {
      mode: "payment" as const,
      line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: 9_900, product_data: { name: "Site survey" } } }],
      success_url: "http://127.0.0.1:3999/done",
    };
    const a = await h.stripe.checkout.sessions.create(params, { idempotencyKey: "quillmoor-survey-41" });
    const b = await h.stripe.checkout.sessions.create(params, { idempotencyKey: "quillmoor-survey-41" });
    expect(b.id).toBe(a.id);
    expect(b.lastResponse.headers["idempotent-replayed"]).toBe("true");
    const c = await h.stripe.checkout.sessions.create(params, { idempotencyKey: "quillmoor-survey-42" });
    expect(c.id).not.toBe(a.id);
  });

  it("refuses the same key with different parameters", async () => {
    const params = {
      mode: "payment" as const,
      line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: 9_900, product_data: { name: "Site survey" } } }],
      success_url: "http://127.0.0.1:3999/done",
    };
    await h.stripe.checkout.sessions.create(params, { idempotencyKey: "quillmoor-survey-77" });
    const error = await h.stripe.checkout.sessions
      .create({ ...params, client_reference_id: "other" }, { idempotencyKey: "quillmoor-survey-77" })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
  });
});

describe("routing", () => {
  it("answers unknown routes with a 404 in the API's error shape", async () => {
    const response = await fetch(`${h.fake.url}/v1/customers`, { headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}` } });
    expect(response.status).toBe(404);
    const body = await response.json();
    expect(body.error.type).toBe("invalid_request_error");
    expect(body.error.message).toContain("/v1/customers");
  });

  it("refuses JSON bodies on the API", async () => {
    const response = await fetch(`${h.fake.url}/v1/checkout/sessions`, {
      method: "POST",
      headers: { authorization: `Bearer ${FAKE_STRIPE_SECRET_KEY}`, "content-type": "application/json" },
      body: JSON.stringify({ mode: "payment" }),
    });
    expect(response.status).toBe(400);
  });

  it("listens on the port it reports", async () => {
    expect(h.fake.url).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(new URL(h.fake.url).port).not.toBe("0");
    const response = await fetch(`${h.fake.url}/`);
    expect(response.status).toBe(200);
  });
});

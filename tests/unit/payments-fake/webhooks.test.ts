import Stripe from "stripe";
import { afterEach, describe, expect, it, vi } from "vitest";
import { FAKE_STRIPE_WEBHOOK_SECRET, FAKE_TEST_CARDS } from "../../../payments-fake/server.mjs";
import { fakeEvents, payWith, permitFeeSession, setWebhooks, sleep, startHarness, startReceiver, waitFor, type Harness } from "./support";

const verifier = new Stripe("sk_test_signature_checks_only");
let h: Harness;
afterEach(async () => {
  await h?.close();
  vi.restoreAllMocks();
});

describe("webhook signatures", () => {
  it("sign every delivery so constructEvent accepts it, and reject a tampered payload", async () => {
    h = await startHarness({ webhooks: true });
    const session = await permitFeeSession(h.stripe);
    await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.succeeds);
    await h.receiver!.waitFor(() => h.receiver!.deliveries.length >= 4, "four deliveries");
    expect(h.receiver!.rejected).toEqual([]);

    const { raw, signature, event } = h.receiver!.deliveries[0];
    expect(signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    expect(event).toMatchObject({ object: "event", livemode: false, pending_webhooks: 1 });
    expect(event.api_version).toEqual(expect.any(String)); // the SDK's Stripe-Version header of the creating call

    const tampered = raw.replace('"livemode":false', '"livemode":true');
    expect(tampered).not.toBe(raw);
    expect(() => verifier.webhooks.constructEvent(tampered, signature, FAKE_STRIPE_WEBHOOK_SECRET)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() => verifier.webhooks.constructEvent(raw, signature, "whsec_a_different_secret")).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
  });

  it("use the configured secret", async () => {
    const receiver = await startReceiver("whsec_harrowgate_custom");
    h = await startHarness({ webhookUrl: receiver.url, webhookSecret: "whsec_harrowgate_custom" });
    try {
      const session = await permitFeeSession(h.stripe);
      await h.stripe.checkout.sessions.expire(session.id);
      await receiver.waitFor(() => receiver.types().includes("checkout.session.expired"), "expired event");
      expect(receiver.rejected).toEqual([]);
      const expired = receiver.deliveries[0].event;
      expect(expired.request?.id).toMatch(/^req_/);
      expect(expired.request?.idempotency_key).toEqual(expect.any(String));
    } finally {
      await receiver.close();
    }
  });
});

describe("webhook delivery", () => {
  it("retries after the endpoint answers 500", async () => {
    h = await startHarness({ webhooks: true });
    h.receiver!.answerNext(500);
    const session = await permitFeeSession(h.stripe);
    const started = Date.now();
    await h.stripe.checkout.sessions.expire(session.id);
    expect(Date.now() - started).toBeLessThan(400); // the API answer does not wait on delivery

    await h.receiver!.waitFor(() => h.receiver!.deliveries.length === 1, "the retried delivery");
    expect(h.receiver!.attempts).toEqual([
      { type: "checkout.session.expired", status: 500 },
      { type: "checkout.session.expired", status: 200 },
    ]);
    const [entry] = await fakeEvents(h.fake.url, "checkout.session.expired");
    expect(entry.delivery.status).toBe("delivered");
    expect(entry.delivery.attempts).toHaveLength(2);
  });

  it("retries when the endpoint refuses the connection", async () => {
    h = await startHarness({ webhooks: true });
    const gone = await startReceiver();
    await gone.close();
    await setWebhooks(h.fake.url, { url: gone.url });
    const session = await permitFeeSession(h.stripe);
    await h.stripe.checkout.sessions.expire(session.id);
    await sleep(150);
    const [pending] = await fakeEvents(h.fake.url, "checkout.session.expired");
    expect(pending.delivery.status).toBe("pending");
    expect(pending.delivery.attempts).toEqual([expect.objectContaining({ error: "ECONNREFUSED" })]);

    await setWebhooks(h.fake.url, { url: h.receiver!.url });
    await h.receiver!.waitFor(() => h.receiver!.deliveries.length === 1, "delivery once the endpoint is up");
  });

  it("gives up after the last try and keeps the event marked failed", async () => {
    vi.spyOn(console, "warn").mockImplementation(() => undefined);
    h = await startHarness({ webhooks: true, webhookRetryDelaysMs: [20, 20] });
    h.receiver!.answerNext(500, 502, 503);
    const session = await permitFeeSession(h.stripe);
    await h.stripe.checkout.sessions.expire(session.id);
    await waitFor(() => h.receiver!.attempts.length === 3, "three tries");
    await sleep(100);
    expect(h.receiver!.attempts).toHaveLength(3);
    const [entry] = await fakeEvents(h.fake.url, "checkout.session.expired");
    expect(entry.delivery.status).toBe("failed");
    expect(console.warn).toHaveBeenCalledOnce();
  });

  it("holds deliveries while paused and sends them, in order, when unpaused", async () => {
    h = await startHarness({ webhooks: true });
    expect(await setWebhooks(h.fake.url, { paused: true })).toMatchObject({ paused: true });
    const session = await permitFeeSession(h.stripe);
    const declined = await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.declined);
    const paid = await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.succeeds);
    expect(paid.body.outcome).toBe("succeeded");
    await sleep(300);
    expect(h.receiver!.deliveries).toEqual([]);
    const held = await fakeEvents(h.fake.url);
    expect(held.map((e) => e.delivery.status)).toEqual(held.map(() => "pending"));
    expect(held.map((e) => e.event.type)).toEqual([
      "payment_intent.created",
      "charge.failed",
      "payment_intent.payment_failed",
      "payment_intent.succeeded",
      "charge.succeeded",
      "checkout.session.completed",
    ]);

    await setWebhooks(h.fake.url, { paused: false });
    await h.receiver!.waitFor(() => h.receiver!.deliveries.length === held.length, "all held deliveries");
    const intentId = declined.body.payment_intent.id;
    const intentTypes = h
      .receiver!.deliveries.filter((d) => (d.event.data.object as { id: string }).id === intentId)
      .map((d) => d.event.type);
    expect(intentTypes).toEqual(["payment_intent.created", "payment_intent.payment_failed", "payment_intent.succeeded"]);
  });

  it("resends a stored event byte for byte", async () => {
    h = await startHarness({ webhooks: true });
    const session = await permitFeeSession(h.stripe);
    await h.stripe.checkout.sessions.expire(session.id);
    await h.receiver!.waitFor(() => h.receiver!.deliveries.length === 1, "first delivery");
    const original = h.receiver!.deliveries[0];

    const response = await fetch(`${h.fake.url}/_fake/events/${original.event.id}/resend`, { method: "POST" });
    expect(response.status).toBe(202);
    await h.receiver!.waitFor(() => h.receiver!.deliveries.length === 2, "the resent delivery");
    expect(h.receiver!.deliveries[1].raw).toBe(original.raw);

    const missing = await fetch(`${h.fake.url}/_fake/events/evt_nope/resend`, { method: "POST" });
    expect(missing.status).toBe(404);
  });

  it("keeps events without delivering them when no webhook URL is set", async () => {
    h = await startHarness();
    const session = await permitFeeSession(h.stripe);
    await h.stripe.checkout.sessions.expire(session.id);
    const [entry] = await fakeEvents(h.fake.url);
    expect(entry.event).toMatchObject({ type: "checkout.session.expired", pending_webhooks: 0 });
    expect(entry.delivery.status).toBe("no_endpoint");
    const fetched = await h.stripe.events.retrieve(entry.event.id);
    expect(fetched.id).toBe(entry.event.id);
  });
});

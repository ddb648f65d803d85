import type Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { FAKE_TEST_CARDS } from "../../../payments-fake/server.mjs";
import { PERMIT_FEE_TOTAL, payWith, permitFeeSession, startHarness, type Harness } from "./support";

let h: Harness;
beforeAll(async () => {
  h = await startHarness({ webhooks: true });
});
afterAll(() => h.close());

function eventsFor(objectIds: string[]) {
  return h.receiver!.deliveries.filter((d) => objectIds.includes((d.event.data.object as { id: string }).id)).map((d) => d.event);
}

async function postForm(path: string, fields: Record<string, string>) {
  return fetch(`${h.fake.url}${path}`, {
    method: "POST",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams(fields).toString(),
    redirect: "manual",
  });
}

describe("the succeeding test card", () => {
  it("pays the session, creates the payment intent and charge, and sends three events", async () => {
    const session = await permitFeeSession(h.stripe);
    const { status, body } = await payWith(h.fake.url, session.id, "4242 4242 4242 4242");
    expect(status).toBe(200);
    expect(body.outcome).toBe("succeeded");

    const paid = await h.stripe.checkout.sessions.retrieve(session.id, { expand: ["payment_intent.latest_charge"] });
    expect(paid).toMatchObject({ status: "complete", payment_status: "paid", url: null });
    const intent = paid.payment_intent as Stripe.PaymentIntent;
    expect(intent).toMatchObject({
      object: "payment_intent",
      status: "succeeded",
      amount: PERMIT_FEE_TOTAL,
      amount_received: PERMIT_FEE_TOTAL,
      currency: "usd",
      last_payment_error: null,
      metadata: { projectId: "fernhollow-7" },
      livemode: false,
    });
    expect(intent.id).toMatch(/^pi_/);
    const charge = intent.latest_charge as Stripe.Charge;
    expect(charge).toMatchObject({
      object: "charge",
      status: "succeeded",
      paid: true,
      amount: PERMIT_FEE_TOTAL,
      amount_refunded: 0,
      refunded: false,
      payment_intent: intent.id,
    });
    expect(charge.id).toMatch(/^ch_/);
    expect(charge.payment_method_details?.card?.last4).toBe("4242");

    await h.receiver!.waitFor(
      () => eventsFor([session.id]).some((e) => e.type === "checkout.session.completed"),
      "checkout.session.completed",
    );
    await h.receiver!.waitFor(() => eventsFor([charge.id]).length === 1, "charge.succeeded");
    // Order is kept per object only, so the intent's event may come after the others.
    await h.receiver!.waitFor(() => eventsFor([intent.id]).some((e) => e.type === "payment_intent.succeeded"), "payment_intent.succeeded");
    const types = eventsFor([session.id, intent.id, charge.id]).map((e) => e.type);
    expect(types).toEqual(expect.arrayContaining(["payment_intent.succeeded", "charge.succeeded", "checkout.session.completed"]));
    const completed = eventsFor([session.id]).find((e) => e.type === "checkout.session.completed")!;
    const completedSession = completed.data.object as Stripe.Checkout.Session;
    expect(completedSession).toMatchObject({
      payment_status: "paid",
      payment_intent: intent.id,
      metadata: { projectId: "fernhollow-7", purpose: "permit-fee" },
    });
    expect(completed).toMatchObject({ object: "event", livemode: false, request: { id: null, idempotency_key: null } });
    expect(completed.id).toMatch(/^evt_/);
  });

  it("refuses a second payment of a completed session", async () => {
    const session = await permitFeeSession(h.stripe);
    await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.succeeds);
    const again = await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.succeeds);
    expect(again.status).toBe(409);
    expect(again.body.error?.code).toBe("not_open");
  });
});

describe("the declined test card", () => {
  it("fails the payment intent, keeps the session open, and a later good card still pays", async () => {
    const session = await permitFeeSession(h.stripe);
    const declined = await payWith(h.fake.url, session.id, "4000000000000002");
    expect(declined.status).toBe(402);
    expect(declined.body.outcome).toBe("declined");
    expect(declined.body.payment_intent.status).toBe("requires_payment_method");
    expect(declined.body.payment_intent.last_payment_error).toMatchObject({
      type: "card_error",
      code: "card_declined",
      decline_code: "generic_decline",
      message: "Your card was declined.",
    });

    const still = await h.stripe.checkout.sessions.retrieve(session.id);
    expect(still).toMatchObject({ status: "open", payment_status: "unpaid", payment_intent: declined.body.payment_intent.id });
    expect(still.url).toBe(`${h.fake.url}/pay/${session.id}`);

    const intentId = declined.body.payment_intent.id;
    await h.receiver!.waitFor(() => eventsFor([intentId]).some((e) => e.type === "payment_intent.payment_failed"), "payment_failed");

    const paid = await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.succeeds);
    expect(paid.body.outcome).toBe("succeeded");
    expect(paid.body.payment_intent).toMatchObject({ id: intentId, status: "succeeded", last_payment_error: null });
    await h.receiver!.waitFor(() => eventsFor([intentId]).some((e) => e.type === "payment_intent.succeeded"), "succeeded");
    // Events about one object arrive in the order they happened.
    const intentTypes = eventsFor([intentId]).map((e) => e.type);
    expect(intentTypes.indexOf("payment_intent.payment_failed")).toBeLessThan(intentTypes.indexOf("payment_intent.succeeded"));
  });
});

describe("the authentication test card", () => {
  it("waits for authentication, then pays when it is completed", async () => {
    const session = await permitFeeSession(h.stripe);
    const first = await payWith(h.fake.url, session.id, "4000 0025 0000 3155");
    expect(first.body.outcome).toBe("requires_action");
    expect(first.body.payment_intent.status).toBe("requires_action");
    expect(first.body.payment_intent.next_action?.type).toBe("redirect_to_url");
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");

    const response = await fetch(`${h.fake.url}/_fake/checkout/sessions/${session.id}/authenticate`, {
      method: "POST",
      body: JSON.stringify({ result: "complete" }),
    });
    const done = await response.json();
    expect(response.status).toBe(200);
    expect(done.outcome).toBe("succeeded");
    expect(done.payment_intent.latest_charge.payment_method_details.card.three_d_secure.result).toBe("authenticated");
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe("paid");
  });

  it("fails the payment intent when authentication fails, leaving the session open", async () => {
    const session = await permitFeeSession(h.stripe);
    await payWith(h.fake.url, session.id, FAKE_TEST_CARDS.authentication);
    const response = await fetch(`${h.fake.url}/_fake/checkout/sessions/${session.id}/authenticate`, {
      method: "POST",
      body: JSON.stringify({ result: "fail" }),
    });
    const failed = await response.json();
    expect(response.status).toBe(402);
    expect(failed.payment_intent).toMatchObject({
      status: "requires_payment_method",
      last_payment_error: { code: "payment_intent_authentication_failure" },
    });
    const intentId = failed.payment_intent.id as string;
    await h.receiver!.waitFor(() => eventsFor([intentId]).some((e) => e.type === "payment_intent.payment_failed"), "payment_failed");
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");
  });
});

describe("other card numbers", () => {
  it("are refused without touching the session", async () => {
    const session = await permitFeeSession(h.stripe);
    const result = await payWith(h.fake.url, session.id, "4111 1111 1111 1111");
    expect(result.status).toBe(400);
    expect(result.body.error?.message).toContain("test cards");
    const unchanged = await h.stripe.checkout.sessions.retrieve(session.id);
    expect(unchanged).toMatchObject({ status: "open", payment_intent: null });
  });
});

describe("the hosted pay page", () => {
  it("shows an accessible form with the amount, the test cards and a way back", async () => {
    const session = await permitFeeSession(h.stripe);
    const response = await fetch(session.url!);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toContain("text/html");
    const html = await response.text();
    expect(html).toContain('<html lang="en">');
    expect(html).toMatch(/<label for="card_number">Card number<\/label>/);
    expect(html).toContain('id="card_number"');
    expect(html).toMatch(/<label for="expiry">/);
    expect(html).toMatch(/<label for="cvc">CVC<\/label>/);
    expect(html).toMatch(/<button type="submit">Pay \$230\.00<\/button>/);
    expect(html).toContain("Local test-mode payment page");
    for (const card of ["4242 4242 4242 4242", "4000 0000 0000 0002", "4000 0025 0000 3155"]) expect(html).toContain(card);
    expect(html).toContain('href="http://127.0.0.1:3999/projects/fernhollow-7"');
    expect(html).not.toContain('role="alert"');
  });

  it("redirects to the success URL with the session id filled in", async () => {
    const session = await permitFeeSession(h.stripe);
    const response = await postForm(`/pay/${session.id}`, { card_number: "4242424242424242", expiry: "12/39", cvc: "123" });
    expect(response.status).toBe(303);
    expect(response.headers.get("location")).toBe(`http://127.0.0.1:3999/projects/fernhollow-7/payment?session=${session.id}`);
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe("complete");

    const closed = await fetch(`${h.fake.url}/pay/${session.id}`);
    expect(await closed.text()).toContain("already complete");
  });

  it("shows the decline at the top as an alert and keeps the session open", async () => {
    const session = await permitFeeSession(h.stripe);
    const response = await postForm(`/pay/${session.id}`, { card_number: "4000 0000 0000 0002", expiry: "12/39", cvc: "123" });
    expect(response.status).toBe(402);
    const html = await response.text();
    expect(html).toMatch(/<div class="alert" role="alert"[^>]*>Your card was declined\.<\/div>/);
    expect(html.indexOf('role="alert"')).toBeLessThan(html.indexOf("<form"));
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");
  });

  it("asks for authentication and goes back to the form with the message when it fails", async () => {
    const session = await permitFeeSession(h.stripe);
    const submitted = await postForm(`/pay/${session.id}`, { card_number: "4000002500003155", expiry: "12/39", cvc: "123" });
    expect(submitted.status).toBe(303);
    expect(submitted.headers.get("location")).toBe(`/pay/${session.id}/authenticate`);

    const step = await fetch(`${h.fake.url}/pay/${session.id}/authenticate`);
    const stepHtml = await step.text();
    expect(stepHtml).toContain(">Complete authentication</button>");
    expect(stepHtml).toContain(">Fail authentication</button>");

    const failed = await postForm(`/pay/${session.id}/authenticate`, { result: "fail" });
    expect(failed.status).toBe(402);
    const failedHtml = await failed.text();
    expect(failedHtml).toContain('role="alert"');
    expect(failedHtml).toContain("not authenticated");
    expect(failedHtml).toContain('<label for="card_number">Card number</label>');

    const retried = await postForm(`/pay/${session.id}`, { card_number: "4000002500003155", expiry: "12/39", cvc: "123" });
    expect(retried.status).toBe(303);
    const completed = await postForm(`/pay/${session.id}/authenticate`, { result: "complete" });
    expect(completed.status).toBe(303);
    expect(completed.headers.get("location")).toContain(session.id);
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).payment_status).toBe("paid");
  });

  it("asks for a listed test card, a valid expiry and a CVC", async () => {
    const session = await permitFeeSession(h.stripe);
    const wrongCard = await postForm(`/pay/${session.id}`, { card_number: "5555 5555 5555 4444", expiry: "12/39", cvc: "123" });
    expect(wrongCard.status).toBe(400);
    expect(await wrongCard.text()).toContain("Use one of the test cards listed");
    const pastExpiry = await postForm(`/pay/${session.id}`, { card_number: "4242424242424242", expiry: "01/20", cvc: "123" });
    expect(pastExpiry.status).toBe(400);
    expect(await pastExpiry.text()).toMatch(/id="expiry"[^>]*aria-invalid="true"/);
    const noCvc = await postForm(`/pay/${session.id}`, { card_number: "4242424242424242", expiry: "12/39", cvc: "" });
    expect(noCvc.status).toBe(400);
    expect((await h.stripe.checkout.sessions.retrieve(session.id)).payment_intent).toBeNull();
  });

  it("shows a clear page for an expired session and for an unknown one", async () => {
    const session = await permitFeeSession(h.stripe);
    await h.stripe.checkout.sessions.expire(session.id);
    const expired = await fetch(`${h.fake.url}/pay/${session.id}`);
    expect(expired.status).toBe(410);
    expect(await expired.text()).toContain("This payment page has expired");
    const paying = await postForm(`/pay/${session.id}`, { card_number: "4242424242424242", expiry: "12/39", cvc: "123" });
    expect(paying.status).toBe(410);
    const unknown = await fetch(`${h.fake.url}/pay/cs_test_unknown`);
    expect(unknown.status).toBe(404);
  });

  it("escapes text that comes from the app", async () => {
    const session = await permitFeeSession(h.stripe, {
      line_items: [
        { quantity: 1, price_data: { currency: "usd", unit_amount: 5_000, product_data: { name: "<script>alert(1)</script>" } } },
      ],
    });
    const html = await (await fetch(session.url!)).text();
    expect(html).not.toContain("<script>alert(1)</script>");
    expect(html).toContain("&lt;script&gt;");
  });
});

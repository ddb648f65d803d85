// The payment rules of the fake: checkout sessions, payment attempts with the
// test cards, refunds. Objects are kept in the API's documented shapes so the
// app reads the same fields it will read from the real service. Every state
// change is saved and announced as an event before the caller answers.
import { createHash } from "node:crypto";
import { invalid, missing } from "./errors.mjs";
import { absoluteUrl, email, integer, isObject, metadata, oneOf, onlyKnown, text } from "./params.mjs";
import { newId, nowSeconds, randomToken } from "./store.mjs";

/** Card numbers the fake understands, and what each one does. */
export const TEST_CARDS = Object.freeze({
  succeeds: "4242424242424242",
  declined: "4000000000000002",
  authentication: "4000002500003155",
});
const CARD_BEHAVIOUR = new Map(Object.entries(TEST_CARDS).map(([behaviour, number]) => [number, behaviour]));

const CURRENCY = "usd";
const MIN_TOTAL = 50; // smallest USD charge the real API accepts, in cents
const MAX_AMOUNT = 99_999_999;
const MIN_LIFETIME = 30 * 60;
const MAX_LIFETIME = 24 * 60 * 60;
const REFUND_REASONS = ["duplicate", "fraudulent", "requested_by_customer"];

/** Why a payment attempt could not even start; the pay page and the JSON control word these themselves. */
export class PaymentAttemptError extends Error {
  /** @param {"not_found" | "not_open" | "unknown_card" | "not_awaiting_authentication"} reason */
  constructor(reason, message) {
    super(message);
    this.reason = reason;
  }
}

export const normaliseCardNumber = (raw) => String(raw ?? "").replace(/[\s-]/g, "");

export function formatAmount(cents, currency = CURRENCY) {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(cents / 100);
}

const EXPANDABLE = {
  "checkout.session": ["payment_intent", "line_items"],
  payment_intent: ["latest_charge"],
  charge: ["payment_intent"],
  refund: ["charge", "payment_intent"],
};

export class Ledger {
  /**
   * @param {{ store: import("./store.mjs").Store, baseUrl: () => string,
   *   emit: (type: string, object: object, context: EventContext, previous?: object) => void }} deps
   * @typedef {{ requestId: string | null, idempotencyKey: string | null, apiVersion: string | null }} EventContext
   */
  constructor({ store, baseUrl, emit }) {
    this.store = store;
    this.baseUrl = baseUrl;
    this.emit = emit;
  }

  // ---- reading -------------------------------------------------------------

  /** A copy for the outside world: the session's page address follows the fake's current port. */
  present(object) {
    const copy = structuredClone(object);
    if (copy.object === "checkout.session") {
      copy.url = copy.status === "open" ? `${this.baseUrl()}/pay/${copy.id}` : null;
    }
    return copy;
  }

  #find(id) {
    const { sessions, paymentIntents, charges, refunds } = this.store;
    if (id.startsWith("cs_")) return sessions[id];
    if (id.startsWith("pi_")) return paymentIntents[id];
    if (id.startsWith("ch_")) return charges[id];
    if (id.startsWith("re_")) return refunds[id];
    return undefined;
  }

  #lineItemList(sessionId) {
    return {
      object: "list",
      data: structuredClone(this.store.lineItems[sessionId] ?? []),
      has_more: false,
      url: `/v1/checkout/sessions/${sessionId}/line_items`,
    };
  }

  /** Applies `expand[]` paths such as `payment_intent.latest_charge` to a presented object. */
  expand(object, paths) {
    for (const path of paths) this.#expandPath(object, path.split("."), path);
    return object;
  }

  #expandPath(object, [field, ...rest], full) {
    if (!EXPANDABLE[object.object]?.includes(field)) {
      throw invalid(`This property cannot be expanded (${full}).`, "expand");
    }
    if (field === "line_items") {
      if (rest.length) throw invalid(`This property cannot be expanded (${full}).`, "expand");
      object.line_items = this.#lineItemList(object.id);
      return;
    }
    if (typeof object[field] === "string") {
      const found = this.#find(object[field]);
      if (found) object[field] = this.present(found);
    }
    if (rest.length && isObject(object[field])) this.#expandPath(object[field], rest, full);
  }

  getSession(id) {
    this.expireDueSessions();
    const session = this.store.sessions[id];
    if (!session) throw missing("checkout.session", id);
    return session;
  }

  listLineItems(id) {
    this.getSession(id);
    return this.#lineItemList(id);
  }

  getPaymentIntent(id) {
    const intent = this.store.paymentIntents[id];
    if (!intent) throw missing("payment_intent", id);
    return intent;
  }

  getCharge(id) {
    const charge = this.store.charges[id];
    if (!charge) throw missing("charge", id);
    return charge;
  }

  getRefund(id) {
    const refund = this.store.refunds[id];
    if (!refund) throw missing("refund", id);
    return refund;
  }

  /** The card waiting on extra authentication, if any. */
  pendingCard(sessionId) {
    return this.store.internal[sessionId]?.pendingCard ?? null;
  }

  #sessionContext(sessionId) {
    return { requestId: null, idempotencyKey: null, apiVersion: this.store.internal[sessionId]?.apiVersion ?? null };
  }

  // ---- checkout sessions ---------------------------------------------------

  createSession(params, context) {
    onlyKnown(params, [
      "mode",
      "line_items",
      "success_url",
      "cancel_url",
      "client_reference_id",
      "customer_email",
      "metadata",
      "payment_intent_data",
      "expires_at",
      "expand",
      "payment_method_types",
      "locale",
      "submit_type",
    ]);
    const mode = text(params.mode, "mode", { required: true });
    if (mode !== "payment") throw invalid(`Invalid mode: the payments fake supports only 'payment', got '${mode}'.`, "mode");

    const items = params.line_items;
    if (items === undefined || items === "") throw invalid("Missing required parameter: line_items.", "line_items");
    if (!Array.isArray(items) || items.length === 0)
      throw invalid("Invalid line_items: expected a list such as line_items[0][quantity]=1.", "line_items");
    if (items.length > 100) throw invalid("Invalid line_items: at most 100 items are allowed.", "line_items");
    const created = nowSeconds();
    const lines = items.map((item, index) => this.#lineItem(item, `line_items[${index}]`, created));
    const total = lines.reduce((sum, line) => sum + line.amount_total, 0);
    if (total < MIN_TOTAL) throw invalid(`Invalid line_items: the total must be at least ${formatAmount(MIN_TOTAL)}.`, "line_items");
    if (total > MAX_AMOUNT) throw invalid(`Invalid line_items: the total must be at most ${formatAmount(MAX_AMOUNT)}.`, "line_items");

    const successUrl = absoluteUrl(params.success_url, "success_url", { required: true });
    const cancelUrl = absoluteUrl(params.cancel_url, "cancel_url");
    const clientReferenceId = text(params.client_reference_id, "client_reference_id", { max: 200 });
    const customerEmail = email(params.customer_email, "customer_email");
    const sessionMetadata = metadata(params.metadata, "metadata");

    const intentData = params.payment_intent_data ?? {};
    if (intentData !== "" && !isObject(intentData))
      throw invalid("Invalid payment_intent_data: expected a group of fields.", "payment_intent_data");
    const intent = intentData === "" ? {} : intentData;
    onlyKnown(intent, ["metadata", "description", "receipt_email"], "payment_intent_data");
    const intentMetadata = metadata(intent.metadata, "payment_intent_data[metadata]");
    const intentDescription = text(intent.description, "payment_intent_data[description]", { max: 1000 });
    const receiptEmail = email(intent.receipt_email, "payment_intent_data[receipt_email]");

    const expiresAt =
      integer(params.expires_at, "expires_at", {
        min: created + MIN_LIFETIME,
        max: created + MAX_LIFETIME,
      }) ?? created + MAX_LIFETIME;

    if (params.payment_method_types !== undefined) {
      const types = params.payment_method_types;
      if (!Array.isArray(types) || types.length !== 1 || types[0] !== "card") {
        throw invalid(
          "Invalid payment_method_types: the payments fake takes only cards (payment_method_types[0]=card).",
          "payment_method_types",
        );
      }
    }
    const locale = text(params.locale, "locale", { max: 10 });
    const submitType = oneOf(params.submit_type, "submit_type", ["auto", "book", "donate", "pay"]);

    const id = newId("cs_test");
    const session = {
      id,
      object: "checkout.session",
      adaptive_pricing: null,
      after_expiration: null,
      allow_promotion_codes: null,
      amount_subtotal: total,
      amount_total: total,
      automatic_tax: { enabled: false, liability: null, provider: null, status: null },
      billing_address_collection: null,
      cancel_url: cancelUrl,
      client_reference_id: clientReferenceId,
      client_secret: null,
      consent: null,
      consent_collection: null,
      created,
      currency: CURRENCY,
      custom_fields: [],
      custom_text: { after_submit: null, shipping_address: null, submit: null, terms_of_service_acceptance: null },
      customer: null,
      customer_creation: "if_required",
      customer_details: null,
      customer_email: customerEmail,
      discounts: [],
      expires_at: expiresAt,
      invoice: null,
      invoice_creation: null,
      livemode: false,
      locale,
      metadata: sessionMetadata,
      mode: "payment",
      payment_intent: null,
      payment_link: null,
      payment_method_collection: "if_required",
      payment_method_options: {},
      payment_method_types: ["card"],
      payment_status: "unpaid",
      recovered_from: null,
      setup_intent: null,
      shipping_address_collection: null,
      shipping_cost: null,
      shipping_options: [],
      status: "open",
      submit_type: submitType,
      subscription: null,
      success_url: successUrl,
      total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
      ui_mode: "hosted_page",
      url: null, // filled in by present()
    };
    this.store.sessions[id] = session;
    this.store.lineItems[id] = lines;
    this.store.internal[id] = {
      apiVersion: context.apiVersion,
      intentData: { metadata: intentMetadata, description: intentDescription, receiptEmail },
      pendingCard: null,
    };
    this.store.save();
    return session;
  }

  #lineItem(item, param, created) {
    if (!isObject(item)) throw invalid(`Invalid ${param}: expected a group of fields.`, param);
    if (item.price !== undefined) {
      throw invalid(
        `Invalid ${param}[price]: saved prices are not supported by the payments fake; send ${param}[price_data] instead.`,
        `${param}[price]`,
      );
    }
    onlyKnown(item, ["price_data", "quantity"], param);
    const priceData = item.price_data;
    if (priceData === undefined) throw invalid(`Missing required parameter: ${param}[price_data].`, `${param}[price_data]`);
    if (!isObject(priceData)) throw invalid(`Invalid ${param}[price_data]: expected a group of fields.`, `${param}[price_data]`);
    onlyKnown(priceData, ["currency", "unit_amount", "product_data"], `${param}[price_data]`);
    const currency = text(priceData.currency, `${param}[price_data][currency]`, { required: true }).toLowerCase();
    if (currency !== CURRENCY) {
      throw invalid(`Invalid ${param}[price_data][currency]: the payments fake supports only 'usd'.`, `${param}[price_data][currency]`);
    }
    const unitAmount = integer(priceData.unit_amount, `${param}[price_data][unit_amount]`, { required: true, min: 0, max: MAX_AMOUNT });
    const product = priceData.product_data;
    if (product === undefined)
      throw invalid(`Missing required parameter: ${param}[price_data][product_data].`, `${param}[price_data][product_data]`);
    if (!isObject(product))
      throw invalid(`Invalid ${param}[price_data][product_data]: expected a group of fields.`, `${param}[price_data][product_data]`);
    onlyKnown(product, ["name", "description"], `${param}[price_data][product_data]`);
    const name = text(product.name, `${param}[price_data][product_data][name]`, { required: true, max: 250 });
    text(product.description, `${param}[price_data][product_data][description]`, { max: 1000 });
    const quantity = integer(item.quantity, `${param}[quantity]`, { required: true, min: 1, max: 999_999 });
    const amount = unitAmount * quantity;
    return {
      id: newId("li"),
      object: "item",
      amount_discount: 0,
      amount_subtotal: amount,
      amount_tax: 0,
      amount_total: amount,
      currency,
      description: name,
      price: {
        id: newId("price"),
        object: "price",
        active: false,
        billing_scheme: "per_unit",
        created,
        currency,
        custom_unit_amount: null,
        livemode: false,
        lookup_key: null,
        metadata: {},
        nickname: null,
        product: newId("prod"),
        recurring: null,
        tax_behavior: "unspecified",
        tiers_mode: null,
        transform_quantity: null,
        type: "one_time",
        unit_amount: unitAmount,
        unit_amount_decimal: String(unitAmount),
      },
      quantity,
    };
  }

  expireSession(id, context) {
    const session = this.getSession(id);
    if (session.status !== "open") {
      throw invalid(`Only open Checkout Sessions can be expired; ${id} is ${session.status}.`);
    }
    this.#expire(session, context);
    return session;
  }

  /** Sessions past their `expires_at` turn expired the first time anyone looks. */
  expireDueSessions() {
    const now = nowSeconds();
    for (const session of Object.values(this.store.sessions)) {
      if (session.status === "open" && session.expires_at <= now) this.#expire(session, this.#sessionContext(session.id));
    }
  }

  #expire(session, context) {
    session.status = "expired";
    const internal = this.store.internal[session.id];
    if (internal) internal.pendingCard = null;
    const intent = session.payment_intent ? this.store.paymentIntents[session.payment_intent] : null;
    if (intent && intent.status !== "succeeded" && intent.status !== "canceled") {
      intent.status = "canceled";
      intent.canceled_at = nowSeconds();
      intent.cancellation_reason = "abandoned";
      intent.next_action = null;
    }
    this.store.save();
    if (intent?.status === "canceled") this.emit("payment_intent.canceled", this.present(intent), context);
    this.emit("checkout.session.expired", this.present(session), context);
  }

  // ---- payment attempts ----------------------------------------------------

  #openSession(id) {
    this.expireDueSessions();
    const session = this.store.sessions[id];
    if (!session) throw new PaymentAttemptError("not_found", `No checkout session ${id}.`);
    if (session.status !== "open") throw new PaymentAttemptError("not_open", `Checkout session ${id} is ${session.status}.`);
    return session;
  }

  /**
   * Pays a session with a test card.
   * @param {string} sessionId
   * @param {{ number: string, expMonth?: number, expYear?: number, cvc?: string | null }} card
   * @returns {{ outcome: "succeeded" | "declined" | "requires_action", session: object, paymentIntent: object }}
   */
  pay(sessionId, card) {
    const session = this.#openSession(sessionId);
    const number = normaliseCardNumber(card.number);
    const behaviour = CARD_BEHAVIOUR.get(number);
    if (!behaviour) throw new PaymentAttemptError("unknown_card", "Use one of the test cards listed.");
    const thisYear = new Date().getUTCFullYear();
    const details = {
      number,
      expMonth: card.expMonth ?? 12,
      expYear: card.expYear ?? thisYear + 3,
      cvcGiven: Boolean(card.cvc),
      paymentMethod: newId("pm"),
      authenticated: false,
    };
    const context = this.#sessionContext(sessionId);
    const intent = this.#intentFor(session, context);
    this.store.internal[sessionId].pendingCard = null;

    if (behaviour === "succeeds") return this.#succeed(session, intent, details, context);
    if (behaviour === "declined") return this.#decline(session, intent, details, context);

    intent.status = "requires_action";
    intent.payment_method = details.paymentMethod;
    intent.next_action = {
      type: "redirect_to_url",
      redirect_to_url: {
        url: `${this.baseUrl()}/pay/${session.id}/authenticate`,
        return_url: `${this.baseUrl()}/pay/${session.id}`,
      },
    };
    this.store.internal[sessionId].pendingCard = details;
    this.store.save();
    this.emit("payment_intent.requires_action", this.present(intent), context);
    return { outcome: "requires_action", session, paymentIntent: intent };
  }

  /**
   * Finishes the extra authentication step a card asked for.
   * @param {string} sessionId
   * @param {"complete" | "fail"} result
   */
  authenticate(sessionId, result) {
    const session = this.#openSession(sessionId);
    const details = this.pendingCard(sessionId);
    const intent = session.payment_intent ? this.store.paymentIntents[session.payment_intent] : null;
    if (!details || !intent || intent.status !== "requires_action") {
      throw new PaymentAttemptError("not_awaiting_authentication", "No payment is waiting for authentication on this session.");
    }
    const context = this.#sessionContext(sessionId);
    this.store.internal[sessionId].pendingCard = null;
    if (result === "complete") return this.#succeed(session, intent, { ...details, authenticated: true }, context);

    intent.status = "requires_payment_method";
    intent.next_action = null;
    intent.payment_method = null;
    intent.last_payment_error = {
      type: "invalid_request_error",
      code: "payment_intent_authentication_failure",
      message: "The card was not authenticated, so the payment was not made. Try again or use another card.",
      payment_method: this.#paymentMethodObject(details, session),
    };
    this.store.save();
    this.emit("payment_intent.payment_failed", this.present(intent), context);
    return { outcome: "authentication_failed", session, paymentIntent: intent };
  }

  /** The session gets its PaymentIntent on the first payment attempt, and keeps it for retries. */
  #intentFor(session, context) {
    if (session.payment_intent) return this.store.paymentIntents[session.payment_intent];
    const extra = this.store.internal[session.id].intentData;
    const id = newId("pi");
    const intent = {
      id,
      object: "payment_intent",
      amount: session.amount_total,
      amount_capturable: 0,
      amount_details: { tip: {} },
      amount_received: 0,
      application: null,
      application_fee_amount: null,
      automatic_payment_methods: null,
      canceled_at: null,
      cancellation_reason: null,
      capture_method: "automatic_async",
      client_secret: `${id}_secret_${randomToken(25)}`,
      confirmation_method: "automatic",
      created: nowSeconds(),
      currency: session.currency,
      customer: null,
      description: extra.description,
      last_payment_error: null,
      latest_charge: null,
      livemode: false,
      metadata: { ...extra.metadata },
      next_action: null,
      on_behalf_of: null,
      payment_method: null,
      payment_method_configuration_details: null,
      payment_method_options: { card: { installments: null, mandate_options: null, network: null, request_three_d_secure: "automatic" } },
      payment_method_types: ["card"],
      processing: null,
      receipt_email: extra.receiptEmail,
      review: null,
      setup_future_usage: null,
      shipping: null,
      source: null,
      statement_descriptor: null,
      statement_descriptor_suffix: null,
      status: "requires_payment_method",
      transfer_data: null,
      transfer_group: null,
    };
    this.store.paymentIntents[id] = intent;
    session.payment_intent = id;
    this.store.save();
    this.emit("payment_intent.created", this.present(intent), context);
    return intent;
  }

  #cardDetails(details) {
    return {
      brand: "visa",
      checks: { address_line1_check: null, address_postal_code_check: null, cvc_check: details.cvcGiven ? "pass" : null },
      country: "US",
      exp_month: details.expMonth,
      exp_year: details.expYear,
      // Same card, same fingerprint: lets the app spot a repeated card without seeing the number.
      fingerprint: createHash("sha256").update(`ohmstead-fake-card:${details.number}`).digest("base64url").slice(0, 16),
      funding: "credit",
      last4: details.number.slice(-4),
      network: "visa",
    };
  }

  #billingDetails(session) {
    return {
      address: { city: null, country: null, line1: null, line2: null, postal_code: null, state: null },
      email: session.customer_email,
      name: null,
      phone: null,
    };
  }

  #paymentMethodObject(details, session) {
    return {
      id: details.paymentMethod,
      object: "payment_method",
      billing_details: this.#billingDetails(session),
      card: this.#cardDetails(details),
      created: nowSeconds(),
      customer: null,
      livemode: false,
      metadata: {},
      type: "card",
    };
  }

  #charge(session, intent, details, failure) {
    const id = newId("ch");
    const card = {
      ...this.#cardDetails(details),
      three_d_secure: details.authenticated
        ? { authentication_flow: "challenge", result: "authenticated", result_reason: null, version: "2.2.0" }
        : null,
    };
    const charge = {
      id,
      object: "charge",
      amount: intent.amount,
      amount_captured: failure ? 0 : intent.amount,
      amount_refunded: 0,
      application: null,
      application_fee: null,
      application_fee_amount: null,
      balance_transaction: null,
      billing_details: this.#billingDetails(session),
      calculated_statement_descriptor: null,
      captured: !failure,
      created: nowSeconds(),
      currency: intent.currency,
      customer: null,
      description: intent.description,
      disputed: false,
      failure_balance_transaction: null,
      failure_code: failure ? failure.code : null,
      failure_message: failure ? failure.message : null,
      fraud_details: {},
      livemode: false,
      metadata: { ...intent.metadata },
      on_behalf_of: null,
      outcome: failure
        ? {
            network_status: "declined_by_network",
            reason: failure.decline_code,
            risk_level: "normal",
            seller_message: "The card issuer declined this test payment.",
            type: "issuer_declined",
          }
        : {
            network_status: "approved_by_network",
            reason: null,
            risk_level: "normal",
            seller_message: "Test payment approved.",
            type: "authorized",
          },
      paid: !failure,
      payment_intent: intent.id,
      payment_method: details.paymentMethod,
      payment_method_details: { card, type: "card" },
      receipt_email: intent.receipt_email,
      receipt_number: null,
      receipt_url: null,
      refunded: false,
      review: null,
      shipping: null,
      source: null,
      source_transfer: null,
      statement_descriptor: null,
      statement_descriptor_suffix: null,
      status: failure ? "failed" : "succeeded",
      transfer_data: null,
      transfer_group: null,
    };
    this.store.charges[id] = charge;
    return charge;
  }

  #succeed(session, intent, details, context) {
    const charge = this.#charge(session, intent, details, null);
    Object.assign(intent, {
      status: "succeeded",
      amount_received: intent.amount,
      latest_charge: charge.id,
      last_payment_error: null,
      next_action: null,
      payment_method: details.paymentMethod,
    });
    Object.assign(session, {
      status: "complete",
      payment_status: "paid",
      customer_details: {
        address: null,
        email: session.customer_email,
        name: null,
        phone: null,
        tax_exempt: "none",
        tax_ids: [],
      },
    });
    this.store.save();
    this.emit("payment_intent.succeeded", this.present(intent), context);
    this.emit("charge.succeeded", this.present(charge), context);
    this.emit("checkout.session.completed", this.present(session), context);
    return { outcome: "succeeded", session, paymentIntent: intent };
  }

  #decline(session, intent, details, context) {
    const failure = {
      type: "card_error",
      code: "card_declined",
      decline_code: "generic_decline",
      message: "Your card was declined.",
    };
    const charge = this.#charge(session, intent, details, failure);
    Object.assign(intent, {
      status: "requires_payment_method",
      latest_charge: charge.id,
      next_action: null,
      payment_method: null,
      last_payment_error: { ...failure, charge: charge.id, payment_method: this.#paymentMethodObject(details, session) },
    });
    this.store.save();
    this.emit("charge.failed", this.present(charge), context);
    this.emit("payment_intent.payment_failed", this.present(intent), context);
    return { outcome: "declined", session, paymentIntent: intent };
  }

  // ---- refunds -------------------------------------------------------------

  createRefund(params, context) {
    onlyKnown(params, ["payment_intent", "charge", "amount", "reason", "metadata", "expand"]);
    const intentId = text(params.payment_intent, "payment_intent", { max: 255 });
    const chargeId = text(params.charge, "charge", { max: 255 });
    if (!intentId && !chargeId) throw invalid("Missing required parameter: give payment_intent or charge.", "payment_intent");

    let charge;
    if (intentId) {
      const intent = this.store.paymentIntents[intentId];
      if (!intent) throw missing("payment_intent", intentId, "payment_intent");
      if (intent.status !== "succeeded") {
        throw invalid(`PaymentIntent ${intentId} has no successful payment to refund (status: ${intent.status}).`, "payment_intent");
      }
      charge = this.store.charges[intent.latest_charge];
      if (chargeId && chargeId !== charge.id) {
        throw invalid(`Charge ${chargeId} does not belong to PaymentIntent ${intentId}.`, "charge");
      }
    } else {
      charge = this.store.charges[chargeId];
      if (!charge) throw missing("charge", chargeId, "charge");
      if (charge.status !== "succeeded") throw invalid(`Charge ${chargeId} did not succeed, so there is nothing to refund.`, "charge");
    }

    const remaining = charge.amount - charge.amount_refunded;
    if (remaining === 0) {
      throw invalid(`Charge ${charge.id} has already been refunded in full.`, undefined, "charge_already_refunded");
    }
    const amount = integer(params.amount, "amount", { min: 1 }) ?? remaining;
    if (amount > remaining) {
      throw invalid(
        `Refund amount (${formatAmount(amount, charge.currency)}) is more than the ${formatAmount(remaining, charge.currency)} still refundable on charge ${charge.id}.`,
        "amount",
        "amount_too_large",
      );
    }
    const reason = oneOf(params.reason, "reason", REFUND_REASONS);
    const refundMetadata = metadata(params.metadata, "metadata");

    const id = newId("re");
    const refund = {
      id,
      object: "refund",
      amount,
      balance_transaction: null,
      charge: charge.id,
      created: nowSeconds(),
      currency: charge.currency,
      destination_details: {
        card: { reference: null, reference_status: "pending", reference_type: "acquirer_reference_number", type: "refund" },
        type: "card",
      },
      metadata: refundMetadata,
      payment_intent: charge.payment_intent,
      payment_method: charge.payment_method,
      reason,
      receipt_number: null,
      source_transfer_reversal: null,
      status: "succeeded",
      transfer_reversal: null,
    };
    const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
    charge.amount_refunded += amount;
    charge.refunded = charge.amount_refunded === charge.amount;
    this.store.refunds[id] = refund;
    this.store.save();
    this.emit("refund.created", this.present(refund), context);
    this.emit("charge.refunded", this.present(charge), context, previous);
    return refund;
  }

  /**
   * A refund the card network sends back after it had succeeded (a closed card account, say): the
   * money stays with the merchant. Emits what Stripe documents for it: refund.failed and refund.updated.
   */
  failRefund(refundId, failureReason = "expired_or_canceled_card") {
    const refund = this.store.refunds[refundId];
    if (!refund) throw missing("refund", refundId, "refund");
    if (refund.status === "failed") return refund;
    const charge = this.store.charges[refund.charge];
    const previous = { status: refund.status, failure_reason: null };
    refund.status = "failed";
    refund.failure_reason = failureReason;
    charge.amount_refunded -= refund.amount;
    charge.refunded = false;
    this.store.save();
    const context = { requestId: null, idempotencyKey: null, apiVersion: null };
    this.emit("refund.failed", this.present(refund), context, previous);
    this.emit("refund.updated", this.present(refund), context, previous);
    return refund;
  }
}

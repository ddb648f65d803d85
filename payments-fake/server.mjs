// A local stand-in for the part of the payments API Ohmstead uses (hosted
// checkout sessions, payment intents, refunds, signed webhooks), so the app can
// be developed and tested end to end without a network or an account. The
// official SDK talks to it unchanged; only host, port and protocol differ.
import { createHash } from "node:crypto";
import { createServer } from "node:http";
import { pathToFileURL } from "node:url";
import { ApiError } from "./errors.mjs";
import { FormError, parseForm } from "./form.mjs";
import { Ledger, PaymentAttemptError, TEST_CARDS, normaliseCardNumber } from "./ledger.mjs";
import { authenticatePage, closedPage, notFoundPage, payPage } from "./pay-page.mjs";
import { expandList, onlyKnown } from "./params.mjs";
import { Store, newId, nowSeconds } from "./store.mjs";
import { WebhookDispatcher } from "./webhooks.mjs";

/** Local fake keys, not secrets: the fake accepts only these unless told otherwise. */
export const FAKE_STRIPE_SECRET_KEY = "sk_test_ohmstead_local_fake";
/** Local fake keys, not secrets: webhook signatures made by the fake use this. */
export const FAKE_STRIPE_WEBHOOK_SECRET = "whsec_ohmstead_local_fake";
export const FAKE_TEST_CARDS = TEST_CARDS;

const MAX_BODY_BYTES = 1024 * 1024;
// Sessions also expire on every request; the timer covers quiet periods so expiry events still go out.
const EXPIRY_SWEEP_MS = 15_000;
const LOOPBACK = new Set(["127.0.0.1", "::1", "::ffff:127.0.0.1"]);

const API_ROUTES = [
  ["POST", /^\/v1\/checkout\/sessions$/, "createSession"],
  ["GET", /^\/v1\/checkout\/sessions\/([\w-]+)$/, "retrieveSession"],
  ["GET", /^\/v1\/checkout\/sessions\/([\w-]+)\/line_items$/, "listLineItems"],
  ["POST", /^\/v1\/checkout\/sessions\/([\w-]+)\/expire$/, "expireSession"],
  ["GET", /^\/v1\/payment_intents\/([\w-]+)$/, "retrievePaymentIntent"],
  ["GET", /^\/v1\/charges\/([\w-]+)$/, "retrieveCharge"],
  ["POST", /^\/v1\/refunds$/, "createRefund"],
  ["GET", /^\/v1\/refunds\/([\w-]+)$/, "retrieveRefund"],
  ["GET", /^\/v1\/events\/([\w-]+)$/, "retrieveEvent"],
];

function readBody(req) {
  return new Promise((resolve, reject) => {
    const chunks = [];
    let size = 0;
    req.on("data", (chunk) => {
      size += chunk.length;
      if (size > MAX_BODY_BYTES) {
        reject(new ApiError(413, "Request body is larger than 1 MB."));
        req.destroy();
        return;
      }
      chunks.push(chunk);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function sendJson(res, status, body, headers = {}) {
  const text = JSON.stringify(body, null, 2);
  res.writeHead(status, { "content-type": "application/json; charset=utf-8", "cache-control": "no-store", ...headers });
  res.end(text);
}

function sendHtml(res, status, html) {
  res.writeHead(status, { "content-type": "text/html; charset=utf-8", "cache-control": "no-store" });
  res.end(html);
}

function redirect(res, location) {
  res.writeHead(303, { location, "cache-control": "no-store" });
  res.end();
}

/** The API key from `Authorization: Bearer <key>` or, as curl sends it, Basic with the key as user name. */
function apiKeyFrom(header) {
  if (!header) return null;
  const [scheme, value = ""] = header.split(" ", 2);
  if (/^bearer$/i.test(scheme)) return value.trim() || null;
  if (/^basic$/i.test(scheme)) return Buffer.from(value, "base64").toString("utf8").split(":")[0] || null;
  return null;
}

const masked = (key) => (key.length > 12 ? `${key.slice(0, 8)}…${key.slice(-4)}` : "…");

/** MM/YY or MM/YYYY, not in the past; null when it is not a usable expiry. */
function parseExpiry(raw) {
  const match = String(raw ?? "")
    .trim()
    .match(/^(\d{1,2})\s*\/\s*(\d{2}|\d{4})$/);
  if (!match) return null;
  const month = Number(match[1]);
  const year = match[2].length === 2 ? 2000 + Number(match[2]) : Number(match[2]);
  if (month < 1 || month > 12) return null;
  const now = new Date();
  if (year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1)) return null;
  return { month, year };
}

const successUrl = (session) => session.success_url.replaceAll("{CHECKOUT_SESSION_ID}", session.id);

/**
 * Starts the fake on 127.0.0.1.
 * @param {{ port: number, directory?: string, apiKey?: string, webhookUrl?: string | null,
 *   webhookSecret?: string, webhookRetryDelaysMs?: number[] }} options
 */
export async function startPaymentsFake({
  port,
  directory,
  apiKey = FAKE_STRIPE_SECRET_KEY,
  webhookUrl = null,
  webhookSecret = FAKE_STRIPE_WEBHOOK_SECRET,
  webhookRetryDelaysMs,
}) {
  const store = new Store(directory);
  let baseUrl = "";
  const webhooks = new WebhookDispatcher({ store, url: webhookUrl, secret: webhookSecret, retryDelaysMs: webhookRetryDelaysMs });
  const ledger = new Ledger({
    store,
    baseUrl: () => baseUrl,
    emit: (type, object, context, previous) => webhooks.record(type, object, context, previous),
  });

  // ---- /v1: the API the SDK calls ----------------------------------------

  const api = {
    createSession(params, context) {
      const session = ledger.createSession(params, context);
      return ledger.expand(ledger.present(session), expandList(params.expand));
    },
    retrieveSession(params, context, id) {
      onlyKnown(params, ["expand"]);
      return ledger.expand(ledger.present(ledger.getSession(id)), expandList(params.expand));
    },
    listLineItems(params, context, id) {
      onlyKnown(params, ["expand", "limit", "starting_after", "ending_before"]);
      return ledger.listLineItems(id);
    },
    expireSession(params, context, id) {
      onlyKnown(params, ["expand"]);
      return ledger.expand(ledger.present(ledger.expireSession(id, context)), expandList(params.expand));
    },
    retrievePaymentIntent(params, context, id) {
      onlyKnown(params, ["expand"]);
      return ledger.expand(ledger.present(ledger.getPaymentIntent(id)), expandList(params.expand));
    },
    retrieveCharge(params, context, id) {
      onlyKnown(params, ["expand"]);
      return ledger.expand(ledger.present(ledger.getCharge(id)), expandList(params.expand));
    },
    createRefund(params, context) {
      return ledger.expand(ledger.present(ledger.createRefund(params, context)), expandList(params.expand));
    },
    retrieveRefund(params, context, id) {
      onlyKnown(params, ["expand"]);
      return ledger.expand(ledger.present(ledger.getRefund(id)), expandList(params.expand));
    },
    retrieveEvent(params, context, id) {
      onlyKnown(params, ["expand"]);
      const entry = webhooks.find(id);
      if (!entry) throw new ApiError(404, `No such event: '${id}'`, { param: "id", code: "resource_missing" });
      return entry.event;
    },
  };

  async function handleApi(req, res, url) {
    const requestId = newId("req");
    const headers = { "request-id": requestId };
    const apiVersion = req.headers["stripe-version"] ?? null;
    if (apiVersion) headers["stripe-version"] = apiVersion;
    const fail = (error) => sendJson(res, error.status, error.toBody(), headers);

    const key = apiKeyFrom(req.headers.authorization);
    if (!key) {
      return fail(new ApiError(401, "No API key was sent. Send it as 'Authorization: Bearer <secret key>'."));
    }
    if (key !== apiKey)
      return fail(new ApiError(401, `Invalid API key: ${masked(key)}. This payments fake accepts only its own test key.`));

    const found = API_ROUTES.map(([method, pattern, name]) => ({ method, match: url.pathname.match(pattern), name })).filter(
      (r) => r.match,
    );
    const route = found.find((r) => r.method === req.method);
    if (!route) {
      return fail(new ApiError(404, `Unrecognised request: ${req.method} ${url.pathname} is not part of the payments fake.`));
    }

    let body = "";
    let params;
    try {
      body = req.method === "POST" ? await readBody(req) : "";
      const contentType = String(req.headers["content-type"] ?? "");
      if (body && !contentType.startsWith("application/x-www-form-urlencoded")) {
        throw new ApiError(400, "Send parameters form-encoded (Content-Type: application/x-www-form-urlencoded).");
      }
      params = parseForm(req.method === "POST" ? body : url.searchParams);
    } catch (error) {
      if (error instanceof FormError) return fail(new ApiError(400, error.message, { param: error.param }));
      if (error instanceof ApiError) return fail(error);
      throw error;
    }

    const idempotencyKey = req.method === "POST" ? (req.headers["idempotency-key"] ?? null) : null;
    if (idempotencyKey) {
      const fingerprint = createHash("sha256").update(`${req.method} ${url.pathname}\n${body}`).digest("hex");
      const stored = store.idempotency[idempotencyKey];
      if (stored && stored.fingerprint !== fingerprint) {
        return fail(
          new ApiError(
            400,
            `Idempotency key '${idempotencyKey}' was already used for a different request; use a new key for new parameters or routes.`,
            {
              type: "idempotency_error",
            },
          ),
        );
      }
      if (stored) {
        return sendJson(res, stored.status, stored.body, { ...headers, "idempotency-key": idempotencyKey, "idempotent-replayed": "true" });
      }
      headers["idempotency-key"] = idempotencyKey;
    }

    let status = 200;
    let result;
    try {
      result = api[route.name](params, { requestId, idempotencyKey, apiVersion }, route.match[1]);
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      status = error.status;
      result = error.toBody();
    }
    if (idempotencyKey && status < 500) {
      store.idempotency[idempotencyKey] = {
        fingerprint: createHash("sha256").update(`${req.method} ${url.pathname}\n${body}`).digest("hex"),
        status,
        body: result,
        created: nowSeconds(),
      };
      store.save();
    }
    sendJson(res, status, result, headers);
  }

  // ---- /pay: the page a person pays on -----------------------------------

  function showPayPage(res, status, session, extra = {}) {
    sendHtml(res, status, payPage({ session, lineItems: store.lineItems[session.id] ?? [], ...extra }));
  }

  function showClosedOrMissing(res, id) {
    const session = store.sessions[id];
    if (!session) return sendHtml(res, 404, notFoundPage());
    return sendHtml(res, session.status === "expired" ? 410 : 200, closedPage({ session }));
  }

  async function handlePage(req, res, url) {
    const match = url.pathname.match(/^\/pay\/([\w-]+)(\/authenticate)?$/);
    if (!match) return sendHtml(res, 404, notFoundPage());
    const [, id, authenticateStep] = match;
    ledger.expireDueSessions();
    const session = store.sessions[id];
    if (!session) return sendHtml(res, 404, notFoundPage());

    if (req.method === "GET") {
      if (session.status !== "open") return showClosedOrMissing(res, id);
      if (authenticateStep) {
        const card = ledger.pendingCard(id);
        if (!card) return redirect(res, `/pay/${id}`);
        return sendHtml(res, 200, authenticatePage({ session, last4: card.number.slice(-4) }));
      }
      return showPayPage(res, 200, session);
    }
    if (req.method !== "POST") {
      res.writeHead(405, { allow: "GET, POST" });
      return res.end();
    }

    const form = Object.fromEntries(new URLSearchParams(await readBody(req)));
    try {
      if (authenticateStep) {
        const choice = form.result === "complete" ? "complete" : "fail";
        const outcome = ledger.authenticate(id, choice);
        if (outcome.outcome === "succeeded") return redirect(res, successUrl(session));
        return showPayPage(res, 402, session, { error: outcome.paymentIntent.last_payment_error.message });
      }

      const values = { card_number: form.card_number ?? "", expiry: form.expiry ?? "", cvc: form.cvc ?? "" };
      if (!Object.values(TEST_CARDS).includes(normaliseCardNumber(values.card_number))) {
        return showPayPage(res, 400, session, { error: "Use one of the test cards listed above.", field: "card_number", values });
      }
      const expiry = parseExpiry(values.expiry);
      if (!expiry) {
        return showPayPage(res, 400, session, { error: "Enter the expiry date as MM/YY, and not in the past.", field: "expiry", values });
      }
      if (!/^\d{3,4}$/.test(values.cvc.trim())) {
        return showPayPage(res, 400, session, { error: "Enter the CVC: 3 or 4 digits.", field: "cvc", values });
      }
      const outcome = ledger.pay(id, { number: values.card_number, expMonth: expiry.month, expYear: expiry.year, cvc: values.cvc.trim() });
      if (outcome.outcome === "succeeded") return redirect(res, successUrl(session));
      if (outcome.outcome === "requires_action") return redirect(res, `/pay/${id}/authenticate`);
      return showPayPage(res, 402, session, { error: outcome.paymentIntent.last_payment_error.message, field: "card_number", values });
    } catch (error) {
      if (!(error instanceof PaymentAttemptError)) throw error;
      if (error.reason === "not_awaiting_authentication") return redirect(res, `/pay/${id}`);
      return showClosedOrMissing(res, id);
    }
  }

  // ---- /_fake: controls for tests, not part of the real API --------------

  async function readJson(req) {
    const text = await readBody(req);
    if (!text.trim()) return {};
    try {
      const value = JSON.parse(text);
      if (value && typeof value === "object" && !Array.isArray(value)) return value;
    } catch {
      // falls through to the error below
    }
    throw new ApiError(400, "Send a JSON object as the request body.");
  }

  function attemptJson(res, run) {
    try {
      const { outcome, session, paymentIntent } = run();
      const body = {
        outcome,
        session: ledger.present(session),
        payment_intent: ledger.expand(ledger.present(paymentIntent), ["latest_charge"]),
      };
      return sendJson(res, outcome === "succeeded" || outcome === "requires_action" ? 200 : 402, body);
    } catch (error) {
      if (!(error instanceof PaymentAttemptError)) throw error;
      const status = { not_found: 404, unknown_card: 400 }[error.reason] ?? 409;
      return sendJson(res, status, { error: { type: "invalid_request_error", code: error.reason, message: error.message } });
    }
  }

  async function handleControl(req, res, url) {
    if (!LOOPBACK.has(req.socket.remoteAddress ?? "")) {
      return sendJson(res, 403, { error: { type: "invalid_request_error", message: "Test controls answer loopback callers only." } });
    }
    const path = url.pathname;
    let match;
    if (req.method === "POST" && (match = path.match(/^\/_fake\/checkout\/sessions\/([\w-]+)\/pay$/))) {
      const body = await readJson(req);
      const expiry = body.expiry === undefined ? null : parseExpiry(body.expiry);
      if (body.expiry !== undefined && !expiry) throw new ApiError(400, "expiry must be MM/YY and not in the past.", { param: "expiry" });
      return attemptJson(res, () =>
        ledger.pay(match[1], { number: body.card, expMonth: expiry?.month, expYear: expiry?.year, cvc: body.cvc ?? "123" }),
      );
    }
    if (req.method === "POST" && (match = path.match(/^\/_fake\/checkout\/sessions\/([\w-]+)\/authenticate$/))) {
      const body = await readJson(req);
      if (body.result !== "complete" && body.result !== "fail") {
        throw new ApiError(400, "result must be 'complete' or 'fail'.", { param: "result" });
      }
      return attemptJson(res, () => ledger.authenticate(match[1], body.result));
    }
    if (req.method === "POST" && (match = path.match(/^\/_fake\/refunds\/([\w-]+)\/fail$/))) {
      const body = await readJson(req);
      return sendJson(res, 200, ledger.present(ledger.failRefund(match[1], body.failure_reason)));
    }
    if (req.method === "GET" && path === "/_fake/events") {
      const type = url.searchParams.get("type");
      const data = store.events.filter((entry) => !type || entry.event.type === type);
      return sendJson(res, 200, { data });
    }
    if (req.method === "POST" && (match = path.match(/^\/_fake\/events\/([\w-]+)\/resend$/))) {
      const entry = webhooks.resend(match[1]);
      return sendJson(res, 202, entry);
    }
    if (path === "/_fake/webhooks" && (req.method === "GET" || req.method === "POST")) {
      if (req.method === "POST") {
        const body = await readJson(req);
        if (body.paused !== undefined && typeof body.paused !== "boolean")
          throw new ApiError(400, "paused must be true or false.", { param: "paused" });
        if (body.url !== undefined && body.url !== null && typeof body.url !== "string")
          throw new ApiError(400, "url must be a string or null.", { param: "url" });
        if (body.url !== undefined) webhooks.setUrl(body.url);
        if (body.paused !== undefined) webhooks.setPaused(body.paused);
      }
      return sendJson(res, 200, webhooks.status());
    }
    return sendJson(res, 404, { error: { type: "invalid_request_error", message: `No test control at ${req.method} ${path}.` } });
  }

  // ---- dispatch -----------------------------------------------------------

  const server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    let handling;
    if (url.pathname.startsWith("/v1/")) handling = handleApi(req, res, url);
    else if (url.pathname.startsWith("/pay/")) handling = handlePage(req, res, url);
    else if (url.pathname.startsWith("/_fake/")) handling = handleControl(req, res, url);
    else if (url.pathname === "/" && req.method === "GET") {
      handling = Promise.resolve(sendJson(res, 200, { service: "ohmstead-payments-fake", test_mode: true }));
    } else {
      handling = Promise.resolve(
        sendJson(res, 404, { error: { type: "invalid_request_error", message: `Unrecognised request: ${req.method} ${url.pathname}.` } }),
      );
    }
    handling.catch((error) => {
      if (res.headersSent) return res.destroy();
      if (error instanceof ApiError) return sendJson(res, error.status, error.toBody());
      console.error("payments-fake:", error);
      sendJson(res, 500, { error: { type: "api_error", message: "The payments fake failed; see its console output." } });
    });
  });

  await new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => {
      server.off("error", reject);
      resolve();
    });
  });
  const address = server.address();
  baseUrl = `http://127.0.0.1:${typeof address === "object" && address ? address.port : port}`;

  ledger.expireDueSessions();
  webhooks.resumePending();
  const sweep = setInterval(() => ledger.expireDueSessions(), EXPIRY_SWEEP_MS);
  sweep.unref();

  let stopping = null;
  const stop = () => {
    stopping ??= (async () => {
      clearInterval(sweep);
      await webhooks.stop();
      await new Promise((resolve) => {
        server.close(() => resolve());
        // The SDK keeps connections alive; without this close() would wait on them.
        server.closeAllConnections();
      });
      store.save();
    })();
    return stopping;
  };
  return { url: baseUrl, stop };
}

// `node payments-fake/server.mjs [--port N] [--dir PATH] [--webhook-url URL]` runs it on its own.
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const argument = (name) => {
    const index = process.argv.indexOf(name);
    return index === -1 ? undefined : process.argv[index + 1];
  };
  const fake = await startPaymentsFake({
    port: Number(argument("--port") ?? 4590),
    directory: argument("--dir"),
    webhookUrl: argument("--webhook-url") ?? null,
  });
  console.log(`payments fake listening on ${fake.url}`);
  const shutdown = () => fake.stop().then(() => process.exit(0));
  process.once("SIGINT", shutdown);
  process.once("SIGTERM", shutdown);
}

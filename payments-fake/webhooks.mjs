// Event log and webhook delivery. Deliveries run in the background so an API
// answer never waits on the app's webhook handler; events about one object go
// out one after another so a handler never sees "succeeded" before "failed".
import { createHmac } from "node:crypto";
import http from "node:http";
import https from "node:https";
import { ApiError } from "./errors.mjs";
import { newId, nowSeconds } from "./store.mjs";

// 0.5 s, 1 s, 2 s, 4 s, then 8 s: eight tries over about half a minute, so a
// dev server that is still booting gets its events, and tests stay quick.
export const DEFAULT_RETRY_DELAYS_MS = [500, 1000, 2000, 4000, 8000, 8000, 8000];
const REQUEST_TIMEOUT_MS = 10_000;
const KEPT_ATTEMPTS = 20;

/** The signature header the SDK's `webhooks.constructEvent` checks. */
export function signatureHeader(payload, secret, timestamp = nowSeconds()) {
  const signature = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${signature}`;
}

export class WebhookDispatcher {
  /**
   * @param {{ store: import("./store.mjs").Store, url?: string | null, secret: string, retryDelaysMs?: number[] }} options
   */
  constructor({ store, url, secret, retryDelaysMs = DEFAULT_RETRY_DELAYS_MS }) {
    this.store = store;
    this.url = url || null;
    this.secret = secret;
    this.retryDelaysMs = retryDelaysMs;
    this.paused = false;
    this.stopped = false;
    /** @type {Map<string, { jobs: object[], running: boolean }>} */
    this.queues = new Map();
    this.unpauseWaiters = new Set();
    this.timers = new Set();
    this.requests = new Set();
    this.running = new Set();
  }

  /** Records an event for a state change and queues its delivery. */
  record(type, object, context, previousAttributes) {
    const event = {
      id: newId("evt"),
      object: "event",
      api_version: context.apiVersion ?? null,
      created: nowSeconds(),
      data: previousAttributes ? { object, previous_attributes: previousAttributes } : { object },
      livemode: false,
      pending_webhooks: this.url ? 1 : 0,
      request: { id: context.requestId ?? null, idempotency_key: context.idempotencyKey ?? null },
      type,
    };
    const entry = { event, delivery: { status: this.url ? "pending" : "no_endpoint", attempts: [] } };
    this.store.events.push(entry);
    this.store.save();
    if (this.url) this.#enqueue(entry);
    return event;
  }

  find(id) {
    return this.store.events.find((entry) => entry.event.id === id) ?? null;
  }

  /** Queues the stored event again, byte for byte (only the signature is fresh). */
  resend(id) {
    const entry = this.find(id);
    if (!entry) throw new ApiError(404, `No such event: '${id}'`, { param: "id", code: "resource_missing" });
    if (!this.url) throw new ApiError(409, "No webhook URL is set, so there is nowhere to send the event.");
    entry.delivery.status = "pending";
    this.store.save();
    this.#enqueue(entry);
    return entry;
  }

  /** Delivers what a previous run left undelivered, oldest first. */
  resumePending() {
    if (!this.url) return;
    for (const entry of this.store.events) if (entry.delivery.status === "pending") this.#enqueue(entry);
  }

  setPaused(paused) {
    this.paused = paused;
    if (!paused) {
      for (const wake of this.unpauseWaiters) wake();
      this.unpauseWaiters.clear();
    }
  }

  setUrl(url) {
    this.url = url || null;
  }

  status() {
    const counts = {};
    for (const { delivery } of this.store.events) counts[delivery.status] = (counts[delivery.status] ?? 0) + 1;
    return { url: this.url, paused: this.paused, deliveries: counts };
  }

  async stop() {
    this.stopped = true;
    for (const timer of this.timers) {
      clearTimeout(timer.handle);
      timer.wake();
    }
    for (const wake of this.unpauseWaiters) wake();
    for (const request of this.requests) request.destroy();
    await Promise.allSettled([...this.running]);
  }

  #enqueue(entry) {
    const key = entry.event.data.object.id ?? entry.event.id;
    let queue = this.queues.get(key);
    if (!queue) {
      queue = { jobs: [], running: false };
      this.queues.set(key, queue);
    }
    queue.jobs.push(entry);
    if (!queue.running) {
      const run = this.#drain(key, queue);
      this.running.add(run);
      run.finally(() => this.running.delete(run));
    }
  }

  async #drain(key, queue) {
    queue.running = true;
    try {
      while (queue.jobs.length > 0 && !this.stopped) {
        await this.#deliver(queue.jobs[0]);
        queue.jobs.shift();
      }
    } finally {
      queue.running = false;
      if (queue.jobs.length === 0 && this.queues.get(key) === queue) this.queues.delete(key);
    }
  }

  async #deliver(entry) {
    const { delivery } = entry;
    const maxTries = this.retryDelaysMs.length + 1;
    for (let attempt = 1; !this.stopped; attempt += 1) {
      if (this.paused) await new Promise((resolve) => this.unpauseWaiters.add(resolve));
      if (this.stopped) return; // stays "pending", so the next start sends it
      const url = this.url;
      if (!url) {
        delivery.status = "no_endpoint";
        this.store.save();
        return;
      }
      const result = await this.#post(url, JSON.stringify(entry.event));
      if (this.stopped && !result.ok) return;
      delivery.attempts.push({ at: nowSeconds(), status: result.status ?? null, error: result.error ?? null });
      if (delivery.attempts.length > KEPT_ATTEMPTS) delivery.attempts.splice(0, delivery.attempts.length - KEPT_ATTEMPTS);
      if (result.ok) {
        delivery.status = "delivered";
        this.store.save();
        return;
      }
      if (attempt >= maxTries) {
        delivery.status = "failed";
        this.store.save();
        console.warn(
          `payments-fake: gave up on ${entry.event.type} ${entry.event.id} after ${maxTries} tries (${result.error ?? `HTTP ${result.status}`})`,
        );
        return;
      }
      this.store.save();
      await this.#sleep(this.retryDelaysMs[attempt - 1]);
    }
  }

  #sleep(ms) {
    return new Promise((resolve) => {
      const timer = {
        wake: () => {
          this.timers.delete(timer);
          resolve();
        },
      };
      timer.handle = setTimeout(timer.wake, ms);
      this.timers.add(timer);
    });
  }

  /** One POST; resolves with the outcome instead of throwing, so retries stay in one place. */
  #post(url, payload) {
    return new Promise((resolve) => {
      let target;
      try {
        target = new URL(url);
      } catch {
        resolve({ ok: false, error: `invalid webhook URL ${url}` });
        return;
      }
      const client = target.protocol === "https:" ? https : http;
      const request = client.request(target, {
        method: "POST",
        // No keep-alive: a held socket would keep the app's server from closing in tests.
        agent: false,
        timeout: REQUEST_TIMEOUT_MS,
        headers: {
          "content-type": "application/json; charset=utf-8",
          "content-length": Buffer.byteLength(payload),
          "user-agent": "ohmstead-payments-fake",
          "stripe-signature": signatureHeader(payload, this.secret),
        },
      });
      this.requests.add(request);
      const finish = (outcome) => {
        this.requests.delete(request);
        resolve(outcome);
      };
      request.on("response", (response) => {
        response.resume();
        const status = response.statusCode ?? 0;
        finish({ ok: status >= 200 && status < 300, status });
      });
      request.on("timeout", () => request.destroy(new Error(`no answer within ${REQUEST_TIMEOUT_MS} ms`)));
      request.on("error", (error) => finish({ ok: false, error: error.code ?? error.message }));
      request.end(payload);
    });
  }
}

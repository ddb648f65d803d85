// Shared setup for the payments fake tests: a fake on a free port with its own
// folder, an SDK client pointed at it, and a webhook receiver that checks the
// signature of every delivery the way the app's handler will.
import { mkdtempSync, rmSync } from "node:fs";
import http from "node:http";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import Stripe from "stripe";
import {
  FAKE_STRIPE_SECRET_KEY,
  FAKE_STRIPE_WEBHOOK_SECRET,
  startPaymentsFake,
  type PaymentsFake,
  type PaymentsFakeOptions,
} from "../../../payments-fake/server.mjs";

export function clientFor(url: string, key: string = FAKE_STRIPE_SECRET_KEY): Stripe {
  return new Stripe(key, {
    host: "127.0.0.1",
    port: Number(new URL(url).port),
    protocol: "http",
    maxNetworkRetries: 0,
    telemetry: false,
  });
}

export function tempDirectory(): { path: string; remove: () => void } {
  const dir = mkdtempSync(path.join(os.tmpdir(), "ohmstead-payments-fake-"));
  return { path: dir, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

export interface Delivery {
  event: Stripe.Event;
  raw: string;
  signature: string;
}

export interface Receiver {
  url: string;
  /** Deliveries that verified and were answered 2xx, in arrival order. */
  deliveries: Delivery[];
  /** Every request, with the status it was answered with. */
  attempts: { type: string; status: number }[];
  /** Deliveries whose signature did not verify. */
  rejected: string[];
  /** Statuses to answer the next requests with; 200 after the list runs out. */
  answerNext(...statuses: number[]): void;
  types(): string[];
  waitFor(check: () => boolean, what: string, timeoutMs?: number): Promise<void>;
  close(): Promise<void>;
}

const verifier = new Stripe("sk_test_signature_checks_only");

export async function startReceiver(secret: string = FAKE_STRIPE_WEBHOOK_SECRET): Promise<Receiver> {
  const deliveries: Delivery[] = [];
  const attempts: { type: string; status: number }[] = [];
  const rejected: string[] = [];
  const planned: number[] = [];
  const server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on("data", (chunk: Buffer) => chunks.push(chunk));
    req.on("end", () => {
      const raw = Buffer.concat(chunks).toString("utf8");
      const signature = String(req.headers["stripe-signature"] ?? "");
      let event: Stripe.Event;
      try {
        event = verifier.webhooks.constructEvent(raw, signature, secret);
      } catch (error) {
        rejected.push((error as Error).message);
        res.writeHead(400).end();
        return;
      }
      const status = planned.shift() ?? 200;
      attempts.push({ type: event.type, status });
      if (status < 300) deliveries.push({ event, raw, signature });
      res.writeHead(status).end();
    });
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/webhooks/payments`,
    deliveries,
    attempts,
    rejected,
    answerNext: (...statuses) => planned.push(...statuses),
    types: () => deliveries.map((d) => d.event.type),
    waitFor: (check, what, timeoutMs = 15_000) => waitFor(check, what, timeoutMs),
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}

// Generous: the suite shares two cores with everything else a test run does.
export async function waitFor(check: () => boolean, what: string, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

export const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export interface Harness {
  fake: PaymentsFake;
  stripe: Stripe;
  receiver: Receiver | null;
  directory: string;
  close(): Promise<void>;
}

/** A fake with a fresh folder; with `webhooks: true` also a receiver it delivers to. */
export async function startHarness({
  webhooks = false,
  ...options
}: Partial<PaymentsFakeOptions> & { webhooks?: boolean } = {}): Promise<Harness> {
  const dir = tempDirectory();
  const receiver = webhooks ? await startReceiver() : null;
  const fake = await startPaymentsFake({ port: 0, directory: dir.path, webhookUrl: receiver?.url ?? null, ...options });
  return {
    fake,
    stripe: clientFor(fake.url),
    receiver,
    directory: dir.path,
    async close() {
      await fake.stop();
      await receiver?.close();
      dir.remove();
    },
  };
}

/** A typical permit-fee checkout, as the app will create it. */
export function permitFeeSession(stripe: Stripe, extra: Partial<Stripe.Checkout.SessionCreateParams> = {}) {
  return stripe.checkout.sessions.create({
    mode: "payment",
    line_items: [
      { quantity: 1, price_data: { currency: "usd", unit_amount: 18_500, product_data: { name: "Permit packet preparation" } } },
      { quantity: 2, price_data: { currency: "usd", unit_amount: 2_250, product_data: { name: "Utility interconnection filing" } } },
    ],
    success_url: "http://127.0.0.1:3999/projects/fernhollow-7/payment?session={CHECKOUT_SESSION_ID}",
    cancel_url: "http://127.0.0.1:3999/projects/fernhollow-7",
    client_reference_id: "project-fernhollow-7",
    customer_email: "ines.marlowe@bramblecourt.example",
    metadata: { projectId: "fernhollow-7", purpose: "permit-fee" },
    payment_intent_data: { metadata: { projectId: "fernhollow-7" } },
    ...extra,
  });
}

export const PERMIT_FEE_TOTAL = 18_500 + 2 * 2_250;

/** Drives a payment through the fake's JSON test control. */
export async function payWith(fakeUrl: string, sessionId: string, card: string) {
  const response = await fetch(`${fakeUrl}/_fake/checkout/sessions/${sessionId}/pay`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ card }),
  });
  return {
    status: response.status,
    body: (await response.json()) as {
      outcome: string;
      session: Stripe.Checkout.Session;
      payment_intent: Stripe.PaymentIntent;
      error?: { code: string; message: string };
    },
  };
}

export async function fakeEvents(fakeUrl: string, type?: string) {
  const response = await fetch(`${fakeUrl}/_fake/events${type ? `?type=${encodeURIComponent(type)}` : ""}`);
  return ((await response.json()) as { data: { event: Stripe.Event; delivery: { status: string; attempts: unknown[] } }[] }).data;
}

export async function setWebhooks(fakeUrl: string, body: { paused?: boolean; url?: string | null }) {
  const response = await fetch(`${fakeUrl}/_fake/webhooks`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  return response.json() as Promise<{ url: string | null; paused: boolean; deliveries: Record<string, number> }>;
}

import "server-only";
import Stripe from "stripe";
import { AppError } from "@/lib/errors";
import { env } from "../env";

let client: Stripe | undefined;

/**
 * The Stripe SDK for the configured account. With STRIPE_API_URL set (the local test-mode fake),
 * the same SDK calls go to that host instead; real test or live keys need no code change.
 */
export function stripe(): Stripe {
  const e = env();
  if (!e.STRIPE_SECRET_KEY) throw new AppError("CONFLICT", "Payments are not set up on this server: STRIPE_SECRET_KEY is missing.");
  if (!client) {
    const base = e.STRIPE_API_URL ? new URL(e.STRIPE_API_URL) : null;
    client = new Stripe(e.STRIPE_SECRET_KEY, {
      maxNetworkRetries: 2,
      telemetry: false,
      ...(base
        ? {
            host: base.hostname,
            port: Number(base.port || (base.protocol === "https:" ? 443 : 80)),
            protocol: base.protocol.replace(":", "") as "http" | "https",
          }
        : {}),
    });
  }
  return client;
}

/** Checks a webhook's signature with the SDK and returns the event; throws on a bad or stale signature. */
export function verifyWebhook(payload: string, signature: string | null): Stripe.Event {
  const secret = env().STRIPE_WEBHOOK_SECRET;
  if (!secret) throw new AppError("CONFLICT", "Payments are not set up on this server: STRIPE_WEBHOOK_SECRET is missing.");
  if (!signature) throw new AppError("INVALID_INPUT", "Missing Stripe-Signature header.");
  try {
    return stripe().webhooks.constructEvent(payload, signature, secret);
  } catch (error) {
    throw new AppError("INVALID_INPUT", `Webhook signature check failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}

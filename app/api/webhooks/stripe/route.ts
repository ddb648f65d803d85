import { NextResponse, type NextRequest } from "next/server";
import { isAppError } from "@/lib/errors";
import { applyProcessorEvent } from "@/lib/server/data/payment-events";
import { readBodyBounded, toErrorResponse } from "@/lib/server/http";
import { verifyWebhook } from "@/lib/server/services/payments";

// Events are a few kilobytes; anything far larger is not one.
const MAX_EVENT_BYTES = 512 * 1024;
const refuse = (status: 400 | 413, message: string) =>
  NextResponse.json({ error: { code: status === 400 ? "INVALID_INPUT" : "TOO_LARGE", message } }, { status });

// POST /api/webhooks/stripe – signed events from the payment processor; no session, the signature is the check
export async function POST(request: NextRequest) {
  // The signature covers the exact bytes sent, so the body is read as text before anything parses it.
  const bytes = await readBodyBounded(request, MAX_EVENT_BYTES).catch(() => null);
  if (bytes === null) return refuse(413, "Event too large.");
  const payload = new TextDecoder().decode(bytes);
  try {
    const event = verifyWebhook(payload, request.headers.get("stripe-signature"));
    // A 5xx from here makes the processor deliver the event again later; nothing was committed.
    return NextResponse.json({ received: true, outcome: await applyProcessorEvent(event) });
  } catch (error) {
    if (isAppError(error) && error.code === "INVALID_INPUT") return refuse(400, error.message);
    return toErrorResponse(error);
  }
}

import { NextResponse, type NextRequest } from "next/server";
import { applyProcessorEvent } from "@/lib/server/data/payment-events";
import { toErrorResponse } from "@/lib/server/http";
import { verifyWebhook } from "@/lib/server/services/payments";

const MAX_EVENT_BYTES = 512 * 1024;

// POST /api/webhooks/stripe – signed events from the payment processor; no session, the signature is the check
export async function POST(request: NextRequest) {
  // Events are a few kilobytes; anything far larger is not one, and is refused before it is read.
  if (Number(request.headers.get("content-length") ?? 0) > MAX_EVENT_BYTES) return NextResponse.json({ error: { code: "TOO_LARGE", message: "Event too large." } }, { status: 413 });
  let event;
  try {
    // The signature covers the exact bytes sent, so the body is read as text before anything parses it.
    const payload = await request.text();
    if (payload.length > MAX_EVENT_BYTES) return NextResponse.json({ error: { code: "TOO_LARGE", message: "Event too large." } }, { status: 413 });
    event = verifyWebhook(payload, request.headers.get("stripe-signature"));
  } catch (error) {
    const response = toErrorResponse(error);
    return response.status === 422 ? NextResponse.json(await response.json(), { status: 400 }) : response;
  }
  try {
    const outcome = await applyProcessorEvent(event);
    return NextResponse.json({ received: true, outcome });
  } catch (error) {
    // A 5xx makes the processor deliver the event again later; nothing was committed.
    return toErrorResponse(error);
  }
}

import { NextResponse, type NextRequest } from "next/server";
import { applyProcessorEvent } from "@/lib/server/data/payment-events";
import { toErrorResponse } from "@/lib/server/http";
import { verifyWebhook } from "@/lib/server/services/payments";

// POST /api/webhooks/stripe – signed events from the payment processor; no session, the signature is the check
export async function POST(request: NextRequest) {
  let event;
  try {
    // The signature covers the exact bytes sent, so the body is read as text before anything parses it.
    event = verifyWebhook(await request.text(), request.headers.get("stripe-signature"));
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

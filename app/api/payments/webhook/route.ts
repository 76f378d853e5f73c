import { NextResponse, type NextRequest } from "next/server";
import { applyPaymentEvent } from "@/lib/server/dal/booking-payments";
import { errorResponse } from "@/lib/server/http/errors";
import { verifyWebhook } from "@/lib/server/payments";

// POST /api/payments/webhook — the provider's signed events; a bad signature is 400, a replay changes nothing.
export async function POST(request: NextRequest) {
  try {
    const event = verifyWebhook(await request.text(), request.headers.get("stripe-signature"));
    const applied = await applyPaymentEvent(event);
    return NextResponse.json({ received: true, duplicate: !applied });
  } catch (err) {
    return errorResponse(err);
  }
}

import "server-only";
// The payment provider, through the official Stripe SDK only. Host, port and protocol come
// from the environment, so locally the SDK talks to scripts/payments-fake.ts on loopback.
import Stripe from "stripe";
import { env } from "@/lib/config/env";
import { ApiError } from "./http/errors";

const globalForStripe = globalThis as unknown as { fitframeStripe?: Stripe };

function stripe(): Stripe {
  const e = env();
  return (globalForStripe.fitframeStripe ??= new Stripe(e.STRIPE_SECRET_KEY, {
    host: e.STRIPE_API_HOST,
    port: e.STRIPE_API_PORT ?? e.PAYMENTS_PORT,
    protocol: e.STRIPE_API_PROTOCOL,
    maxNetworkRetries: 1,
    timeout: 10_000,
    telemetry: false,
  }));
}

export type CheckoutRequest = {
  bookingId: string;
  description: string;
  amountMinor: number;
  currency: string;
  email: string;
  successUrl: string;
  cancelUrl: string;
};

/** A hosted payment page for one booking's fee (the SDK adds its own idempotency key on retries). */
export async function createCheckout(req: CheckoutRequest): Promise<{ sessionId: string; url: string }> {
  const session = await stripe().checkout.sessions.create(
    {
      mode: "payment",
      client_reference_id: req.bookingId,
      customer_email: req.email,
      metadata: { booking_id: req.bookingId },
      line_items: [{ quantity: 1, price_data: { currency: req.currency, unit_amount: req.amountMinor, product_data: { name: req.description } } }],
      success_url: req.successUrl,
      cancel_url: req.cancelUrl,
    },
  );
  if (!session.url) throw new ApiError("internal_error", "The payment provider gave no payment page");
  return { sessionId: session.id, url: session.url };
}

/** Asks for a full refund; the refund is recorded when its webhook arrives. */
export async function requestRefund(paymentIntentId: string, bookingId: string): Promise<string> {
  const refund = await stripe().refunds.create(
    { payment_intent: paymentIntentId, metadata: { booking_id: bookingId } },
    { idempotencyKey: `refund-${paymentIntentId}` },
  );
  return refund.id;
}

/** Verifies the provider's signature on a webhook body (raw text); a bad one is a 400. */
export function verifyWebhook(payload: string, signature: string | null): Stripe.Event {
  if (!signature) throw new ApiError("bad_request", "Missing Stripe-Signature header");
  try {
    return stripe().webhooks.constructEvent(payload, signature, env().STRIPE_WEBHOOK_SECRET);
  } catch {
    throw new ApiError("bad_request", "Webhook signature verification failed");
  }
}

import "server-only";
// The fitting fee. Payment state changes only when a signed provider event arrives, and each
// event id is applied once (payment_events), so a replayed event changes nothing.
import { and, desc, eq, inArray } from "drizzle-orm";
import type Stripe from "stripe";
import { db, schema } from "@/db";
import { env } from "@/lib/config/env";
import { assertGolfer, type SignedInActor } from "../access";
import { ApiError, forbidden, notFound } from "../http/errors";
import { createCheckout, requestRefund } from "../payments";

const { bookings, payments, paymentEvents, fittingTypes, studios, users, golfers } = schema;

/** Opens the provider's payment page for a booking's fee: its golfer or the studio's staff. */
export async function startPayment(actor: SignedInActor, bookingId: string) {
  const [row] = await db.select({ booking: bookings, typeName: fittingTypes.name, studioName: studios.name, slug: studios.slug, golfer: golfers })
    .from(bookings).innerJoin(fittingTypes, eq(fittingTypes.id, bookings.fittingTypeId)).innerJoin(studios, eq(studios.id, bookings.studioId))
    .innerJoin(golfers, eq(golfers.id, bookings.golferId)).where(eq(bookings.id, bookingId));
  if (!row) throw notFound("No such booking");
  const { booking } = row;
  await assertGolfer(actor, "golfer.read", { studioId: booking.studioId, golferId: booking.golferId }, "No such booking");
  if (actor.role === "coach") throw forbidden();
  if (!["requested", "confirmed"].includes(booking.status)) throw new ApiError("conflict", `This booking is ${booking.status}`);
  if (booking.feeMinor <= 0) throw new ApiError("conflict", "This fitting has no fee");
  const [settled] = await db.select().from(payments).where(and(eq(payments.bookingId, bookingId), inArray(payments.state, ["paid", "refund_pending"])));
  if (settled) throw new ApiError("conflict", "The fee is already paid");
  const account = row.golfer.userId ? (await db.select({ email: users.email }).from(users).where(eq(users.id, row.golfer.userId)))[0] : undefined;
  const base = env().NEXTAUTH_URL;
  const back = `${base}/book/${row.slug}/bookings`;
  const checkout = await createCheckout({
    bookingId, description: `${row.typeName} — ${row.studioName}`, amountMinor: booking.feeMinor, currency: booking.currency,
    email: row.golfer.email ?? account?.email ?? "", successUrl: `${back}?paid=${bookingId}`, cancelUrl: back,
  });
  await db.insert(payments).values({ studioId: booking.studioId, bookingId, checkoutSessionId: checkout.sessionId, amountMinor: booking.feeMinor, currency: booking.currency });
  return { url: checkout.url };
}

/** Asks the provider to refund a paid fee; the refund is final when its webhook arrives. */
export async function refundIfPaid(bookingId: string): Promise<boolean> {
  const [paid] = await db.select().from(payments).where(and(eq(payments.bookingId, bookingId), eq(payments.state, "paid"))).orderBy(desc(payments.paidAt));
  return paid ? refundPayment(paid) : false;
}

async function refundPayment(paid: typeof payments.$inferSelect): Promise<boolean> {
  if (!paid.paymentIntentId) return false;
  const refundId = await requestRefund(paid.paymentIntentId, paid.bookingId);
  await db.update(payments).set({ state: "refund_pending", refundId, updatedAt: new Date() }).where(and(eq(payments.id, paid.id), eq(payments.state, "paid")));
  return true;
}

/** A payment that lands on a closed booking, or a second payment of one fee, goes straight back. */
async function settleLatePayment(checkoutSessionId: string) {
  const [paid] = await db.select().from(payments).where(and(eq(payments.checkoutSessionId, checkoutSessionId), eq(payments.state, "paid")));
  if (!paid) return;
  const [booking] = await db.select({ status: bookings.status }).from(bookings).where(eq(bookings.id, paid.bookingId));
  const others = await db.select({ id: payments.id, paidAt: payments.paidAt }).from(payments)
    .where(and(eq(payments.bookingId, paid.bookingId), inArray(payments.state, ["paid", "refund_pending"])));
  // Of two payments of one fee the first one stays, whichever webhook is handled first.
  const key = (p: { id: string; paidAt: Date | null }) => `${p.paidAt?.toISOString() ?? ""}|${p.id}`;
  const earlier = others.some((o) => o.id !== paid.id && key(o) < key(paid));
  if (booking?.status === "cancelled" || booking?.status === "declined" || earlier) await refundPayment(paid);
}

/** Applies one verified provider event; `false` when this event id was seen before. */
export async function applyPaymentEvent(event: Stripe.Event): Promise<boolean> {
  const applied = await db.transaction(async (tx) => {
    const [fresh] = await tx.insert(paymentEvents).values({ eventId: event.id, type: event.type }).onConflictDoNothing().returning();
    if (!fresh) return false;
    const now = new Date();
    if (event.type === "checkout.session.completed" && event.data.object.payment_status === "paid") {
      const session = event.data.object;
      const intent = typeof session.payment_intent === "string" ? session.payment_intent : (session.payment_intent?.id ?? null);
      await tx.update(payments).set({ state: "paid", paymentIntentId: intent, paidAt: now, updatedAt: now })
        .where(and(eq(payments.checkoutSessionId, session.id), eq(payments.state, "pending")));
    } else if (event.type === "charge.refunded" && event.data.object.refunded) {
      const intent = event.data.object.payment_intent;
      const id = typeof intent === "string" ? intent : intent?.id;
      if (id) await tx.update(payments).set({ state: "refunded", refundedAt: now, updatedAt: now }).where(eq(payments.paymentIntentId, id));
    }
    return true;
  });
  if (applied && event.type === "checkout.session.completed") await settleLatePayment(event.data.object.id);
  return applied;
}

/** A line for the spec: the paid fee of the booking behind a fitting, credited toward the putter order. */
export async function feeCreditNote(actor: SignedInActor, fittingId: string): Promise<string | null> {
  const [row] = await db.select({ booking: bookings, payment: payments }).from(bookings)
    .innerJoin(payments, and(eq(payments.bookingId, bookings.id), eq(payments.state, "paid")))
    .where(and(eq(bookings.fittingId, fittingId), eq(bookings.creditTowardOrder, true)));
  if (!row) return null;
  await assertGolfer(actor, "golfer.read", { studioId: row.booking.studioId, golferId: row.booking.golferId }, "No such fitting");
  const amount = new Intl.NumberFormat("en-GB", { style: "currency", currency: row.payment.currency.toUpperCase() }).format(row.payment.amountMinor / 100);
  return `The fitting fee of ${amount} is credited toward the putter order.`;
}

// Booking against the real stack: PostgreSQL's exclusion constraint under concurrent
// requests, the Stripe SDK against the local payments fake, signed webhooks, refunds, and
// the e-mails with their .ics read back from the mail catcher.
import Stripe from "stripe";
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { env } from "@/lib/config/env";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD } from "../../support/world";
import { icsUtc, icsValue } from "../../unit/booking/ics-fields";
import { freeSlots, mailTo, newGolfer, PAYMENTS_URL, until, withBooking, type BookingWorld } from "./booking-world";

let w: BookingWorld;
const signer = new Stripe("sk_test_unused").webhooks;

beforeAll(async () => {
  w = await withBooking(await makeWorld());
});

/** Books the first free slot at least `daysAhead` days away (the notice rule is 48 h). */
async function bookFirstSlot(auth: Parameters<typeof call>[0], daysAhead = 0) {
  const slot = (await freeSlots(w.studioA.slug, w.types.A.id)).find((s) => Date.parse(s.start) > Date.now() + daysAhead * 86_400_000)!;
  const res = await call(auth, "POST", `/api/booking/studios/${w.studioA.slug}/bookings`, {
    fittingTypeId: w.types.A.id, fitterUserId: slot.fitterUserId, startsAt: slot.start, intake: { usualMiss: "pushes short putts right" },
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: string; startsAt: string };
}

async function payThroughFake(auth: Parameters<typeof call>[0], bookingId: string) {
  const pay = await call(auth, "POST", `/api/booking/bookings/${bookingId}/pay`);
  expect(pay.status, JSON.stringify(pay.body)).toBe(201);
  expect(pay.body.url.startsWith(`${PAYMENTS_URL}/pay/`)).toBe(true);
  const sessionId = pay.body.url.split("/").pop();
  const done = await (await fetch(`${PAYMENTS_URL}/_test/checkout/sessions/${sessionId}/complete`, { method: "POST" })).json();
  expect(done.status).toBe(200);
  return { sessionId, eventId: done.eventId as string };
}

const paymentOf = async (bookingId: string) => (await db.select().from(schema.payments).where(eq(schema.payments.bookingId, bookingId)))[0];

describe("slots", () => {
  it("are public, in the studio's local time, and 09:00 London maps to UTC by the date's offset", async () => {
    const studio = await call(null, "GET", `/api/booking/studios/${w.studioA.slug}`);
    expect(studio.status).toBe(200);
    expect(studio.body.fittingTypes).toEqual([expect.objectContaining({ name: "Full putter fitting", feeMinor: 9500 })]);
    const slots = await freeSlots(w.studioA.slug, w.types.A.id);
    // 09:00–17:00, 60 min + 15 min buffer: 09:00, 10:15, 11:30, 12:45, 14:00, 15:15 (16:30 would end 17:30).
    const times = [...new Set(slots.map((s) => s.time))].sort();
    expect(times).toEqual(["09:00", "10:15", "11:30", "12:45", "14:00", "15:15"]);
    const nineOClock = slots.find((s) => s.time === "09:00")!;
    const offsetHours = (Date.parse(`${nineOClock.day}T09:00:00Z`) - Date.parse(nineOClock.start)) / 3_600_000;
    expect([0, 1]).toContain(offsetHours); // GMT or BST (IANA tz database)
    expect(new Set(slots.map((s) => s.day)).size).toBeGreaterThanOrEqual(54); // about 8 weeks of days
  });
});

describe("booking one slot", () => {
  it("ten golfers at once: exactly one wins (201), the rest get 409", async () => {
    const golfers = await Promise.all(Array.from({ length: 10 }, (_, i) => newGolfer(w.studioA.id, `racer${i}`)));
    const slot = (await freeSlots(w.studioA.slug, w.types.A.id))[3]!;
    const body = { fittingTypeId: w.types.A.id, fitterUserId: slot.fitterUserId, startsAt: slot.start };
    const results = await Promise.all(golfers.map((g) => call(g.auth, "POST", `/api/booking/studios/${w.studioA.slug}/bookings`, body)));
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409, 409, 409, 409, 409, 409, 409]);
    expect(results.find((r) => r.status === 409)!.body.error.code).toBe("conflict");
    const held = await db.select().from(schema.bookings).where(eq(schema.bookings.startsAt, new Date(slot.start)));
    expect(held.filter((b) => b.fitterUserId === slot.fitterUserId)).toHaveLength(1);
    expect((await freeSlots(w.studioA.slug, w.types.A.id)).some((s) => s.start === slot.start)).toBe(false);
  });

  it("a start that is not an offered slot is refused", async () => {
    const g = await newGolfer(w.studioA.id, "offgrid");
    const slot = (await freeSlots(w.studioA.slug, w.types.A.id))[0]!;
    const res = await call(g.auth, "POST", `/api/booking/studios/${w.studioA.slug}/bookings`, {
      fittingTypeId: w.types.A.id, fitterUserId: slot.fitterUserId, startsAt: new Date(Date.parse(slot.start) + 5 * 60_000).toISOString(),
    });
    expect(res.status).toBe(409);
  });

  it("a visitor creates a golfer account on the booking page and signs in with it", async () => {
    const email = `walk-in.${w.tag}@test.fitframe`;
    const made = await call(null, "POST", `/api/booking/studios/${w.studioA.slug}/accounts`, { name: "Walk In", email, password: PASSWORD });
    expect(made.status).toBe(201);
    expect((await call(null, "POST", `/api/booking/studios/${w.studioA.slug}/accounts`, { name: "Again", email, password: PASSWORD })).status).toBe(409);
    expect((await call(null, "POST", `/api/booking/studios/${w.studioA.slug}/accounts`, { name: "X", email: `x.${email}`, password: PASSWORD }, { origin: "http://evil.test" })).status).toBe(403);
    const { cookie } = await signIn(email, PASSWORD);
    expect(cookie).toBeTruthy();
    const me = await call({ cookie: cookie! }, "GET", "/api/me");
    expect(me.body.role).toBe("golfer");
  });

  it("makes at most 10 accounts an hour from one address, then answers 429", async () => {
    // Addresses from TEST-NET-3 (RFC 5737), kept apart from the loopback calls of other tests.
    const from = (ip: string, n: number) =>
      call(null, "POST", `/api/booking/studios/${w.studioA.slug}/accounts`, { name: `Signup ${n}`, email: `signup.${n}.${ip}.${w.tag}@test.fitframe`, password: PASSWORD }, { "x-forwarded-for": ip });
    const made = [];
    for (let n = 0; n < 10; n++) made.push((await from("203.0.113.21", n)).status);
    expect(made).toEqual(Array(10).fill(201));
    const refused = await from("203.0.113.21", 10);
    expect(refused.status).toBe(429);
    expect(refused.body.error).toMatchObject({ code: "rate_limited" });
    expect(refused.body.error.message).toMatch(/Too many new accounts/);
    expect((await from("203.0.113.22", 0)).status).toBe(201);
  });
});

describe("fee and webhook", () => {
  it("payment state comes from the signed webhook; the same event again changes nothing", async () => {
    const g = await newGolfer(w.studioA.id, "payer");
    const booking = await bookFirstSlot(g.auth);
    expect((await call(g.auth, "GET", `/api/booking/bookings/${booking.id}`)).body.payment).toBeNull();
    const { eventId } = await payThroughFake(g.auth, booking.id);
    const paid = await paymentOf(booking.id);
    expect(paid).toMatchObject({ state: "paid", amountMinor: 9500, currency: "gbp" });
    expect(paid!.paymentIntentId).toMatch(/^pi_/);
    expect((await call(g.auth, "GET", `/api/booking/bookings/${booking.id}`)).body.payment.state).toBe("paid");

    const replay = await (await fetch(`${PAYMENTS_URL}/_test/events/${eventId}/resend`, { method: "POST" })).json();
    expect(replay.status).toBe(200);
    expect(JSON.parse(replay.answer)).toEqual({ received: true, duplicate: true });
    const after = await paymentOf(booking.id);
    expect(after!.paidAt!.getTime()).toBe(paid!.paidAt!.getTime());
    expect(after!.updatedAt.getTime()).toBe(paid!.updatedAt.getTime());
    expect((await call(g.auth, "POST", `/api/booking/bookings/${booking.id}/pay`)).status).toBe(409);
  });

  it("refuses a bad or missing signature (400) and accepts one made with the shared secret", async () => {
    const payload = JSON.stringify({ id: `evt_test_${w.tag}`, object: "event", type: "customer.created", data: { object: {} } });
    const post = (headers: Record<string, string>) => fetch(`${process.env.TEST_BASE_URL}/api/payments/webhook`, { method: "POST", headers: { "content-type": "application/json", ...headers }, body: payload });
    expect((await post({})).status).toBe(400);
    const forged = signer.generateTestHeaderString({ payload, secret: "whsec_not_the_secret" });
    expect((await post({ "stripe-signature": forged })).status).toBe(400);
    const stale = signer.generateTestHeaderString({ payload, secret: env().STRIPE_WEBHOOK_SECRET, timestamp: Math.floor(Date.now() / 1000) - 3600 });
    expect((await post({ "stripe-signature": stale })).status).toBe(400); // outside the SDK's 300 s tolerance
    const good = signer.generateTestHeaderString({ payload, secret: env().STRIPE_WEBHOOK_SECRET });
    const ok = await post({ "stripe-signature": good });
    expect(ok.status).toBe(200);
    expect(await ok.json()).toEqual({ received: true, duplicate: false });
  });

  it("a golfer cancelling inside the notice rule is refunded (state from the refund webhook)", async () => {
    const g = await newGolfer(w.studioA.id, "canceller");
    const booking = await bookFirstSlot(g.auth, 3);
    await payThroughFake(g.auth, booking.id);
    const cancel = await call(g.auth, "POST", `/api/booking/bookings/${booking.id}/cancel`);
    expect(cancel.status).toBe(200);
    expect(cancel.body).toMatchObject({ status: "cancelled", refund: true });
    const refunded = await until(() => paymentOf(booking.id), (p) => p?.state === "refunded");
    expect(refunded).toMatchObject({ state: "refunded" });
    expect(refunded!.refundId).toMatch(/^re_/);
  });

  it("a payment that lands after the booking was cancelled is refunded at once", async () => {
    const g = await newGolfer(w.studioA.id, "latepayer");
    const booking = await bookFirstSlot(g.auth, 3);
    const pay = await call(g.auth, "POST", `/api/booking/bookings/${booking.id}/pay`);
    expect((await call(g.auth, "POST", `/api/booking/bookings/${booking.id}/cancel`)).body.refund).toBe(false);
    const sessionId = pay.body.url.split("/").pop();
    expect((await (await fetch(`${PAYMENTS_URL}/_test/checkout/sessions/${sessionId}/complete`, { method: "POST" })).json()).status).toBe(200);
    expect((await until(() => paymentOf(booking.id), (p) => p?.state === "refunded"))!.state).toBe("refunded");
  });

  it("a golfer cancelling outside the notice rule keeps the slot's fee with the studio", async () => {
    const g = await newGolfer(w.studioB.id, "late");
    const admin = { cookie: (await signIn(w.otherAdmin.email, PASSWORD)).cookie! };
    expect((await call(admin, "PATCH", "/api/booking/settings", { cancelNoticeHours: 720 })).status).toBe(200);
    const slot = (await freeSlots(w.studioB.slug, w.types.B.id))[0]!;
    const made = await call(g.auth, "POST", `/api/booking/studios/${w.studioB.slug}/bookings`, { fittingTypeId: w.types.B.id, fitterUserId: slot.fitterUserId, startsAt: slot.start });
    expect(made.status).toBe(201);
    await payThroughFake(g.auth, made.body.id);
    const cancel = await call(g.auth, "POST", `/api/booking/bookings/${made.body.id}/cancel`);
    expect(cancel.body).toMatchObject({ status: "cancelled", refund: false });
    expect((await paymentOf(made.body.id))!.state).toBe("paid");
    const mail = await until(() => mailTo(g.email), (m) => m.length > 0);
    expect(mail[0]!.text).toContain("not refunded");
  });
});

describe("the studio's answer and the e-mails", () => {
  it("a paid fee shows on the fitting page and is credited on the spec", async () => {
    const g = await newGolfer(w.studioA.id, "credited");
    const booking = await bookFirstSlot(g.auth);
    const fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
    expect((await call(fitter, "POST", `/api/booking/bookings/${booking.id}/confirm`)).status).toBe(200);
    await payThroughFake(g.auth, booking.id);
    const [fitting] = await db.select().from(schema.fittings).where(eq(schema.fittings.golferId, g.golferId));
    const page = await call(fitter, "GET", `/studio/fittings/${fitting!.id}`);
    expect(page.body).toContain('data-fee-state="paid"');
    const build = await call(fitter, "POST", `/api/fittings/${fitting!.id}/builds`, { label: "Chosen" });
    const spec = await call(fitter, "POST", `/api/fittings/${fitting!.id}/specs`, { buildId: build.body.id, notes: "Grip logo up.", sendEmail: false });
    expect(spec.status, JSON.stringify(spec.body)).toBe(201);
    expect(spec.body.spec.data.notes).toBe("Grip logo up.\nThe fitting fee of £95.00 is credited toward the putter order.");
  });

  it("confirming sends an e-mail with a valid .ics; the visit becomes a planned fitting", async () => {
    const g = await newGolfer(w.studioA.id, "confirmed");
    const booking = await bookFirstSlot(g.auth);
    const fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
    const res = await call(fitter, "POST", `/api/booking/bookings/${booking.id}/confirm`);
    expect(res.status).toBe(200);
    expect(res.body.status).toBe("confirmed");
    expect((await call(fitter, "POST", `/api/booking/bookings/${booking.id}/confirm`)).status).toBe(409);
    const fittings = await db.select().from(schema.fittings).where(eq(schema.fittings.golferId, g.golferId));
    expect(fittings.map((f) => f.scheduledAt.toISOString())).toEqual([booking.startsAt]);
    expect(fittings[0]).toMatchObject({ status: "planned", fitterUserId: w.fitter.id });

    const [mail] = await until(() => mailTo(g.email), (m) => m.length > 0);
    expect(mail!.subject).toContain("confirmed");
    const ics = mail!.attachments.find((a) => a.filename.endsWith(".ics"))!;
    expect(ics.contentType).toContain("text/calendar");
    const text = Buffer.from(ics.contentBase64, "base64").toString("utf8");
    expect(icsValue(text, "BEGIN")).toBe("VCALENDAR");
    expect(icsUtc(icsValue(text, "DTSTART"))?.toISOString()).toBe(booking.startsAt.replace(/\.\d+Z$/, ".000Z"));
    expect(icsUtc(icsValue(text, "DTEND"))!.getTime() - icsUtc(icsValue(text, "DTSTART"))!.getTime()).toBe(60 * 60_000);
    expect(icsValue(text, "SUMMARY")).toBe(`Full putter fitting at ${w.studioA.name}`);
    expect(icsValue(text, "UID")).toBe(`booking-${booking.id}@fitframe`);
  });

  it("a reminder goes out once for a confirmed visit within 24 hours, with the .ics", async () => {
    const g = await newGolfer(w.studioB.id, "soon");
    const start = new Date(Date.now() + 6 * 3_600_000);
    const [row] = await db.insert(schema.bookings).values({
      studioId: w.studioB.id, golferId: g.golferId, fitterUserId: w.otherAdmin.id, fittingTypeId: w.types.B.id, status: "confirmed",
      startsAt: start, endsAt: new Date(start.getTime() + 3_600_000), blockedUntil: new Date(start.getTime() + 4_500_000), feeMinor: 9500, currency: "gbp",
    }).returning();
    const admin = { cookie: (await signIn(w.otherAdmin.email, PASSWORD)).cookie! };
    expect((await call(admin, "POST", "/api/booking/reminders")).body).toEqual({ sent: 1 });
    expect((await call(admin, "POST", "/api/booking/reminders")).body).toEqual({ sent: 0 });
    const [mail] = await until(() => mailTo(g.email), (m) => m.length > 0);
    expect(mail!.subject).toContain("Reminder");
    const text = Buffer.from(mail!.attachments[0]!.contentBase64, "base64").toString("utf8");
    expect(icsValue(text, "UID")).toBe(`booking-${row!.id}@fitframe`);
    expect(icsUtc(icsValue(text, "DTSTART"))!.getTime()).toBe(Math.floor(start.getTime() / 1000) * 1000);
  });

  it("declining frees the slot; rescheduling moves a booking to another free slot", async () => {
    const g = await newGolfer(w.studioA.id, "mover");
    const booking = await bookFirstSlot(g.auth, 3);
    const target = (await freeSlots(w.studioA.slug, w.types.A.id)).find((s) => Date.parse(s.start) > Date.parse(booking.startsAt))!;
    const moved = await call(g.auth, "POST", `/api/booking/bookings/${booking.id}/reschedule`, { startsAt: target.start });
    expect(moved.status).toBe(200);
    expect(moved.body.startsAt).toBe(target.start);
    expect((await freeSlots(w.studioA.slug, w.types.A.id)).some((s) => s.start === booking.startsAt)).toBe(true);
    const admin = { cookie: (await signIn(w.admin.email, PASSWORD)).cookie! };
    expect((await call(admin, "POST", `/api/booking/bookings/${booking.id}/decline`)).body.status).toBe("declined");
    expect((await freeSlots(w.studioA.slug, w.types.A.id)).some((s) => s.start === target.start)).toBe(true);
  });
});

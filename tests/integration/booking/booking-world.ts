// Booking set-up on top of the shared test world: studios in Europe/London, a fitting type
// each, the fitter (studio A) and the other admin (studio B) open every day 09:00–17:00.
import { randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { call, type Auth } from "../../support/http";
import { PASSWORD, tokenFor, type World } from "../../support/world";

export const PAYMENTS_URL = `http://127.0.0.1:${process.env.PAYMENTS_PORT ?? 4242}`;
const MAIL = process.env.MAIL_URL ?? "http://127.0.0.1:1080";

export async function withBooking(w: World) {
  const types: Record<"A" | "B", typeof schema.fittingTypes.$inferSelect> = {} as never;
  for (const [key, studio, fitterId] of [["A", w.studioA, w.fitter.id], ["B", w.studioB, w.otherAdmin.id]] as const) {
    await db.update(schema.studios).set({ timeZone: "Europe/London" }).where(eq(schema.studios.id, studio.id));
    const [type] = await db.insert(schema.fittingTypes).values({ studioId: studio.id, name: "Full putter fitting", durationMin: 60, bufferMin: 15, feeMinor: 9500 }).returning();
    types[key] = type!;
    await db.insert(schema.availabilityRules).values([1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ studioId: studio.id, fitterUserId: fitterId, weekday, startMinute: 540, endMinute: 1020 })));
  }
  return { ...w, types };
}
export type BookingWorld = Awaited<ReturnType<typeof withBooking>>;

/** A booking straight in the database at a time no test asks for through the API (days 60+ ahead). */
let offset = 0;
export async function insertBooking(w: BookingWorld, golfer: { golfer: { id: string; studioId: string } }, status: "requested" | "confirmed" = "requested") {
  const inB = golfer.golfer.studioId === w.studioB.id;
  const start = new Date(Date.UTC(2027, 6, 1) + offset++ * 2 * 3_600_000);
  const [row] = await db.insert(schema.bookings).values({
    studioId: golfer.golfer.studioId, golferId: golfer.golfer.id, fitterUserId: inB ? w.otherAdmin.id : w.fitter.id,
    fittingTypeId: (inB ? w.types.B : w.types.A).id, startsAt: start, endsAt: new Date(start.getTime() + 3_600_000),
    blockedUntil: new Date(start.getTime() + 4_500_000), feeMinor: 9500, currency: "gbp", status,
  }).returning();
  return row!;
}

export async function freeSlots(slug: string, fittingTypeId: string) {
  const res = await call(null, "GET", `/api/booking/studios/${slug}/slots?fittingTypeId=${fittingTypeId}`);
  return res.body.slots as { fitterUserId: string; start: string; end: string; day: string; time: string }[];
}

/** A new golfer account of a studio with a Bearer token (no browser session needed). */
export async function newGolfer(studioId: string, label: string): Promise<{ auth: Auth; golferId: string; email: string }> {
  const email = `${label}.${randomBytes(4).toString("hex")}@test.fitframe`;
  const [user] = await db.insert(schema.users).values({ studioId, role: "golfer", email, name: label, passwordHash: bcrypt.hashSync(PASSWORD, 4) }).returning();
  const [golfer] = await db.insert(schema.golfers).values({ studioId, userId: user!.id, name: label, email }).returning();
  return { auth: { token: (await tokenFor(user!.id)).value }, golferId: golfer!.id, email };
}

export async function mailTo(email: string) {
  const res = await fetch(`${MAIL}/messages?to=${encodeURIComponent(email)}`);
  return (await res.json()) as { subject: string; text: string; to: string[]; attachments: { filename: string; contentType: string; contentBase64: string }[] }[];
}

export async function until<T>(what: () => Promise<T>, ok: (v: T) => boolean, ms = 5000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const value = await what();
    if (ok(value) || Date.now() > end) return value;
    await new Promise((r) => setTimeout(r, 100));
  }
}

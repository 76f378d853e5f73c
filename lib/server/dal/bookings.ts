import "server-only";
// Booking a fitting slot and the studio's answers to it. The database refuses two live
// bookings that overlap on one fitter's diary (exclusion constraint), so a race has one winner.
import { and, asc, desc, eq, gte, inArray, isNull, lt, type SQL } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import type { bookingCreateSchema, bookingListQuery, rescheduleSchema } from "@/lib/booking/schemas";
import { refundOnCancel, withinNotice } from "@/lib/booking/notice";
import { assertGolfer, assertStudio, type SignedInActor } from "../access";
import { ApiError, forbidden, notFound } from "../http/errors";
import { pgErrorCode } from "../pg-errors";
import { sendBookingMail } from "./booking-mail";
import { changeMeasureInput, clipsMeasuredWith } from "./measure-inputs";
import { refundIfPaid } from "./booking-payments";
import { BOOKING_WEEKS, findFreeSlot, fittingTypeOf, studioBySlug } from "./booking-slots";

const { bookings, golfers, users, fittingTypes, payments, fittings, builds, bookingSettings } = schema;

const isStaff = (actor: SignedInActor) => actor.role === "admin" || actor.role === "fitter";

const isOverlap = (err: unknown) => pgErrorCode(err) === "23P01";
const slotTaken = () => new ApiError("conflict", "That slot has just been taken. Please pick another.");

/** The booking, once the actor may see it (its golfer, the studio's staff, a coach it is shared with). */
async function loadBooking(actor: SignedInActor, id: string) {
  const [row] = await db.select().from(bookings).where(eq(bookings.id, id));
  if (!row) throw notFound("No such booking");
  await assertGolfer(actor, "golfer.read", { studioId: row.studioId, golferId: row.golferId }, "No such booking");
  return row;
}

async function noticeHours(studioId: string) {
  const [s] = await db.select({ h: bookingSettings.cancelNoticeHours }).from(bookingSettings).where(eq(bookingSettings.studioId, studioId));
  return s?.h ?? 48;
}

export async function createBooking(actor: SignedInActor, slug: string, input: z.infer<typeof bookingCreateSchema>) {
  const studio = await studioBySlug(slug);
  if (actor.role !== "golfer" || !actor.golferId) throw forbidden("Sign in with a golfer account to book");
  if (actor.studioId !== studio.id) throw forbidden("Your account belongs to another studio");
  if (input.startsAt.getTime() > Date.now() + BOOKING_WEEKS * 7 * 86_400_000) throw new ApiError("unprocessable", `Book within the next ${BOOKING_WEEKS} weeks`);
  const type = await fittingTypeOf(studio.id, input.fittingTypeId);
  const slot = await findFreeSlot({ studio, type, fitterUserId: input.fitterUserId, startsAt: input.startsAt });
  if (!slot) throw slotTaken();
  try {
    const [row] = await db.insert(bookings).values({
      studioId: studio.id, golferId: actor.golferId, fitterUserId: slot.fitterUserId, fittingTypeId: type.id,
      startsAt: slot.start, endsAt: slot.end, blockedUntil: slot.blockedUntil, feeMinor: type.feeMinor, currency: studio.currency, intake: input.intake,
    }).returning();
    if (input.handedness) {
      const golferId = actor.golferId;
      await changeMeasureInput((tx) => tx.update(golfers).set({ handedness: input.handedness, updatedAt: new Date() }).where(eq(golfers.id, golferId)), clipsMeasuredWith.golfer(golferId), actor.userId);
    }
    return row!;
  } catch (err) {
    if (isOverlap(err)) throw slotTaken();
    throw err;
  }
}

const listColumns = {
  booking: bookings, golferName: golfers.name, fitterName: users.name, fittingTypeName: fittingTypes.name, timeZone: schema.studios.timeZone,
};

/** Staff: the studio's bookings in a span (the calendar). A golfer: its own bookings. */
export async function listBookings(actor: SignedInActor, query: z.infer<typeof bookingListQuery>) {
  const scope: SQL[] = [];
  if (actor.role === "golfer" && actor.golferId) scope.push(eq(bookings.golferId, actor.golferId));
  else {
    assertStudio(actor, "bookings.manage");
    scope.push(eq(bookings.studioId, actor.studioId));
  }
  if (query.from) scope.push(gte(bookings.startsAt, query.from));
  if (query.to) scope.push(lt(bookings.startsAt, query.to));
  const rows = await db.select(listColumns).from(bookings)
    .innerJoin(golfers, eq(golfers.id, bookings.golferId))
    .innerJoin(users, eq(users.id, bookings.fitterUserId))
    .innerJoin(fittingTypes, eq(fittingTypes.id, bookings.fittingTypeId))
    .innerJoin(schema.studios, eq(schema.studios.id, bookings.studioId))
    .where(and(...scope))
    .orderBy(actor.role === "golfer" ? desc(bookings.startsAt) : asc(bookings.startsAt));
  return withPayments(rows);
}

type ListRow = { booking: typeof bookings.$inferSelect; golferName: string; fitterName: string; fittingTypeName: string; timeZone: string };

/** Each booking with its fee's latest settled payment (or the open one). */
async function withPayments(rows: ListRow[]) {
  const ids = rows.map((r) => r.booking.id);
  const pays = ids.length ? await db.select().from(payments).where(inArray(payments.bookingId, ids)).orderBy(desc(payments.createdAt)) : [];
  return rows.map(({ booking, ...names }) => {
    const latest = pays.find((p) => p.bookingId === booking.id && p.state !== "pending") ?? pays.find((p) => p.bookingId === booking.id);
    return { ...booking, ...names, payment: latest ? { state: latest.state, amountMinor: latest.amountMinor, currency: latest.currency, paidAt: latest.paidAt } : null };
  });
}

export type BookingView = Awaited<ReturnType<typeof withPayments>>[number];

export async function getBooking(actor: SignedInActor, id: string) {
  await loadBooking(actor, id);
  const rows = await db.select(listColumns).from(bookings)
    .innerJoin(golfers, eq(golfers.id, bookings.golferId))
    .innerJoin(users, eq(users.id, bookings.fitterUserId))
    .innerJoin(fittingTypes, eq(fittingTypes.id, bookings.fittingTypeId))
    .innerJoin(schema.studios, eq(schema.studios.id, bookings.studioId))
    .where(eq(bookings.id, id));
  return (await withPayments(rows))[0]!;
}

async function bookingForStaff(actor: SignedInActor, id: string) {
  const row = await loadBooking(actor, id);
  assertStudio(actor, "bookings.manage");
  return row;
}

/** The fitter (or admin) takes the request: the visit becomes a planned fitting and the golfer gets the .ics. */
export async function confirmBooking(actor: SignedInActor, id: string) {
  const current = await bookingForStaff(actor, id);
  if (current.status !== "requested") throw new ApiError("conflict", `This booking is ${current.status}`);
  const row = await db.transaction(async (tx) => {
    const [fitting] = await tx.insert(fittings).values({
      studioId: current.studioId, golferId: current.golferId, fitterUserId: current.fitterUserId, scheduledAt: current.startsAt, notes: "Booked online",
    }).returning();
    const [updated] = await tx.update(bookings).set({ status: "confirmed", fittingId: fitting!.id, updatedAt: new Date() })
      .where(and(eq(bookings.id, id), eq(bookings.status, "requested"))).returning();
    if (!updated) throw new ApiError("conflict", "This booking changed meanwhile");
    return updated;
  });
  await sendBookingMail(id, "confirmation");
  return row;
}

export async function declineBooking(actor: SignedInActor, id: string) {
  const current = await bookingForStaff(actor, id);
  if (current.status !== "requested") throw new ApiError("conflict", `This booking is ${current.status}`);
  const [row] = await db.update(bookings).set({ status: "declined", updatedAt: new Date() }).where(eq(bookings.id, id)).returning();
  const refund = await refundIfPaid(id);
  await sendBookingMail(id, "declined", refund ? "Your fee is being refunded." : "");
  return { ...row!, refund };
}

/** The golfer (inside the notice rule for a refund) or the staff (always refunded). */
export async function cancelBooking(actor: SignedInActor, id: string) {
  const current = await loadBooking(actor, id);
  if (actor.role === "coach") throw forbidden();
  if (!["requested", "confirmed"].includes(current.status)) throw new ApiError("conflict", `This booking is ${current.status}`);
  const refundDue = refundOnCancel(isStaff(actor) ? "staff" : "golfer", current.startsAt, new Date(), await noticeHours(current.studioId));
  const [row] = await db.update(bookings).set({ status: "cancelled", updatedAt: new Date() }).where(eq(bookings.id, id)).returning();
  if (current.fittingId) await dropEmptyFitting(current.fittingId);
  const refund = refundDue ? await refundIfPaid(id) : false;
  await sendBookingMail(id, "cancellation", refund ? "Your fee is being refunded." : refundDue ? "" : "This is inside the studio's notice period, so the fee is not refunded.");
  return { ...row!, refund };
}

// A planned fitting that never started goes with its booking; one with builds stays.
async function dropEmptyFitting(fittingId: string) {
  const [used] = await db.select({ id: builds.id }).from(builds).where(eq(builds.fittingId, fittingId)).limit(1);
  if (!used) await db.delete(fittings).where(and(eq(fittings.id, fittingId), eq(fittings.status, "planned")));
}

/** Moves a booking to another free slot; a golfer only with the studio's notice. */
export async function rescheduleBooking(actor: SignedInActor, id: string, input: z.infer<typeof rescheduleSchema>) {
  const current = await loadBooking(actor, id);
  if (actor.role === "coach") throw forbidden();
  if (!["requested", "confirmed"].includes(current.status)) throw new ApiError("conflict", `This booking is ${current.status}`);
  if (!isStaff(actor) && !withinNotice(current.startsAt, new Date(), await noticeHours(current.studioId))) {
    throw new ApiError("unprocessable", "Too close to the visit to move it online; please call the studio");
  }
  const [studio] = await db.select().from(schema.studios).where(eq(schema.studios.id, current.studioId));
  const [type] = await db.select().from(fittingTypes).where(eq(fittingTypes.id, current.fittingTypeId));
  const fitterUserId = input.fitterUserId ?? current.fitterUserId;
  const slot = await findFreeSlot({ studio: studio!, type: type!, fitterUserId, startsAt: input.startsAt, ignoreBookingId: id });
  if (!slot) throw slotTaken();
  try {
    const [row] = await db.update(bookings).set({ startsAt: slot.start, endsAt: slot.end, blockedUntil: slot.blockedUntil, fitterUserId, updatedAt: new Date(), reminderSentAt: null })
      .where(eq(bookings.id, id)).returning();
    if (row!.fittingId) await db.update(fittings).set({ scheduledAt: slot.start, fitterUserId, updatedAt: new Date() }).where(eq(fittings.id, row!.fittingId));
    if (row!.status === "confirmed") await sendBookingMail(id, "confirmation", "The time of your visit has changed.");
    return row!;
  } catch (err) {
    if (isOverlap(err)) throw slotTaken();
    throw err;
  }
}

/** Reminders for the actor's studio: confirmed visits within the next `hours` not yet reminded. */
export async function sendDueReminders(actor: SignedInActor, hours = 24) {
  assertStudio(actor, "bookings.manage");
  return remindDue(hours, eq(bookings.studioId, actor.studioId));
}

/** The worker's scheduled run over every studio (no actor: it is the operator's own task). */
export async function sendAllDueReminders(hours = 24) {
  return remindDue(hours);
}

async function remindDue(hours: number, scope?: SQL) {
  const now = new Date();
  // Claiming the rows first means two runs side by side never remind twice.
  const claimed = await db.update(bookings).set({ reminderSentAt: now }).where(and(
    scope, eq(bookings.status, "confirmed"), isNull(bookings.reminderSentAt),
    gte(bookings.startsAt, now), lt(bookings.startsAt, new Date(now.getTime() + hours * 3_600_000)),
  )).returning({ id: bookings.id });
  let sent = 0;
  for (const b of claimed) if (await sendBookingMail(b.id, "reminder")) sent++;
  return { sent };
}

/** For the fitting page: the booking behind a fitting with its fee's state, or null. */
export async function bookingOfFitting(actor: SignedInActor, fittingId: string) {
  const [row] = await db.select({ id: bookings.id }).from(bookings).where(eq(bookings.fittingId, fittingId));
  return row ? getBooking(actor, row.id) : null;
}

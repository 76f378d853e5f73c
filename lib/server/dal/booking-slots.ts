import "server-only";
// Loads a studio's opening hours, closed days and held bookings and asks lib/booking for the
// free slots. Used by the public slot list and to check a requested start before booking.
import { and, asc, eq, gt, inArray, lt, ne } from "drizzle-orm";
import { DateTime } from "luxon";
import { db, schema } from "@/db";
import { freeSlots, type Slot } from "@/lib/booking/slots";
import { notFound } from "../http/errors";

const { studios, fittingTypes, availabilityRules, closedDays, bookings, users, bookingSettings } = schema;

/** A booking must be asked for at least this long ahead, so the studio can prepare. */
export const LEAD_TIME_HOURS = 12;
export const BOOKING_WEEKS = 8;

export async function studioBySlug(slug: string) {
  const [studio] = await db.select({ id: studios.id, name: studios.name, slug: studios.slug, timeZone: studios.timeZone }).from(studios).where(eq(studios.slug, slug));
  if (!studio) throw notFound("No such studio");
  const [settings] = await db.select().from(bookingSettings).where(eq(bookingSettings.studioId, studio.id));
  return { ...studio, cancelNoticeHours: settings?.cancelNoticeHours ?? 48, currency: settings?.currency ?? "gbp" };
}

export async function fittingTypeOf(studioId: string, fittingTypeId: string) {
  const [type] = await db.select().from(fittingTypes).where(and(eq(fittingTypes.id, fittingTypeId), eq(fittingTypes.studioId, studioId)));
  if (!type || !type.active) throw notFound("No such fitting type");
  return type;
}

export async function studioFitters(studioId: string) {
  return db.select({ id: users.id, name: users.name }).from(users)
    .where(and(eq(users.studioId, studioId), inArray(users.role, ["fitter", "admin"]), eq(users.disabled, false)))
    .orderBy(asc(users.name));
}

type SlotSearch = {
  studio: { id: string; timeZone: string };
  type: { durationMin: number; bufferMin: number };
  from: Date;
  to: Date;
  fitterUserId?: string;
  /** A booking being moved does not block its own new time. */
  ignoreBookingId?: string;
};

export async function searchSlots(s: SlotSearch): Promise<Slot[]> {
  const fitterScope = s.fitterUserId ? [eq(availabilityRules.fitterUserId, s.fitterUserId)] : [];
  const [rules, closed, held] = await Promise.all([
    db.select().from(availabilityRules).innerJoin(users, eq(users.id, availabilityRules.fitterUserId))
      .where(and(eq(availabilityRules.studioId, s.studio.id), eq(users.disabled, false), ...fitterScope)),
    db.select().from(closedDays).where(eq(closedDays.studioId, s.studio.id)),
    db.select().from(bookings).where(and(
      eq(bookings.studioId, s.studio.id), inArray(bookings.status, ["requested", "confirmed"]),
      lt(bookings.startsAt, s.to), gt(bookings.blockedUntil, new Date(s.from.getTime() - 86_400_000)),
      ...(s.ignoreBookingId ? [ne(bookings.id, s.ignoreBookingId)] : []),
    )),
  ]);
  return freeSlots({
    timeZone: s.studio.timeZone,
    rules: rules.map((r) => r.availability_rules),
    closed: closed.map((c) => ({ fitterUserId: c.fitterUserId, day: c.day })),
    busy: held.map((b) => ({ fitterUserId: b.fitterUserId, start: b.startsAt, blockedUntil: b.blockedUntil })),
    durationMin: s.type.durationMin,
    bufferMin: s.type.bufferMin,
    from: s.from,
    to: s.to,
    notBefore: new Date(Date.now() + LEAD_TIME_HOURS * 3_600_000),
  });
}

/** The span of local days to search: from a local date (default today) for `days` days. */
export function searchSpan(timeZone: string, fromDay: string | undefined, days: number) {
  const start = fromDay ? DateTime.fromISO(fromDay, { zone: timeZone }) : DateTime.now().setZone(timeZone).startOf("day");
  return { from: start.toJSDate(), to: start.plus({ days }).toJSDate() };
}

/** The slot a request names, if it is free; otherwise null. */
export async function findFreeSlot(s: Omit<SlotSearch, "from" | "to"> & { startsAt: Date }) {
  const day = DateTime.fromJSDate(s.startsAt, { zone: s.studio.timeZone }).startOf("day");
  const slots = await searchSlots({ ...s, from: day.toJSDate(), to: day.plus({ days: 1 }).toJSDate() });
  return slots.find((slot) => slot.start.getTime() === s.startsAt.getTime() && (!s.fitterUserId || slot.fitterUserId === s.fitterUserId)) ?? null;
}

import "server-only";
// The admin's booking settings: fitting types, weekly opening hours per fitter, closed days,
// the notice rule. Public reads (the booking page) need no actor.
import { and, asc, eq, gte } from "drizzle-orm";
import { DateTime } from "luxon";
import type { z } from "zod";
import { db, schema } from "@/db";
import type { bookingSettingsSchema, closedDaySchema, fittingTypeSchema, fittingTypeUpdateSchema, slotsQuerySchema, weeklyRulesSchema } from "@/lib/booking/schemas";
import { parseClock } from "@/lib/booking/slots";
import { assertStudio, type SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { fittingTypeOf, searchSlots, searchSpan, studioBySlug, studioFitters } from "./booking-slots";

const { fittingTypes, availabilityRules, closedDays, bookingSettings, studios } = schema;

/** What the public booking page shows before anyone signs in. */
export async function publicStudio(slug: string) {
  const studio = await studioBySlug(slug);
  const [types, fitters] = await Promise.all([
    db.select({ id: fittingTypes.id, name: fittingTypes.name, durationMin: fittingTypes.durationMin, feeMinor: fittingTypes.feeMinor })
      .from(fittingTypes).where(and(eq(fittingTypes.studioId, studio.id), eq(fittingTypes.active, true))).orderBy(asc(fittingTypes.name)),
    studioFitters(studio.id),
  ]);
  return { ...studio, fittingTypes: types, fitters };
}

/** Free slots for the public page, with local day and time in the studio's zone. */
export async function listPublicSlots(slug: string, query: z.infer<typeof slotsQuerySchema>) {
  const studio = await studioBySlug(slug);
  const [type, fitters] = await Promise.all([fittingTypeOf(studio.id, query.fittingTypeId), studioFitters(studio.id)]);
  const slots = await searchSlots({ studio, type, ...searchSpan(studio.timeZone, query.from, query.days) });
  const names = new Map(fitters.map((f) => [f.id, f.name]));
  return {
    timeZone: studio.timeZone,
    slots: slots.map((s) => {
      const local = DateTime.fromJSDate(s.start, { zone: studio.timeZone });
      return { fitterUserId: s.fitterUserId, fitterName: names.get(s.fitterUserId) ?? "", start: s.start, end: s.end, day: local.toISODate(), time: local.toFormat("HH:mm") };
    }),
  };
}

export async function bookingSetup(actor: SignedInActor) {
  assertStudio(actor, "studio.settings");
  const studio = await studioOf(actor);
  const today = DateTime.now().setZone(studio.timeZone).toISODate()!;
  const [types, rules, closed, fitters] = await Promise.all([
    db.select().from(fittingTypes).where(eq(fittingTypes.studioId, actor.studioId)).orderBy(asc(fittingTypes.name)),
    db.select().from(availabilityRules).where(eq(availabilityRules.studioId, actor.studioId)).orderBy(asc(availabilityRules.weekday), asc(availabilityRules.startMinute)),
    db.select().from(closedDays).where(and(eq(closedDays.studioId, actor.studioId), gte(closedDays.day, today))).orderBy(asc(closedDays.day)),
    studioFitters(actor.studioId),
  ]);
  return { studio, fittingTypes: types, rules, closedDays: closed, fitters };
}

async function studioOf(actor: SignedInActor) {
  const [studio] = await db.select({ id: studios.id, name: studios.name, slug: studios.slug, timeZone: studios.timeZone }).from(studios).where(eq(studios.id, actor.studioId));
  const [settings] = await db.select().from(bookingSettings).where(eq(bookingSettings.studioId, actor.studioId));
  return { ...studio!, cancelNoticeHours: settings?.cancelNoticeHours ?? 48, currency: settings?.currency ?? "gbp" };
}

async function assertFitterOfStudio(actor: SignedInActor, fitterUserId: string) {
  if (!(await studioFitters(actor.studioId)).some((f) => f.id === fitterUserId)) throw notFound("No such fitter");
}

/** Replaces one fitter's weekly opening hours. */
export async function replaceWeeklyRules(actor: SignedInActor, fitterUserId: string, input: z.infer<typeof weeklyRulesSchema>) {
  assertStudio(actor, "studio.settings");
  await assertFitterOfStudio(actor, fitterUserId);
  return db.transaction(async (tx) => {
    await tx.delete(availabilityRules).where(and(eq(availabilityRules.studioId, actor.studioId), eq(availabilityRules.fitterUserId, fitterUserId)));
    if (input.rules.length === 0) return [];
    return tx.insert(availabilityRules).values(input.rules.map((r) => ({
      studioId: actor.studioId, fitterUserId, weekday: r.weekday, startMinute: parseClock(r.start), endMinute: parseClock(r.end),
    }))).returning();
  });
}

export async function addClosedDay(actor: SignedInActor, input: z.infer<typeof closedDaySchema>) {
  assertStudio(actor, "studio.settings");
  if (input.fitterUserId) await assertFitterOfStudio(actor, input.fitterUserId);
  const [row] = await db.insert(closedDays).values({ ...input, studioId: actor.studioId }).returning();
  return row!;
}

export async function removeClosedDay(actor: SignedInActor, id: string) {
  assertStudio(actor, "studio.settings");
  const [row] = await db.delete(closedDays).where(and(eq(closedDays.id, id), eq(closedDays.studioId, actor.studioId))).returning();
  if (!row) throw notFound("No such closed day");
}

export async function createFittingType(actor: SignedInActor, input: z.infer<typeof fittingTypeSchema>) {
  assertStudio(actor, "studio.settings");
  const [row] = await db.insert(fittingTypes).values({ ...input, studioId: actor.studioId }).returning();
  return row!;
}

export async function updateFittingType(actor: SignedInActor, id: string, input: z.infer<typeof fittingTypeUpdateSchema>) {
  assertStudio(actor, "studio.settings");
  const [row] = await db.update(fittingTypes).set({ ...input, updatedAt: new Date() })
    .where(and(eq(fittingTypes.id, id), eq(fittingTypes.studioId, actor.studioId))).returning();
  if (!row) throw notFound("No such fitting type");
  return row;
}

export async function updateBookingSettings(actor: SignedInActor, input: z.infer<typeof bookingSettingsSchema>) {
  assertStudio(actor, "studio.settings");
  const [row] = await db.insert(bookingSettings).values({ studioId: actor.studioId, ...input })
    .onConflictDoUpdate({ target: bookingSettings.studioId, set: { ...input, updatedAt: new Date() } }).returning();
  return row!;
}

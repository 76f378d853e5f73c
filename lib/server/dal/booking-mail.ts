import "server-only";
// Booking e-mails to the golfer, each visit as an .ics attachment (lib/booking/ics.ts).
import { eq } from "drizzle-orm";
import { DateTime } from "luxon";
import { db, schema } from "@/db";
import { visitCalendar } from "@/lib/booking/ics";
import { sendMail } from "../mail";

const { bookings, golfers, users, studios, fittingTypes } = schema;

export type BookingMailKind = "confirmation" | "reminder" | "cancellation" | "declined";

async function mailFacts(bookingId: string) {
  const [row] = await db
    .select({ booking: bookings, golfer: golfers, studio: studios, type: fittingTypes, fitterName: users.name })
    .from(bookings)
    .innerJoin(golfers, eq(golfers.id, bookings.golferId))
    .innerJoin(studios, eq(studios.id, bookings.studioId))
    .innerJoin(fittingTypes, eq(fittingTypes.id, bookings.fittingTypeId))
    .innerJoin(users, eq(users.id, bookings.fitterUserId))
    .where(eq(bookings.id, bookingId));
  if (!row) return null;
  const account = row.golfer.userId ? (await db.select({ email: users.email }).from(users).where(eq(users.id, row.golfer.userId)))[0] : undefined;
  return { ...row, to: row.golfer.email ?? account?.email ?? null };
}

const subjects: Record<BookingMailKind, string> = {
  confirmation: "Your fitting is confirmed",
  reminder: "Reminder: your fitting is coming up",
  cancellation: "Your fitting is cancelled",
  declined: "Your fitting request was declined",
};

/** Sends one booking e-mail; a mail failure is logged, never undoes the booking change. */
export async function sendBookingMail(bookingId: string, kind: BookingMailKind, extra = ""): Promise<boolean> {
  try {
    const facts = await mailFacts(bookingId);
    if (!facts?.to) return false;
    const { booking, studio, type, fitterName } = facts;
    const local = DateTime.fromJSDate(booking.startsAt, { zone: studio.timeZone }).toFormat("cccc d LLLL yyyy 'at' HH:mm");
    const lines = [
      `Hello ${facts.golfer.name},`,
      "",
      `${type.name} with ${fitterName} at ${studio.name}: ${local} (${studio.timeZone} time).`,
      kind === "declined" ? "The studio could not take this request. Please pick another time on the booking page." : "",
      extra,
      "",
      "Fitframe",
    ].filter((line, i, all) => line !== "" || all[i - 1] !== "");
    const withCalendar = kind !== "declined";
    await sendMail({
      to: facts.to,
      subject: `${subjects[kind]} — ${studio.name}`,
      text: lines.join("\n"),
      attachments: withCalendar
        ? [{
            filename: "fitting.ics",
            contentType: `text/calendar; charset=utf-8; method=${kind === "cancellation" ? "CANCEL" : "REQUEST"}`,
            content: visitCalendar({
              bookingId: booking.id, studioName: studio.name, fittingTypeName: type.name, fitterName,
              start: booking.startsAt, end: booking.endsAt, method: kind === "cancellation" ? "cancel" : "request",
              sequence: Math.floor((booking.updatedAt.getTime() - booking.createdAt.getTime()) / 1000),
            }),
          }]
        : undefined,
    });
    return true;
  } catch (err) {
    console.error(`booking mail ${kind} for ${bookingId} failed`, err);
    return false;
  }
}

import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DateTime } from "luxon";
import { BookingActions } from "@/components/booking/booking-actions";
import { money, paymentWords, statusWords } from "@/components/booking/format";
import { requirePageActor } from "@/lib/server/page-actor";
import { listBookings } from "@/lib/server/dal/bookings";
import { getOwnStudio } from "@/lib/server/dal/studio";

export const metadata: Metadata = { title: "Calendar" };

// The studio's week of booked fittings: who, with which fitter, paid or not; requests to answer.
export default async function CalendarPage({ searchParams }: { searchParams: Promise<{ week?: string }> }) {
  const actor = await requirePageActor();
  if (actor.role !== "admin" && actor.role !== "fitter") notFound();
  const studio = await getOwnStudio(actor);
  const { week } = await searchParams;
  const asked = week ? DateTime.fromISO(week, { zone: studio.timeZone }) : DateTime.now().setZone(studio.timeZone);
  const monday = (asked.isValid ? asked : DateTime.now().setZone(studio.timeZone)).startOf("week");
  const bookings = await listBookings(actor, { from: monday.toJSDate(), to: monday.plus({ weeks: 1 }).toJSDate() });
  const days = Array.from({ length: 7 }, (_, i) => monday.plus({ days: i }));
  const live = bookings.filter((b) => b.status === "requested" || b.status === "confirmed");

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-title">Week of {monday.toFormat("d LLLL yyyy")}</h1>
        <span className="text-label text-slate-600">{studio.timeZone} time</span>
        <nav className="ml-auto flex gap-2" aria-label="Weeks">
          <Link className="btn-quiet" href={`/studio/calendar?week=${monday.minus({ weeks: 1 }).toISODate()}`}>Previous week</Link>
          <Link className="btn-quiet" href="/studio/calendar">This week</Link>
          <Link className="btn-quiet" href={`/studio/calendar?week=${monday.plus({ weeks: 1 }).toISODate()}`}>Next week</Link>
        </nav>
      </div>
      <div className="grid gap-3 md:grid-cols-7">
        {days.map((day) => {
          const items = live.filter((b) => DateTime.fromJSDate(b.startsAt, { zone: studio.timeZone }).hasSame(day, "day"));
          return (
            <section key={day.toISODate()} className="card !p-3" aria-label={day.toFormat("cccc d LLLL")}>
              <h2 className="field-label">{day.toFormat("ccc d LLL")}</h2>
              {items.length === 0 && <p className="text-label text-slate-500">—</p>}
              <ul className="flex flex-col gap-2">
                {items.map((b) => (
                  <li key={b.id} className="rounded-card border border-chalk-300 p-2" data-booking={b.id}>
                    <p className="num font-semibold">{DateTime.fromJSDate(b.startsAt, { zone: studio.timeZone }).toFormat("HH:mm")}–{DateTime.fromJSDate(b.endsAt, { zone: studio.timeZone }).toFormat("HH:mm")}</p>
                    <p>{b.golferName}</p>
                    <p className="text-label text-slate-600">{b.fittingTypeName} · {b.fitterName}</p>
                    <p className="text-label">
                      <span data-status={b.status}>{statusWords[b.status]}</span> ·{" "}
                      <span data-payment={b.payment?.state ?? "unpaid"}>{b.payment && b.payment.state !== "pending" ? paymentWords[b.payment.state] : `unpaid ${money(b.feeMinor, b.currency)}`}</span>
                    </p>
                    {b.status === "requested" && <BookingActions bookingId={b.id} />}
                  </li>
                ))}
              </ul>
            </section>
          );
        })}
      </div>
    </div>
  );
}

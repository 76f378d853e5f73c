import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { AvailabilityEditor } from "@/components/booking/availability-editor";
import { requirePageActor } from "@/lib/server/page-actor";
import { bookingSetup } from "@/lib/server/dal/booking-setup";

export const metadata: Metadata = { title: "Booking settings" };

// Admin: opening hours per fitter (local time), fitting types and fees, closed days, notice rule.
export default async function AvailabilityPage() {
  const actor = await requirePageActor();
  if (actor.role !== "admin") notFound();
  const setup = await bookingSetup(actor);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-title">Booking settings</h1>
        <p className="text-slate-600">
          Times are {setup.studio.timeZone} local time. Public booking page: <a className="underline" href={`/book/${setup.studio.slug}`}>/book/{setup.studio.slug}</a>
        </p>
      </div>
      <AvailabilityEditor setup={JSON.parse(JSON.stringify(setup))} />
    </div>
  );
}

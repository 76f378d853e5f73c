import type { Metadata } from "next";
import { GolferBookings } from "@/components/booking/golfer-bookings";
import { requirePageActor } from "@/lib/server/page-actor";

export const metadata: Metadata = { title: "My bookings" };

// Where the payment page sends the golfer back; also the golfer's list of visits.
export default async function MyBookingsPage({ params, searchParams }: { params: Promise<{ studio: string }>; searchParams: Promise<{ paid?: string }> }) {
  await requirePageActor();
  const [{ studio }, { paid }] = await Promise.all([params, searchParams]);
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-6 p-4">
      <p className="text-label font-semibold uppercase tracking-widest text-signal-dark">Fitframe</p>
      <h1 className="text-title">My bookings</h1>
      {paid && <p role="status" className="card">Thank you — your payment went through.</p>}
      <GolferBookings studioSlug={studio} />
    </main>
  );
}

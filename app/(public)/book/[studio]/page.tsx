import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { BookingFlow } from "@/components/booking/booking-flow";
import { PrivacyNote } from "@/components/layout/privacy-note";
import { currentActor } from "@/lib/server/auth/actor";
import { publicStudio } from "@/lib/server/dal/booking-setup";
import { ApiError } from "@/lib/server/http/errors";

export const metadata: Metadata = { title: "Book a fitting" };

// Public: anyone may look at the free times; booking needs a golfer account of this studio.
export default async function BookingPage({ params }: { params: Promise<{ studio: string }> }) {
  const { studio: slug } = await params;
  const studio = await publicStudio(slug).catch((err: unknown) => {
    if (err instanceof ApiError && err.code === "not_found") notFound();
    throw err;
  });
  const actor = await currentActor();
  const signedInAs = actor?.role === "golfer" && actor.studioId === studio.id ? actor.email : null;
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-6 p-4">
      <header className="flex items-center justify-between">
        <p className="text-label font-semibold uppercase tracking-widest text-signal-dark">Fitframe</p>
        {signedInAs && <a className="btn-quiet" href={`/book/${studio.slug}/bookings`}>My bookings</a>}
      </header>
      <h1 className="text-title">Book a putter fitting at {studio.name}</h1>
      {actor && !signedInAs && <p className="card">You are signed in with a staff account or another studio&apos;s account; sign out to book here as a golfer.</p>}
      <BookingFlow studio={studio} signedInAs={signedInAs} />
      <PrivacyNote />
    </main>
  );
}

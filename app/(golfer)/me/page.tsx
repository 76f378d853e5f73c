import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SignOutButton } from "@/components/auth/sign-out-button";
import { PrivacyNote } from "@/components/layout/privacy-note";
import { GolferDataControls } from "@/components/golfers/golfer-data-controls";
import { GolferSpecCard } from "@/components/specs/golfer-spec-card";
import { GolferBookings } from "@/components/booking/golfer-bookings";
import { UnreadSummary } from "@/components/comments/unread-summary";
import Link from "next/link";
import { requirePageActor } from "@/lib/server/page-actor";
import { listFittingsOfGolfer } from "@/lib/server/dal/fittings";
import { getGolfer } from "@/lib/server/dal/golfers";
import { listSpecsOfGolfer } from "@/lib/server/dal/specs";
import { getOwnStudio } from "@/lib/server/dal/studio";

export const metadata: Metadata = { title: "My fittings" };

export default async function GolferHome() {
  const actor = await requirePageActor();
  if (actor.role !== "golfer" || !actor.golferId) notFound();
  const [golfer, fittings, specs, studio] = await Promise.all([
    getGolfer(actor, actor.golferId),
    listFittingsOfGolfer(actor, actor.golferId),
    listSpecsOfGolfer(actor, actor.golferId),
    getOwnStudio(actor),
  ]);
  return (
    <main className="mx-auto flex max-w-xl flex-col gap-6 p-4">
      <header className="flex items-center justify-between">
        <p className="text-label font-semibold uppercase tracking-widest text-signal-dark">Fitframe</p>
        <SignOutButton />
      </header>
      <h1 className="text-title">Hello, {golfer.name.split(" ")[0]}</h1>
      <UnreadSummary actor={actor} />
      <GolferSpecCard specs={specs} />
      <GolferBookings studioSlug={studio.slug} />
      <section className="card" aria-labelledby="fittings-heading">
        <h2 id="fittings-heading" className="field-label">Your fittings</h2>
        {fittings.length === 0 ? (
          <p className="text-slate-600">No fittings yet.</p>
        ) : (
          <ul className="divide-y divide-chalk-200">
            {fittings.map((f) => (
              <li key={f.id} className="flex min-h-touch items-center justify-between">
                <Link href={`/me/fittings/${f.id}`} className="num flex min-h-touch grow items-center underline-offset-2 hover:underline">{f.scheduledAt.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })}</Link>
                <span className="text-label text-slate-600">{f.status === "completed" ? "done" : f.status === "planned" ? "booked" : "in progress"}</span>
              </li>
            ))}
          </ul>
        )}
      </section>
      <GolferDataControls golferId={golfer.id} golferName={golfer.name} canErase afterErase="/sign-in" />
      <PrivacyNote />
    </main>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { IntakeForm } from "@/components/golfers/intake-form";
import { NewFittingForm } from "@/components/golfers/new-fitting-form";
import { GolferDataControls } from "@/components/golfers/golfer-data-controls";
import { CoachAccess } from "@/components/invitations/coach-access";
import { requirePageActor } from "@/lib/server/page-actor";
import { getGolferPage } from "@/lib/server/dal/golfer-page";

export const metadata: Metadata = { title: "Golfer" };

const day = (d: Date) => d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
const statusWords: Record<string, string> = { planned: "booked", in_progress: "in progress", completed: "done" };

export default async function GolferPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const { golfer, fittings, specs } = await getGolferPage(actor, (await params).id);
  const staff = actor.role === "admin" || actor.role === "fitter";
  const consent = golfer.videoConsentAt ? `given ${day(golfer.videoConsentAt)} by ${golfer.videoConsentBy ?? "the golfer"}` : "not recorded";
  return (
    <div className="flex flex-col gap-6">
      <header>
        <p className="text-label text-slate-600"><Link href="/studio/golfers">Golfers</Link> /</p>
        <h1 className="text-title">{golfer.name}</h1>
        <p className="text-slate-600">{golfer.handedness}-handed{golfer.isMinor ? " · minor" : ""} · video consent {consent}</p>
      </header>
      <div className="grid gap-6 lg:grid-cols-2">
        <section className="card" aria-labelledby="fittings-heading">
          <h2 id="fittings-heading" className="field-label">Fittings</h2>
          {fittings.length === 0 ? <p className="text-slate-600">No fittings yet.</p> : (
            <ul className="divide-y divide-chalk-200">
              {fittings.map((f) => (
                <li key={f.id} className="flex min-h-touch items-center justify-between">
                  <Link href={`/studio/fittings/${f.id}`} className="num underline-offset-2 hover:underline">{day(f.scheduledAt)}</Link>
                  <span className="text-label text-slate-600">{statusWords[f.status]} · <span className="num">{f.clipCount}</span> clips</span>
                </li>
              ))}
            </ul>
          )}
          {staff && <NewFittingForm golferId={golfer.id} />}
        </section>
        <section className="card" aria-labelledby="specs-heading">
          <h2 id="specs-heading" className="field-label">Specs</h2>
          {specs.length === 0 ? <p className="text-slate-600">No spec issued yet.</p> : (
            <ul className="divide-y divide-chalk-200">
              {specs.map((s) => (
                <li key={s.id} className="flex min-h-touch items-center justify-between">
                  <Link href={`/studio/fittings/${s.fittingId}/specs/${s.id}`} className="underline-offset-2 hover:underline">{s.data.build.label} · <span className="num">{day(s.issuedAt)}</span></Link>
                  <span className="text-label text-slate-600">{s.supersededAt ? `replaced ${day(s.supersededAt)}` : "current"}</span>
                </li>
              ))}
            </ul>
          )}
        </section>
      </div>
      {staff && (
        <section className="card" aria-labelledby="intake-heading">
          <h2 id="intake-heading" className="sr-only">Intake</h2>
          <IntakeForm
            golferId={golfer.id}
            initial={{
              name: golfer.name, email: golfer.email ?? undefined, handedness: golfer.handedness, isMinor: golfer.isMinor, intake: golfer.intake,
              consent: golfer.videoConsentAt ? { given: true, by: golfer.videoConsentBy?.startsWith("guardian") ? "guardian" : "golfer", guardianName: golfer.videoConsentBy?.startsWith("guardian: ") ? golfer.videoConsentBy.slice(10) : undefined } : { given: false, by: "golfer" },
            }}
          />
        </section>
      )}
      {staff && <CoachAccess golferId={golfer.id} golferEmail={golfer.email} golferHasAccount={golfer.userId !== null} />}
      {actor.role !== "coach" && <GolferDataControls golferId={golfer.id} golferName={golfer.name} canErase={actor.role === "admin"} afterErase="/studio/golfers" />}
    </div>
  );
}

import type { Metadata } from "next";
import Link from "next/link";
import { ClipList } from "@/components/clips/clip-list";
import { ClipUploader } from "@/components/clips/clip-uploader";
import { ComparisonPanel } from "@/components/compare/comparison-panel";
import { FittingFee } from "@/components/booking/fitting-fee";
import { BuildForm } from "@/components/fittings/build-form";
import { BuildsBoard } from "@/components/fittings/builds-board";
import { SessionPanel } from "@/components/session/session-panel";
import { StudioScreenLink } from "@/components/session/studio-screen-link";
import { FittingStatus } from "@/components/fittings/fitting-status";
import { IssueSpecForm } from "@/components/specs/issue-spec-form";
import { requirePageActor } from "@/lib/server/page-actor";
import { bookingOfFitting } from "@/lib/server/dal/bookings";
import { getFittingPage } from "@/lib/server/dal/fittings";
import { settingsOfStudio } from "@/lib/server/dal/settings";

export const metadata: Metadata = { title: "Fitting" };

export default async function FittingPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePageActor();
  const { fitting, golfer, builds } = await getFittingPage(actor, (await params).id);
  const [settings, booking] = await Promise.all([settingsOfStudio(fitting.studioId), bookingOfFitting(actor, fitting.id)]);
  const staff = actor.role === "admin" || actor.role === "fitter";
  const consentConfirmed = Boolean(golfer.videoConsentAt ?? fitting.consentConfirmedAt);
  return (
    <div className="flex flex-col gap-8">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-label text-slate-600"><Link href={`/studio/golfers/${golfer.id}`}>{golfer.name}</Link> /</p>
          <h1 className="text-title">Fitting of {fitting.scheduledAt.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })}</h1>
          <p className="text-slate-600">{golfer.handedness}-handed · video consent {consentConfirmed ? "recorded" : "not recorded"}</p>
          <FittingStatus fittingId={fitting.id} status={fitting.status} canEdit={staff} />
          <FittingFee booking={booking} />
        </div>
        <div className="flex gap-2">
          <a className="btn-quiet" href={`/api/fittings/${fitting.id}/csv`} download>Measurements (CSV, one row each)</a>
          <a className="btn-quiet" href={`/api/fittings/${fitting.id}/csv?layout=wide`} download>CSV, one row per putt</a>
        </div>
      </header>

      <section aria-labelledby="session-heading" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-end justify-between gap-3">
          <h2 id="session-heading" className="text-title">Session</h2>
          {staff && <StudioScreenLink fittingId={fitting.id} />}
        </div>
        <SessionPanel fittingId={fitting.id} canEdit={staff} />
      </section>

      <section aria-labelledby="builds-heading" className="flex flex-col gap-4">
        <h2 id="builds-heading" className="text-title">Builds</h2>
        <BuildsBoard builds={builds} canEdit={staff} />
        {staff && (
          <div className="card">
            <h3 className="mb-3 font-medium">Add a build</h3>
            <BuildForm fittingId={fitting.id} first={builds.length === 0} />
          </div>
        )}
      </section>

      <section aria-labelledby="clips-heading" className="flex flex-col gap-4">
        <h2 id="clips-heading" className="text-title">Clips</h2>
        {staff && <ClipUploader fittingId={fitting.id} builds={builds.map((b) => ({ id: b.id, label: b.label }))} consentConfirmed={consentConfirmed} cameraFps={settings.cameraFps} />}
        <ClipList fittingId={fitting.id} builds={builds.map((b) => ({ id: b.id, label: b.label }))} />
      </section>

      <section aria-labelledby="compare-heading" className="flex flex-col gap-4">
        <h2 id="compare-heading" className="text-title">Comparison</h2>
        <ComparisonPanel fittingId={fitting.id} />
      </section>

      {staff && builds.length > 0 && (
        <section aria-labelledby="spec-heading" className="card flex flex-col gap-4">
          <h2 id="spec-heading" className="text-title">Issue the spec</h2>
          <IssueSpecForm fittingId={fitting.id} builds={builds.map((b) => ({ id: b.id, label: b.label }))} golferEmail={golfer.email} />
        </section>
      )}
    </div>
  );
}

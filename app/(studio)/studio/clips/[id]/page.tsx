import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { ReviewLoader } from "@/components/review/review-loader";
import type { ReviewClip } from "@/components/review/types";
import { requirePageActor } from "@/lib/server/page-actor";
import { loadClip } from "@/lib/server/dal/clip-access";
import { reviewContext } from "@/lib/server/dal/review-context";
import { listComments } from "@/lib/server/dal/comments";
import { ApiError } from "@/lib/server/http/errors";

export const metadata: Metadata = { title: "Clip review" };

async function loadOrNotFound(id: string) {
  const actor = await requirePageActor();
  try {
    const loaded = await loadClip(actor, id);
    const [place, comments] = await Promise.all([reviewContext(actor, loaded), listComments(actor, id)]);
    return { ...loaded, place, comments, viewer: { userId: actor.userId, role: actor.role } };
  } catch (err) {
    // A clip the actor may not see looks the same as one that does not exist.
    if (err instanceof ApiError && (err.code === "not_found" || err.code === "forbidden")) notFound();
    throw err;
  }
}

export default async function ClipReviewPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  if (!/^[0-9a-f-]{36}$/i.test(id)) notFound();
  const { clip, handedness, settings, place, comments, viewer } = await loadOrNotFound(id);
  const data: ReviewClip = {
    id: clip.id,
    view: clip.view,
    state: clip.state,
    failureReason: clip.failureReason,
    width: clip.width ?? 0,
    height: clip.height ?? 0,
    frameCount: clip.frameCount ?? 0,
    captureFps: clip.captureFps,
    mirrored: clip.mirrored,
    handedness,
    motionSignal: clip.motionSignal ?? null,
    suggestedImpactFrame: clip.suggestedImpactFrame,
    moments: { address: clip.addressFrame, takeaway: clip.takeawayFrame, top: clip.topFrame, impact: clip.impactFrame, finish: clip.finishFrame },
    windows: settings.windows ?? {},
    trackingEnabled: clip.trackingEnabled,
    tracking: (clip.tracking as ReviewClip["tracking"]) ?? null,
    place,
    unitPrefs: { units: settings.units, speedUnit: settings.speedUnit },
  };
  // Plain JSON for the browser (dates as strings).
  const commentList = JSON.parse(JSON.stringify({ captureFps: comments.captureFps, threads: comments.threads }));
  return <ReviewLoader clip={data} comments={commentList} viewer={viewer} />;
}

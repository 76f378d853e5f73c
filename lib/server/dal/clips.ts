import "server-only";
import { eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db, schema } from "@/db";
import type { ClipPatch } from "@/lib/schemas/clip-edit";
import type { SignedInActor } from "../access";
import { ApiError, notFound } from "../http/errors";
import { loadClip, type LoadedClip } from "./clip-access";
import { queueTracking } from "../queue";
import { refreshMeasurements } from "./measurements";

const { clips } = schema;

const momentFrame = z.number().int().nonnegative().nullable();
export const momentsSchema = z.object({ address: momentFrame, takeaway: momentFrame, top: momentFrame, impact: momentFrame, finish: momentFrame }).partial().strict();

const MOMENTS = ["address", "takeaway", "top", "impact", "finish"] as const;
type Moments = Record<(typeof MOMENTS)[number], number | null>;

function momentsOf(clip: LoadedClip["clip"]): Moments {
  return { address: clip.addressFrame, takeaway: clip.takeawayFrame, top: clip.topFrame, impact: clip.impactFrame, finish: clip.finishFrame };
}

function presentClip({ clip, golferId, handedness }: Pick<LoadedClip, "clip" | "golferId" | "handedness">) {
  return {
    id: clip.id, view: clip.view, state: clip.state, progress: clip.progress, failureReason: clip.failureReason,
    width: clip.width, height: clip.height, frameCount: clip.frameCount, captureFps: clip.captureFps,
    slowMotionFactor: clip.slowMotionFactor, mirrored: clip.mirrored, durationS: clip.durationS,
    motionSignal: clip.motionSignal, suggestedImpactFrame: clip.suggestedImpactFrame, moments: momentsOf(clip),
    trackingEnabled: clip.trackingEnabled, tracking: clip.tracking,
    handedness, golferId, fittingId: clip.fittingId, buildId: clip.buildId, strokeId: clip.strokeId,
    mishit: clip.mishitReason === null ? null : { reason: clip.mishitReason, at: clip.mishitAt },
  };
}

// GET /api/clips/{id}
export async function getClip(actor: SignedInActor, clipId: string) {
  return presentClip(await loadClip(actor, clipId));
}

/**
 * Writes clip columns under the clip's lock (a change may depend on the current row) and bumps its
 * measure revision; once committed, the measurements are recomputed from the new row.
 */
async function changeClip(actor: SignedInActor, loaded: LoadedClip, change: (clip: LoadedClip["clip"]) => Partial<typeof clips.$inferInsert>) {
  const clip = await db.transaction(async (tx) => {
    const [current] = await tx.select().from(clips).where(eq(clips.id, loaded.clip.id)).for("update");
    if (!current) throw notFound("No such clip");
    const [updated] = await tx
      .update(clips)
      .set({ ...change(current), measureRevision: sql`${clips.measureRevision} + 1`, updatedAt: new Date() })
      .where(eq(clips.id, current.id))
      .returning();
    return updated!;
  });
  return { clip: presentClip({ ...loaded, clip }), measurements: await refreshMeasurements(clip.id, actor.userId) };
}

// Capture fps, mirroring, playback slow-motion factor, tracking (staff only): part of PATCH /api/clips/{id}
export async function updateClipSettings(actor: SignedInActor, clipId: string, input: Omit<ClipPatch, "buildId" | "mishit">) {
  const loaded = await loadClip(actor, clipId, "golfer.write");
  return changeClip(actor, loaded, () => input);
}

/** Moments must lie within the clip and keep their order (address ≤ takeaway ≤ top ≤ impact ≤ finish). */
function momentProblems(moments: Moments, frameCount: number) {
  const issues: { path: string; message: string }[] = [];
  for (const name of MOMENTS) {
    const f = moments[name];
    if (f != null && f >= frameCount) issues.push({ path: name, message: `${name} frame ${f} is outside the clip, which has frames 0 to ${frameCount - 1}` });
  }
  const set = MOMENTS.filter((name) => moments[name] != null);
  set.slice(1).forEach((name, i) => {
    const before = set[i]!;
    if (moments[name]! < moments[before]!) issues.push({ path: name, message: `${name} (frame ${moments[name]}) comes before ${before} (frame ${moments[before]})` });
  });
  return issues;
}

// PUT /api/clips/{id}/moments: frames of address … finish; a null clears one, a missing key keeps it (staff only)
export async function setMoments(actor: SignedInActor, clipId: string, input: z.infer<typeof momentsSchema>) {
  const loaded = await loadClip(actor, clipId, "golfer.write");
  const { clip } = loaded;
  if (clip.state !== "ready" || clip.frameCount == null) {
    throw new ApiError("unprocessable", "Frame moments can be set only on a ready clip, once its frames are counted.");
  }
  const frameCount = clip.frameCount;
  return changeClip(actor, loaded, (current) => {
    const next = { ...momentsOf(current), ...input };
    const issues = momentProblems(next, frameCount);
    if (issues.length > 0) throw new ApiError("validation_failed", `The moments were refused: ${issues.map((i) => i.message).join("; ")}`, issues);
    return { addressFrame: next.address, takeawayFrame: next.takeaway, topFrame: next.top, impactFrame: next.impact, finishFrame: next.finish };
  });
}

export const acceptProposalsSchema = z.object({ overwrite: z.boolean().default(false) }).strict();

type TrackedMoments = { addressFrame?: unknown; impactFrame?: unknown };
const frameOr = (value: unknown, frameCount: number): number | null =>
  typeof value === "number" && Number.isInteger(value) && value >= 0 && value < frameCount ? value : null;

// POST /api/clips/{id}/proposals/accept: the tracker's address and impact become the clip's moments
// (moments already set by hand stay unless `overwrite`), and its proposals are marked accepted.
export async function acceptProposals(actor: SignedInActor, clipId: string, input: z.infer<typeof acceptProposalsSchema>) {
  const loaded = await loadClip(actor, clipId, "golfer.write");
  const { clip } = loaded;
  if (clip.state !== "ready" || clip.frameCount == null) throw new ApiError("unprocessable", "Proposals can be accepted only on a ready clip.");
  if (!clip.trackingEnabled) throw new ApiError("unprocessable", "Tracking is turned off for this clip: turn it on to use its proposals.");
  if (!clip.tracking) throw new ApiError("unprocessable", "This clip has not been tracked yet: run tracking first.");
  const frameCount = clip.frameCount;
  return changeClip(actor, loaded, (current) => {
    const summary = (current.tracking ?? {}) as TrackedMoments & Record<string, unknown>;
    const address = frameOr(summary.addressFrame, frameCount);
    const impact = frameOr(summary.impactFrame, frameCount) ?? current.suggestedImpactFrame;
    const take = (now: number | null, proposed: number | null) => (now != null && !input.overwrite ? now : (proposed ?? now));
    const next = { ...momentsOf(current), address: take(current.addressFrame, address), impact: take(current.impactFrame, impact) };
    const issues = momentProblems(next, frameCount);
    if (issues.length > 0) throw new ApiError("validation_failed", `The tracked moments do not fit this clip's: ${issues.map((i) => i.message).join("; ")}`, issues);
    return { addressFrame: next.address, impactFrame: next.impact, tracking: { ...summary, acceptedAt: new Date().toISOString() } };
  });
}

// POST /api/clips/{id}/tracking: runs the tracking pass again (after a change of capture rate or
// moments); hand marks are never touched, the clip's proposals are replaced when it ends.
export async function rerunTracking(actor: SignedInActor, clipId: string) {
  const { clip } = await loadClip(actor, clipId, "golfer.write");
  if (clip.state !== "ready") throw new ApiError("unprocessable", "Tracking can run only on a ready clip.");
  if (!clip.trackingEnabled) throw new ApiError("unprocessable", "Tracking is turned off for this clip: turn it on first.");
  const jobId = await queueTracking(clipId);
  return { queued: jobId !== null, alreadyQueued: jobId === null };
}

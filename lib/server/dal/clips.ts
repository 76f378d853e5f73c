import "server-only";
import { eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db, schema } from "@/db";
import type { SignedInActor } from "../access";
import { ApiError, notFound } from "../http/errors";
import { loadClip, type LoadedClip } from "./clip-access";
import { refreshMeasurements } from "./measurements";

const { clips } = schema;

export const clipSettingsSchema = z
  .object({
    captureFps: z.number().positive().max(100_000, "captureFps must be at most 100000 frames per second"),
    mirrored: z.boolean(),
    slowMotionFactor: z.number().positive().max(1000),
  })
  .partial()
  .strict();

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
    handedness, golferId, fittingId: clip.fittingId, buildId: clip.buildId,
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

// PATCH /api/clips/{id}: capture fps, mirroring, playback slow-motion factor (staff only)
export async function updateClipSettings(actor: SignedInActor, clipId: string, input: z.infer<typeof clipSettingsSchema>) {
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

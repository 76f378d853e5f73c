import "server-only";
// The tracker's proposals stored as marks (source "tracked"): one transaction replaces the clip's
// previous proposals, writes the tracking summary and the suggested impact, and bumps the measure
// revision; hand marks are never touched. The measurements are then recomputed.
import { and, eq, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import type { TrackingResult } from "@/lib/tracking/types";
import { refreshMeasurements } from "./measurements";

const { clips, marks } = schema;

/**
 * Stores one tracking run. `motionImpactFrame` is the motion signal's suggestion, kept as the
 * suggested impact when the tracker found none from the ball. Returns false when the clip is gone.
 */
export async function storeTrackingResult(clipId: string, result: TrackingResult, motionImpactFrame: number | null): Promise<boolean> {
  const { summary, proposals } = result;
  const suggested = summary.impactSource === "ball" ? summary.impactFrame : motionImpactFrame;
  const stored = await db.transaction(async (tx) => {
    const [clip] = await tx
      .update(clips)
      .set({ measureRevision: sql`${clips.measureRevision} + 1`, tracking: summary, suggestedImpactFrame: suggested, updatedAt: new Date() })
      .where(eq(clips.id, clipId))
      .returning({ studioId: clips.studioId });
    if (!clip) return false;
    await tx.delete(marks).where(and(eq(marks.clipId, clipId), eq(marks.source, "tracked")));
    if (proposals.length > 0) {
      await tx.insert(marks).values(
        proposals.map((p) => ({
          studioId: clip.studioId, clipId, frame: p.frame, kind: p.kind, role: p.role,
          points: p.points.map(([x, y]) => [x, y] as [number, number]),
          lengthMm: p.lengthMm ?? null, source: "tracked" as const, precisionPx: p.precisionPx, authorUserId: null,
        })),
      );
    }
    return true;
  });
  if (stored) await refreshMeasurements(clipId, null);
  return stored;
}

/** A clip's summary and switch, for the re-run job. */
export async function trackingSubject(clipId: string) {
  const [clip] = await db
    .select({
      id: clips.id, state: clips.state, view: clips.view, objectKey: clips.objectKey, captureFps: clips.captureFps,
      width: clips.width, height: clips.height, frameCount: clips.frameCount, trackingEnabled: clips.trackingEnabled, motionSignal: clips.motionSignal,
    })
    .from(clips)
    .where(eq(clips.id, clipId));
  return clip ?? null;
}

// A ready clip row written straight into the test database: enough for comments (no media).
import { db, schema } from "@/db";
import type { World } from "../../support/world";

export async function insertClip(w: World, who: World["own"], o: { frameCount?: number; captureFps?: number } = {}) {
  const [clip] = await db
    .insert(schema.clips)
    .values({
      studioId: who.golfer.studioId, fittingId: who.fitting.id, buildId: who.build.id, createdBy: w.fitter.id, view: "overhead", state: "ready",
      originalName: "stroke.mp4", contentType: "video/mp4", sizeBytes: 1, objectKey: "unused",
      captureFps: o.captureFps ?? 240, width: 320, height: 180, frameCount: o.frameCount ?? 480, progress: 100, impactFrame: 299, addressFrame: 30,
    })
    .returning();
  return clip!;
}

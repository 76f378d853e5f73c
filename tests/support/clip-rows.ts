// Ready clips written straight into the test database (as the worker leaves them), so the
// marks API can be tested without uploading and processing a video first.
import { db, schema } from "@/db";

type Owner = { fitting: { id: string; studioId: string }; build: { id: string } };
type ClipFields = Partial<typeof schema.clips.$inferInsert>;

export const READY_CLIP = { view: "overhead", width: 1280, height: 720, frameCount: 480, captureFps: 240, impactFrame: 300 } as const;

export async function insertClip(owner: Owner, fields: ClipFields = {}) {
  const [clip] = await db
    .insert(schema.clips)
    .values({
      studioId: owner.fitting.studioId,
      fittingId: owner.fitting.id,
      buildId: owner.build.id,
      state: "ready",
      originalName: "stroke.mp4",
      contentType: "video/mp4",
      sizeBytes: 1_000_000,
      objectKey: `test/${crypto.randomUUID()}.mp4`,
      durationS: 2,
      motionSignal: [0, 0.1, 0.8, 0.2],
      suggestedImpactFrame: 299,
      ...READY_CLIP,
      ...fields,
    })
    .returning();
  return clip!;
}

/** A mark row as if drawn by `authorUserId` (for access tests that need a mark to change). */
export async function insertMark(clip: { id: string; studioId: string }, authorUserId: string) {
  const [mark] = await db
    .insert(schema.marks)
    .values({ studioId: clip.studioId, clipId: clip.id, frame: 10, kind: "point", role: "ball", points: [[100, 100]], authorUserId })
    .returning();
  return mark!;
}

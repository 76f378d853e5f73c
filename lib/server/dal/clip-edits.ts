import "server-only";
// The session's corrections of a putt: move it to another build, set it aside as a mishit, or
// delete it. A putt is a stroke (up to three clips, one per view) or a clip without a stroke, so a
// move or a mishit applies to every clip of the stroke together: the views of one putt never
// disagree on which build they belong to or whether they count.
import { and, eq, max, or, sql, type SQL } from "drizzle-orm";
import { db, schema } from "@/db";
import type { ClipPatch } from "@/lib/schemas/clip-edit";
import type { SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { abortMultipartUpload, clipPrefix, deleteKeys, listKeys } from "../storage";
import { loadClip, type LoadedClip } from "./clip-access";
import { getClip, updateClipSettings } from "./clips";
import { listMeasurements, refreshMeasurements } from "./measurements";

const { clips, builds, strokes } = schema;

/** The clips that make one putt with this clip: its stroke's, or the clip alone. */
const samePutt = (clip: LoadedClip["clip"]): SQL =>
  clip.strokeId ? or(eq(clips.strokeId, clip.strokeId), eq(clips.id, clip.id))! : eq(clips.id, clip.id);

/**
 * Moves the putt to another build of the same fitting: its stroke goes to the end of that build's
 * strokes, with all its clips. The build's static loft is an input of dynamic loft, so every moved
 * clip's measure revision is bumped with the move and its measurements recomputed after it.
 */
async function movePutt(actor: SignedInActor, loaded: LoadedClip, buildId: string): Promise<string[]> {
  const { clip } = loaded;
  const [target] = await db.select({ id: builds.id }).from(builds).where(and(eq(builds.id, buildId), eq(builds.fittingId, clip.fittingId)));
  if (!target) throw notFound("No such build in this fitting");
  if (clip.buildId === buildId) return [];
  const moved = await db.transaction(async (tx) => {
    if (clip.strokeId) {
      const [last] = await tx.select({ n: max(strokes.position) }).from(strokes).where(eq(strokes.buildId, buildId));
      await tx.update(strokes).set({ buildId, position: (last?.n ?? 0) + 1 }).where(and(eq(strokes.id, clip.strokeId), eq(strokes.studioId, clip.studioId)));
    }
    return tx
      .update(clips)
      .set({ buildId, measureRevision: sql`${clips.measureRevision} + 1`, updatedAt: new Date() })
      .where(and(samePutt(clip), eq(clips.studioId, clip.studioId)))
      .returning({ id: clips.id });
  });
  for (const { id } of moved) await refreshMeasurements(id, actor.userId);
  return moved.map((r) => r.id);
}

/** Sets the putt aside (kept and shown, left out of every statistic) or puts it back with null. */
async function setMishit(loaded: LoadedClip, mishit: { reason: string } | null): Promise<string[]> {
  const { clip } = loaded;
  const rows = await db
    .update(clips)
    .set({ mishitReason: mishit?.reason ?? null, mishitAt: mishit ? new Date() : null, updatedAt: new Date() })
    .where(and(samePutt(clip), eq(clips.studioId, clip.studioId)))
    .returning({ id: clips.id });
  return rows.map((r) => r.id);
}

/**
 * PATCH /api/clips/{id}: applied in order — move, mishit, settings — each a committed step. Answers
 * the clip, its measurements, and every clip the move or mishit changed (the putt's other views too).
 */
export async function patchClip(actor: SignedInActor, clipId: string, input: ClipPatch) {
  const { buildId, mishit, ...settings } = input;
  const loaded = await loadClip(actor, clipId, "golfer.write");
  const changed = new Set<string>();
  if (buildId !== undefined) for (const id of await movePutt(actor, loaded, buildId)) changed.add(id);
  if (mishit !== undefined) for (const id of await setMishit(loaded, mishit)) changed.add(id);
  if (Object.keys(settings).length > 0) {
    const result = await updateClipSettings(actor, clipId, settings);
    return { ...result, changedClipIds: [...changed] };
  }
  const [clip, { measurements }] = await Promise.all([getClip(actor, clipId), listMeasurements(actor, clipId)]);
  return { clip, measurements, changedClipIds: [...changed] };
}

/**
 * DELETE /api/clips/{id}: the clip, its marks, measurements and comments (by cascade) and its files
 * in the store (the source, frames, poster, proxy; an unfinished multipart upload is aborted). The
 * row goes first, so a worker still processing it stops at its next write; a stroke left with no
 * clip goes too. Only this clip: the putt's other views stay.
 */
export async function deleteClip(actor: SignedInActor, clipId: string) {
  const { clip } = await loadClip(actor, clipId, "golfer.write");
  await db.transaction(async (tx) => {
    await tx.delete(clips).where(and(eq(clips.id, clip.id), eq(clips.studioId, clip.studioId)));
    if (clip.strokeId) {
      await tx.delete(strokes).where(and(
        eq(strokes.id, clip.strokeId),
        sql`not exists (select 1 from ${clips} where ${clips.strokeId} = ${clip.strokeId})`,
      ));
    }
  });
  const upload = clip.multipartUploadId ? await abortMultipartUpload(clip.objectKey, clip.multipartUploadId) : null;
  const keys = await listKeys(clipPrefix(clip.studioId, clip.id));
  if (keys.length > 0) await deleteKeys(keys);
  return { deleted: true, id: clip.id, files: keys.length, multipartUpload: upload };
}

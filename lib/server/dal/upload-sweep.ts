import "server-only";
// Uploads that were started and never finished (a capture computer that never came back, a browser
// tab closed mid-file): their clips stay `awaiting upload` and a multipart upload's parts sit in the
// store. The worker sweeps them hourly; a sender that comes back later registers the file afresh.
import { and, eq, lt } from "drizzle-orm";
import { db, schema } from "@/db";
import { abortMultipartUpload, clipPrefix, deleteKeys, listKeys } from "../storage";

const { clips } = schema;

/** How long an upload may stand still before it counts as abandoned. */
export const ABANDONED_UPLOAD_HOURS = 24;

/** Deletes clips still awaiting their file since before `before`, aborting their multipart uploads. */
export async function sweepAbandonedUploads(before = new Date(Date.now() - ABANDONED_UPLOAD_HOURS * 3600_000)) {
  const stale = await db
    .delete(clips)
    .where(and(eq(clips.state, "awaiting_upload"), lt(clips.updatedAt, before)))
    .returning({ id: clips.id, studioId: clips.studioId, objectKey: clips.objectKey, multipartUploadId: clips.multipartUploadId });
  const uploads = { aborted: 0, "not-there": 0, unsupported: 0 };
  for (const clip of stale) {
    if (clip.multipartUploadId) uploads[await abortMultipartUpload(clip.objectKey, clip.multipartUploadId)]++;
    const keys = await listKeys(clipPrefix(clip.studioId, clip.id));
    if (keys.length > 0) await deleteKeys(keys);
  }
  return { clips: stale.length, multipartUploads: uploads };
}

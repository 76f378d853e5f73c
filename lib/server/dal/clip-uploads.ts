import "server-only";
import { and, asc, eq } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import { env } from "@/lib/config/env";
import type { clipCompleteSchema, clipCreateSchema, clipPartsSchema } from "@/lib/schemas/clip-upload";
import type { SignedInActor } from "../access";
import { ApiError } from "../http/errors";
import { pgErrorCode } from "../pg-errors";
import { enqueueClipProcessing } from "../queue";
import {
  clipKeys, deleteKeys, finishMultipartUpload, objectSize, presignUpload, presignUploadPart, startMultipartUpload,
} from "../storage";
import { loadClip } from "./clip-access";
import { fittingForWrite, getFitting } from "./fittings";
import { assertStrokeOfBuild } from "./strokes";

const { clips, builds, fittings } = schema;

/** Creates the clip row (`awaiting_upload`) and a presigned PUT bound to a key the server made. */
export async function createClipUpload(actor: SignedInActor, input: z.infer<typeof clipCreateSchema>) {
  const fitting = await fittingForWrite(actor, input.fittingId);
  const [build] = await db.select().from(builds).where(and(eq(builds.id, input.buildId), eq(builds.fittingId, fitting.id)));
  if (!build) throw new ApiError("not_found", "No such build in this fitting");
  if (input.strokeId) await assertStrokeOfBuild(input.strokeId, build.id);
  if (input.contentSha256) {
    const existing = await clipWithContent(fitting.id, input.contentSha256);
    if (existing) return duplicateAnswer(existing);
  }
  const max = env().UPLOAD_MAX_BYTES;
  if (input.sizeBytes > max) throw new ApiError("payload_too_large", `The file is ${mib(input.sizeBytes)}; the limit is ${mib(max)}`);
  if (!fitting.consentConfirmedAt) {
    if (!input.consentConfirmed) {
      throw new ApiError("unprocessable", "Confirm the golfer's consent to video (a guardian's for a minor) before the first upload of this fitting");
    }
    await db.update(fittings).set({ consentConfirmedAt: new Date() }).where(eq(fittings.id, fitting.id));
  }
  const [studio] = await db.select({ settings: schema.studios.settings }).from(schema.studios).where(eq(schema.studios.id, fitting.studioId));
  const captureFps = input.captureFps ?? studio!.settings.cameraFps[input.view];
  const id = crypto.randomUUID();
  const key = clipKeys(fitting.studioId, id).source;
  const inserted = await db
    .insert(clips)
    .values({
      id, studioId: fitting.studioId, fittingId: fitting.id, buildId: build.id, strokeId: input.strokeId ?? null, view: input.view,
      originalName: input.fileName, contentType: input.contentType, sizeBytes: input.sizeBytes, objectKey: key, captureFps,
      slowMotionFactor: input.slowMotionFactor ?? Math.max(1, Math.round(captureFps / 30)), createdBy: actor.userId,
      contentSha256: input.contentSha256 ?? null,
    })
    .returning()
    .catch((err: unknown) => {
      if (pgErrorCode(err) === "23505" && pgConstraint(err) === "clips_fitting_content_sha256_key") return null;
      // One clip per view in a stroke (unique index clips_stroke_view_key).
      if (pgErrorCode(err) === "23505") {
        throw new ApiError("conflict", `This stroke already has ${input.view === "overhead" ? "an" : "a"} ${input.view} clip`);
      }
      throw err;
    });
  // The first clip starts the fitting: planned → in progress (a later status set by hand stays).
  if (inserted !== null) await db.update(fittings).set({ status: "in_progress", updatedAt: new Date() }).where(and(eq(fittings.id, fitting.id), eq(fittings.status, "planned")));
  if (inserted === null) {
    // The same file was registered by a concurrent call a moment ago: answer with that clip.
    return duplicateAnswer((await clipWithContent(fitting.id, input.contentSha256!))!);
  }
  const clip = inserted[0]!;
  return { clip, duplicate: false, upload: await uploadTarget(clip) };
}

async function clipWithContent(fittingId: string, contentSha256: string) {
  const [row] = await db.select().from(clips).where(and(eq(clips.fittingId, fittingId), eq(clips.contentSha256, contentSha256)));
  return row;
}

/**
 * A file the fitting already has. While its upload never arrived (a dropped connection, a watcher
 * killed mid-file), the answer carries a fresh upload URL so that the sender can finish it.
 */
async function duplicateAnswer(clip: typeof clips.$inferSelect) {
  return { clip, duplicate: true, upload: clip.state === "awaiting_upload" ? await uploadTarget(clip) : null };
}

async function uploadTarget(clip: typeof clips.$inferSelect) {
  const url = await presignUpload(clip.objectKey, clip.contentType, clip.sizeBytes);
  return { method: "PUT" as const, url, headers: { "content-type": clip.contentType } };
}

const pgConstraint = (err: unknown) =>
  ((err as { cause?: { constraint?: string } }).cause?.constraint ?? (err as { constraint?: string }).constraint);

/**
 * A large file goes up in parts: presigned PUTs for the part numbers asked, in the clip's one
 * multipart upload (started here when no `uploadId` is given). The sender keeps the upload id
 * and the parts' ETags, so after a dropped connection or a restart it sends only missing parts.
 */
export async function presignClipParts(actor: SignedInActor, clipId: string, input: z.infer<typeof clipPartsSchema>) {
  const { clip } = await loadClip(actor, clipId, "golfer.write");
  if (clip.state !== "awaiting_upload") throw new ApiError("conflict", "This clip's file has already arrived");
  const started = input.uploadId ?? (await startMultipartUpload(clip.objectKey, clip.contentType));
  // The upload's id is kept so that deleting the clip, or the sweep of abandoned uploads, drops the
  // stored parts too; the time shows the upload is still moving.
  await db.update(clips).set({ multipartUploadId: started, updatedAt: new Date() }).where(eq(clips.id, clip.id));
  const uploadId = started;
  const parts = await Promise.all(input.partNumbers.map(async (partNumber) => ({
    partNumber, url: await presignUploadPart(clip.objectKey, started, partNumber),
  })));
  return { uploadId, parts };
}

/**
 * The browser says the upload is done: check the stored object (it must be there, with the
 * declared size) and queue processing once. A second call finds the clip queued and queues nothing.
 * A file sent in parts is first put together from them.
 */
export async function completeClipUpload(actor: SignedInActor, clipId: string, multipart: z.infer<typeof clipCompleteSchema> = {}) {
  const { clip } = await loadClip(actor, clipId, "golfer.write");
  if (clip.state !== "awaiting_upload") return { clip, queued: false };
  if (multipart.uploadId && multipart.parts) {
    await finishMultipartUpload(clip.objectKey, multipart.uploadId, multipart.parts).catch((err: unknown) => {
      const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
      if (status !== undefined && status >= 400 && status < 500) {
        throw new ApiError("conflict", `The store could not put the parts together (${(err as Error).name}): send the parts again`);
      }
      throw err;
    });
  }
  const size = await objectSize(clip.objectKey);
  if (size === null) throw new ApiError("conflict", "The upload has not arrived yet: send the file to the upload URL first");
  if (size !== clip.sizeBytes || size > env().UPLOAD_MAX_BYTES) {
    await deleteKeys([clip.objectKey]);
    throw new ApiError("unprocessable", `The stored file is ${size} bytes but ${clip.sizeBytes} were declared; upload it again`);
  }
  const [queued] = await db
    .update(clips)
    .set({ state: "queued", progress: 0, multipartUploadId: null, updatedAt: new Date() })
    .where(and(eq(clips.id, clip.id), eq(clips.state, "awaiting_upload")))
    .returning();
  if (!queued) return { clip: (await loadClip(actor, clipId)).clip, queued: false };
  try {
    await enqueueClipProcessing({ clipId: clip.id });
  } catch (err) {
    // Put the clip back so that the next completion call queues it again.
    await db.update(clips).set({ state: "awaiting_upload" }).where(eq(clips.id, clip.id));
    throw err;
  }
  return { clip: queued, queued: true };
}

/** The fitting's clips with their live state, for the upload panel. */
export async function listClipsOfFitting(actor: SignedInActor, fittingId: string) {
  await getFitting(actor, fittingId);
  return db
    .select({
      id: clips.id, buildId: clips.buildId, strokeId: clips.strokeId, view: clips.view, state: clips.state, progress: clips.progress,
      failureReason: clips.failureReason, originalName: clips.originalName, frameCount: clips.frameCount,
      captureFps: clips.captureFps, createdAt: clips.createdAt,
    })
    .from(clips)
    .where(eq(clips.fittingId, fittingId))
    .orderBy(asc(clips.createdAt));
}

const mib = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MiB`;

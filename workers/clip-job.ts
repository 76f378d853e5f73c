// Processes one uploaded clip: source from the store → frames, strip, poster, proxy and the
// motion signal back to the store and the clip row. Safe to run twice: every output has a
// fixed key and the row is overwritten, so a retry leaves exactly one set.
import { createWriteStream } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { storeTrackingResult } from "@/lib/server/dal/proposals";
import { clipKeys, clipPrefix, deleteKeys, getObjectStream, listKeys } from "@/lib/server/storage";
import type { TrackingResult } from "@/lib/tracking/types";
import { trackClipFile } from "./tracking/track-clip";
import { uploadFiles, type FileUpload } from "./upload-files";
import { ClipRefusedError, processClipFile } from "./video";
import { displaySize, probeHeader } from "./video/ffmpeg";

const { clips } = schema;
const frameName = (n: number) => `${String(n).padStart(6, "0")}.jpg`;

export type ClipJobOutcome = { outcome: "ready" | "refused" | "skipped"; seconds?: Record<string, number> };

export async function runClipJob(clipId: string, signal: AbortSignal, isLastTry: boolean): Promise<ClipJobOutcome> {
  const [clip] = await db.select().from(clips).where(eq(clips.id, clipId));
  if (!clip || clip.state === "ready" || clip.state === "awaiting_upload") return { outcome: "skipped" };
  // Phase times go to the log, so slow stores or slow decodes show up in production too.
  const t0 = performance.now();
  const seconds: Record<string, number> = {};
  const mark = (phase: string) => (seconds[phase] = Math.round(performance.now() - t0) / 1000);
  await setClip(clipId, { state: "processing", progress: 0, failureReason: null });
  const work = await mkdtemp(path.join(tmpdir(), "fitframe-clip-"));
  const keys = clipKeys(clip.studioId, clip.id);
  const stopTracking = new AbortController();
  let tracking: Promise<TrackingResult | null> = Promise.resolve(null);
  try {
    const input = path.join(work, "source");
    const body = await getObjectStream(clip.objectKey);
    if (!body) throw new Error("the uploaded file is missing from the store");
    await pipeline(body as Readable, createWriteStream(input), { signal });
    mark("downloaded");
    // The tracking pass runs beside processing (its own decode, on the second core); its result
    // is stored once the clip is ready. It never fails the job: without it the fitter marks by hand.
    tracking = clip.trackingEnabled
      ? startTracking(input, clip.view, clip.captureFps, AbortSignal.any([signal, stopTracking.signal])).then(
          (result) => (mark("tracked"), result),
          (err: unknown) => {
            if (!signal.aborted && !stopTracking.signal.aborted) console.error(JSON.stringify({ event: "clip_tracking_failed", clipId, error: String(err) }));
            return null;
          },
        )
      : Promise.resolve(null);

    const outDir = path.join(work, "out");
    const framesDir = path.join(outDir, "frames");
    const frameUpload = (n: number, dir = framesDir): FileUpload => ({
      file: path.join(dir, frameName(n)), movedTo: path.join(framesDir, frameName(n)), key: keys.frame(n), contentType: "image/jpeg",
    });
    // Uploads run beside ffmpeg; their first failure is kept and thrown once processing ends
    // (a rejected promise nobody awaits yet would bring the process down).
    let uploadError: unknown = null;
    const noteFailure = (err: unknown) => void (uploadError ??= err);
    let windowUpload: Promise<void> = Promise.resolve();
    // Frames go up while ffmpeg is still writing later ones; one chain keeps them in order.
    let streamed = -1;
    let streaming: Promise<void> = Promise.resolve();
    const stored = new Set<number>();
    let lastProgress = 0;
    const result = await processClipFile(input, outDir, {
      captureFps: clip.captureFps,
      slowMotionFactor: clip.slowMotionFactor,
      signal,
      onProgress: (percent) => {
        // A row update every 5 % is enough for the live list.
        if (percent - lastProgress >= 5 && percent < 100) {
          lastProgress = percent;
          void setClip(clipId, { progress: Math.round(percent * 0.9) });
        }
      },
      // The frames around impact go up first: the fitter reviews the putt just hit.
      onWindowReady: (frames) => {
        mark("windowWritten");
        frames.forEach((n) => stored.add(n));
        windowUpload = uploadFiles(frames.map((n) => frameUpload(n))).then(() => void mark("windowStored"), noteFailure);
      },
      onFramesWritten: (upTo, dir) => {
        const batch: FileUpload[] = [];
        for (let n = streamed + 1; n <= upTo; n++) {
          if (stored.has(n)) continue;
          stored.add(n);
          batch.push(frameUpload(n, dir));
        }
        streamed = Math.max(streamed, upTo);
        if (batch.length > 0) streaming = streaming.then(() => uploadFiles(batch)).catch(noteFailure);
      },
    });
    mark("processed");
    await Promise.all([windowUpload, streaming]);
    if (uploadError) throw uploadError;
    const rest: FileUpload[] = [];
    for (let n = 0; n < result.frameCount; n++) if (!stored.has(n)) rest.push(frameUpload(n));
    rest.push(
      { file: result.posterFile, key: keys.poster, contentType: "image/jpeg" },
      { file: result.stripFile, key: keys.strip, contentType: "image/jpeg" },
      { file: result.proxy.file, key: keys.proxy, contentType: "video/mp4" },
    );
    await uploadFiles(rest);
    mark("stored");
    await setClip(clipId, {
      state: "ready", progress: 100, failureReason: null,
      width: result.sourceWidth, height: result.sourceHeight, frameCount: result.frameCount,
      containerFps: result.containerFps, durationS: result.frameCount / result.containerFps,
      motionSignal: result.motionSignal, suggestedImpactFrame: result.suggestedImpact?.frame ?? null,
    });
    const tracked = await tracking;
    if (tracked) {
      await storeTrackingResult(clipId, tracked, result.suggestedImpact?.frame ?? null);
      mark("proposalsStored");
    }
    return { outcome: "ready", seconds };
  } catch (err) {
    if (err instanceof ClipRefusedError) {
      await fail(clip.studioId, clipId, err.reason);
      return { outcome: "refused" };
    }
    if (isLastTry && !signal.aborted) await fail(clip.studioId, clipId, "Processing failed three times; try uploading the clip again.");
    else await setClip(clipId, { state: "queued" });
    throw err;
  } finally {
    // A failed run stops its tracker, and waits for its ffmpeg to exit, before the source goes.
    stopTracking.abort();
    await tracking;
    await rm(work, { recursive: true, force: true });
  }
}

/** The tracker on the displayed picture; a file the probe refuses is left to processing to refuse. */
async function startTracking(input: string, view: typeof clips.$inferSelect.view, captureFps: number, signal: AbortSignal): Promise<TrackingResult | null> {
  const header = await probeHeader(input, signal).catch(() => null);
  if (!header?.hasVideo || header.isStillImage || header.width === 0) return null;
  const { width, height } = displaySize(header);
  // The motion suggestion is not known yet; the store applies it when the ball gives none.
  return trackClipFile(input, { view, captureFps, width, height, frameCount: header.headerFrameCount ?? 0, motionImpactFrame: null }, signal, { niceness: TRACKING_NICENESS });
}

/** The tracker's decode yields to the window frames (the fitter waits for those), like the full pass. */
const TRACKING_NICENESS = 10;

/** A refused clip keeps its row (with the reason) but no objects: nothing stray in the store. */
async function fail(studioId: string, clipId: string, reason: string) {
  await deleteKeys(await listKeys(clipPrefix(studioId, clipId)));
  await setClip(clipId, { state: "failed", failureReason: reason, progress: 0 });
}

function setClip(clipId: string, values: Partial<typeof clips.$inferInsert>) {
  return db.update(clips).set({ ...values, updatedAt: new Date() }).where(eq(clips.id, clipId));
}

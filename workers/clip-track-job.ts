// Re-runs the tracking pass on a ready clip: the source from the store, the tracker, the proposals
// stored in place of the previous ones. Hand marks are never touched; safe to run twice.
import { createWriteStream } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Readable } from "node:stream";
import { pipeline } from "node:stream/promises";
import { suggestImpactFrame } from "@/lib/motion";
import { storeTrackingResult, trackingSubject } from "@/lib/server/dal/proposals";
import { getObjectStream } from "@/lib/server/storage";
import { trackClipFile } from "./tracking/track-clip";

export type TrackJobOutcome = { outcome: "tracked" | "skipped"; seconds?: number; proposals?: number };

export async function runTrackJob(clipId: string, signal: AbortSignal): Promise<TrackJobOutcome> {
  const clip = await trackingSubject(clipId);
  if (!clip || clip.state !== "ready" || !clip.trackingEnabled || clip.width == null || clip.height == null || clip.frameCount == null) {
    return { outcome: "skipped" };
  }
  const work = await mkdtemp(path.join(tmpdir(), "fitframe-track-"));
  try {
    const input = path.join(work, "source");
    const body = await getObjectStream(clip.objectKey);
    if (!body) throw new Error("the uploaded file is missing from the store");
    await pipeline(body as Readable, createWriteStream(input), { signal });
    const motionImpactFrame = clip.motionSignal ? (suggestImpactFrame(clip.motionSignal)?.frame ?? null) : null;
    const result = await trackClipFile(
      input,
      { view: clip.view, captureFps: clip.captureFps, width: clip.width, height: clip.height, frameCount: clip.frameCount, motionImpactFrame },
      signal,
    );
    await storeTrackingResult(clipId, result, motionImpactFrame);
    return { outcome: "tracked", seconds: result.summary.seconds, proposals: result.proposals.length };
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

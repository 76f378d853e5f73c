// The tracking pass over one clip file: a grey decode (full size up to 1920 px on the long side)
// streamed through the ClipTracker; the decode stops as soon as nothing later can change the result.
import type { View } from "@/lib/marks/types";
import type { TrackingResult } from "@/lib/tracking/types";
import { capLongSide, readGreyFrames, VideoJobAbortedError } from "../video/ffmpeg";
import { ClipTracker } from "./clip-tracker";
import { loadOpenCv } from "./opencv";

export const TRACKING_MAX_LONG_SIDE = 1920;

export type TrackedClip = { view: View; captureFps: number; width: number; height: number; frameCount: number; motionImpactFrame: number | null };

export async function trackClipFile(file: string, clip: TrackedClip, signal?: AbortSignal, options: { niceness?: number } = {}): Promise<TrackingResult> {
  const started = performance.now();
  const { cv } = await loadOpenCv();
  const size = capLongSide(clip.width, clip.height, TRACKING_MAX_LONG_SIDE);
  const tracker = new ClipTracker(cv, size.width, size.height, { view: clip.view });
  const finished = new AbortController();
  const decodeSignal = signal ? AbortSignal.any([signal, finished.signal]) : finished.signal;
  try {
    await readGreyFrames(file, {
      width: size.width,
      height: size.height,
      signal: decodeSignal,
      deblock: true,
      niceness: options.niceness,
      onFrame: (frame, index) => {
        tracker.push(frame, index);
        if (tracker.done) finished.abort();
      },
    });
  } catch (error) {
    // Our own early stop is not a failure; the caller's abort is.
    if (!(error instanceof VideoJobAbortedError && finished.signal.aborted && !signal?.aborted)) throw error;
  }
  const seconds = Math.round(performance.now() - started) / 1000;
  return tracker.finish(clip.motionImpactFrame, clip.width / size.width, seconds);
}

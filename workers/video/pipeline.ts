/**
 * Turns one uploaded clip into what the review screens need, in this order:
 *  1. a header probe refuses unusable files in plain words;
 *  2. a fast small grey decode gives the motion signal and the suggested impact frame;
 *  3. the ±20 frames around it are sought and written first (onWindowReady);
 *  4. one full decode writes every frame as JPEG, the phone proxy and the contact strip.
 * Step 4 starts with step 2 at a lower CPU priority, so it soaks up idle cores without
 * delaying the window. Frames reach frames/ only by rename, so a reader never sees a
 * half-written JPEG (window frames are later replaced by identical full-pass files).
 * On any failure every ffmpeg has exited before the promise rejects; outDir may then
 * hold partial output, which the caller removes.
 */
import { mkdir, readdir, rename, rm } from "node:fs/promises";
import path from "node:path";
import { MotionSignalBuilder, suggestImpactFrame, type ImpactSuggestion } from "@/lib/motion";
import {
  capLongSide,
  displaySize,
  extractFrameWindow,
  probeHeader,
  readGreyFrames,
  renderFullPass,
  restoreNormalPriority,
  UnreadableVideoError,
  type VideoHeader,
} from "./ffmpeg";
import { proxyTiming, stripLayout } from "./layout";
import { ClipRefusedError, CLIP_LIMITS, refuseUnusable, tooManyFrames, truncated } from "./refusals";

export const FRAME_MAX_LONG_SIDE = 1920;
export const PROXY_MAX_LONG_SIDE = 720;
export const WINDOW_HALF_WIDTH = 20;
const MOTION_LONG_SIDE = 128;
const JPEG_QUALITY = 3;
const STRIP_THUMB_LONG_SIDE = 160;
const POSTER_LONG_SIDE = 720;
const FULL_PASS_NICENESS = 10;

export interface ClipProcessingOptions {
  captureFps: number;
  /** captureFps ÷ playback fps the golfer should see (8 = 240 fps shown at 30 fps) */
  slowMotionFactor: number;
  signal: AbortSignal;
  onProgress?: (percent: number) => void;
  onWindowReady?: (frames: number[]) => void;
  /**
   * While the full pass runs: frames 0..completeUpTo are finished files named %06d.jpg in
   * `dir`, so a caller may start storing them. They move to `framesDir` when the pass ends.
   */
  onFramesWritten?: (completeUpTo: number, dir: string) => void;
}

export interface ProcessedClip {
  frameCount: number;
  /** source size as displayed (after rotation); marks are in these pixels */
  sourceWidth: number;
  sourceHeight: number;
  frameWidth: number;
  frameHeight: number;
  containerFps: number;
  motionSignal: number[];
  suggestedImpact: ImpactSuggestion | null;
  windowFrames: number[];
  proxy: { file: string; fps: number; keepEvery: number; width: number; height: number };
  framesDir: string;
  posterFile: string;
  stripFile: string;
}

async function moveFrames(fromDir: string, toDir: string): Promise<void> {
  for (const name of await readdir(fromDir)) await rename(path.join(fromDir, name), path.join(toDir, name));
}

function progressReporter(onProgress?: (percent: number) => void) {
  let last = -1;
  return (percent: number) => {
    const p = Math.min(100, Math.floor(percent));
    if (p > last) {
      last = p;
      onProgress?.(p);
    }
  };
}

export async function processClipFile(input: string, outDir: string, options: ClipProcessingOptions): Promise<ProcessedClip> {
  const timing = proxyTiming(options.captureFps, options.slowMotionFactor);
  let header: VideoHeader;
  try {
    header = await probeHeader(input, options.signal);
  } catch (error) {
    if (error instanceof UnreadableVideoError) throw new ClipRefusedError(error.code, error.reason);
    throw error;
  }
  refuseUnusable(header);

  const source = displaySize(header);
  const frameSize = capLongSide(source.width, source.height, FRAME_MAX_LONG_SIDE);
  const scaled = frameSize.width !== source.width || frameSize.height !== source.height;
  const proxySize = capLongSide(source.width, source.height, PROXY_MAX_LONG_SIDE, true);
  const expectedFrames = header.headerFrameCount ?? Math.max(1, Math.round(header.durationS * header.containerFps));
  const framesDir = path.join(outDir, "frames");
  const fullStaging = path.join(outDir, ".full-pass");
  const windowStaging = path.join(outDir, ".window");
  const files = { proxy: path.join(outDir, "proxy.mp4"), poster: path.join(outDir, "poster.jpg"), strip: path.join(outDir, "strip.jpg") };
  await Promise.all([framesDir, fullStaging, windowStaging].map((d) => mkdir(d, { recursive: true })));

  // Our own controller stops the full pass when the clip turns out to be unusable.
  const internal = new AbortController();
  const signal = AbortSignal.any([options.signal, internal.signal]);
  const report = progressReporter(options.onProgress);
  let motionShare = 0, fullShare = 0, windowShare = 0;
  let fullPassPid: number | null = null;
  const update = () => report(15 * motionShare + 5 * windowShare + 80 * fullShare);

  const fullPass = renderFullPass(
    input,
    {
      framesDir: fullStaging,
      frameSize: scaled ? frameSize : null,
      jpegQuality: JPEG_QUALITY,
      proxy: { file: files.proxy, size: proxySize, playbackFps: timing.playbackFps, keepEvery: timing.keepEvery },
      strip: { file: files.strip, ...stripLayout(expectedFrames), thumbSize: capLongSide(source.width, source.height, STRIP_THUMB_LONG_SIDE, true) },
    },
    {
      signal,
      niceness: FULL_PASS_NICENESS,
      onStart: (pid) => (fullPassPid = pid),
      onFrameDone: (n) => {
        fullShare = n / expectedFrames;
        update();
        // ffmpeg counts frames handed to the muxer; the last one may still be being written.
        if (n >= 2) options.onFramesWritten?.(n - 2, fullStaging);
      },
    },
  );
  // Settled now so an early failure elsewhere never leaves an unhandled rejection.
  const fullPassSettled = fullPass.then(() => null, (error: unknown) => error);

  try {
    const motion = new MotionSignalBuilder();
    const motionSize = capLongSide(source.width, source.height, MOTION_LONG_SIDE, true);
    const grey = await readGreyFrames(input, {
      width: motionSize.width,
      height: motionSize.height,
      signal,
      onFrame: (frame, i) => {
        motion.push(frame);
        if (i % 16 === 0) {
          motionShare = i / expectedFrames;
          update();
        }
      },
    });
    if (header.headerFrameCount && grey.frameCount < header.headerFrameCount && grey.damaged) {
      throw truncated(grey.frameCount, header.headerFrameCount);
    }
    if (grey.frameCount === 0) throw new ClipRefusedError("not-a-video", "No picture could be read from this file.");
    if (grey.frameCount > CLIP_LIMITS.maxFrames) throw tooManyFrames(grey.frameCount);
    const frameCount = grey.frameCount;
    const signalValues = motion.signal();
    const suggestedImpact = suggestImpactFrame(signalValues);
    // Without a suggestion the window centres on the most motion, where impact usually is.
    const centre = suggestedImpact?.frame ?? signalValues.reduce((best, v, i) => (v > signalValues[best]! ? i : best), 0);
    const first = Math.max(0, centre - WINDOW_HALF_WIDTH);
    const last = Math.min(frameCount - 1, centre + WINDOW_HALF_WIDTH);
    const windowFrames = Array.from({ length: last - first + 1 }, (_, i) => first + i);
    await extractFrameWindow(
      input,
      {
        firstFrame: first,
        count: windowFrames.length,
        firstFrameTimeS: grey.frameTimesS[first] ?? first / header.containerFps,
        halfFrameS: 0.5 / header.containerFps,
        dir: windowStaging,
        size: scaled ? frameSize : null,
        jpegQuality: JPEG_QUALITY,
        poster: { offset: centre - first, file: files.poster, size: capLongSide(source.width, source.height, POSTER_LONG_SIDE, true) },
      },
      { signal },
    );
    await moveFrames(windowStaging, framesDir);
    windowShare = 1;
    update();
    options.onWindowReady?.(windowFrames);
    if (fullPassPid) restoreNormalPriority(fullPassPid);

    const fullError = await fullPassSettled;
    if (fullError) throw fullError;
    const written = (await readdir(fullStaging)).length;
    if (written !== frameCount) throw new Error(`the full pass wrote ${written} frames, the first pass read ${frameCount}`);
    await moveFrames(fullStaging, framesDir);
    report(100);
    return {
      frameCount,
      sourceWidth: source.width,
      sourceHeight: source.height,
      frameWidth: frameSize.width,
      frameHeight: frameSize.height,
      containerFps: header.containerFps,
      motionSignal: signalValues,
      suggestedImpact,
      windowFrames,
      proxy: { file: files.proxy, fps: timing.fps, keepEvery: timing.keepEvery, width: proxySize.width, height: proxySize.height },
      framesDir,
      posterFile: files.poster,
      stripFile: files.strip,
    };
  } catch (error) {
    internal.abort();
    await fullPassSettled; // the full pass has exited (killed) before we report
    throw error;
  } finally {
    await Promise.all([fullStaging, windowStaging].map((d) => rm(d, { recursive: true, force: true })));
  }
}

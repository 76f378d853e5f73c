// From the phone proxy's media time to source frames and back (pure).
// The proxy plays at captureFps ÷ slowMotionFactor; above 60 fps it keeps every k-th source
// frame (proxy frame j = source frame j·k), as workers/video/layout.ts `proxyTiming` makes it.

export const PROXY_MAX_FPS = 60;

export type ClipTiming = { captureFps: number; slowMotionFactor: number; frameCount: number };

/** Source frames per second of proxy playback, the thinning step k, and the proxy's own fps. */
export function playbackOf(t: Pick<ClipTiming, "captureFps" | "slowMotionFactor">) {
  if (!(t.captureFps > 0) || !(t.slowMotionFactor > 0)) throw new Error("captureFps and slowMotionFactor must be positive");
  const playbackFps = t.captureFps / t.slowMotionFactor;
  const keepEvery = playbackFps <= PROXY_MAX_FPS ? 1 : Math.ceil(playbackFps / PROXY_MAX_FPS);
  return { playbackFps, keepEvery, proxyFps: playbackFps / keepEvery };
}

const clampFrame = (n: number, frameCount: number) => Math.min(Math.max(n, 0), Math.max(frameCount - 1, 0));

/** The source frame shown at proxy media time `t` seconds: n = round(t · proxyFps) · k. */
export function sourceFrameAt(mediaTime: number, timing: ClipTiming): number {
  const { keepEvery, proxyFps } = playbackOf(timing);
  return clampFrame(Math.round(mediaTime * proxyFps) * keepEvery, timing.frameCount);
}

/**
 * The proxy media time at which source frame n is on screen. Seeks land a quarter into the
 * frame's display interval: past rounding error at its start, and `sourceFrameAt` of that
 * time still rounds back to the same frame.
 * With thinning, a frame between kept frames maps to the nearest kept one.
 */
export function mediaTimeOf(frame: number, timing: ClipTiming): number {
  const { keepEvery, proxyFps } = playbackOf(timing);
  const proxyFrame = Math.round(clampFrame(frame, timing.frameCount) / keepEvery);
  return (proxyFrame + 0.25) / proxyFps;
}

/** How many source frames one step moves: one proxy frame. */
export const stepSize = (timing: ClipTiming) => playbackOf(timing).keepEvery;

/** The time of a source frame in real (capture) time, for people: frame / captureFps. */
export const captureSeconds = (frame: number, captureFps: number) => frame / captureFps;

/** "0.742 s" — a frame's capture time to the millisecond. */
export function formatCaptureTime(frame: number, captureFps: number): string {
  return `${captureSeconds(frame, captureFps).toFixed(3)} s`;
}

/** Sizes and timings of the pipeline's outputs (pure). */

export const PROXY_MAX_FPS = 60;
const STRIP_TILES = 24;

/** Proxy timing: playback at captureFps ÷ slowMotionFactor, thinned to ≤ 60 fps by an integer step. */
export function proxyTiming(captureFps: number, slowMotionFactor: number): { playbackFps: number; keepEvery: number; fps: number } {
  if (!(captureFps > 0) || !(slowMotionFactor > 0)) throw new Error("captureFps and slowMotionFactor must be positive");
  const playbackFps = captureFps / slowMotionFactor;
  const keepEvery = playbackFps <= PROXY_MAX_FPS ? 1 : Math.ceil(playbackFps / PROXY_MAX_FPS);
  return { playbackFps, keepEvery, fps: playbackFps / keepEvery };
}

/** Every `every`-th frame, `tiles` of them in one row (no empty tiles at the end). */
export function stripLayout(frameCount: number): { every: number; tiles: number } {
  const every = Math.max(1, Math.ceil(frameCount / STRIP_TILES));
  return { every, tiles: Math.max(1, Math.ceil(frameCount / every)) };
}


// Up to three views of one stroke, lined up at impact: a moment is given as seconds from
// impact, and each clip shows the frame nearest that moment at its own capture rate.
export type SyncedClip = { impactFrame: number; captureFps: number; frameCount: number };

/** The frame of `clip` at `offsetS` seconds from its impact, or null when the clip does not reach it. */
export function frameAtOffset(clip: SyncedClip, offsetS: number): number | null {
  const frame = clip.impactFrame + Math.round(offsetS * clip.captureFps);
  return frame >= 0 && frame < clip.frameCount ? frame : null;
}

/** The span of moments (seconds from impact) that at least one clip covers. */
export function offsetSpan(clips: SyncedClip[]): { fromS: number; toS: number } {
  if (clips.length === 0) return { fromS: 0, toS: 0 };
  return {
    fromS: Math.min(...clips.map((c) => -c.impactFrame / c.captureFps)),
    toS: Math.max(...clips.map((c) => (c.frameCount - 1 - c.impactFrame) / c.captureFps)),
  };
}

/** The step between moments: one frame of the fastest camera. */
export function offsetStep(clips: SyncedClip[]): number {
  return 1 / Math.max(1, ...clips.map((c) => c.captureFps));
}

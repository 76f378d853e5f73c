// Two clips side by side, in step at impact (pure): each clip's frame is its impact frame
// plus the same capture time since impact.
import { captureSeconds } from "./timing";

export type AlignClip = { captureFps: number; impactFrame: number; frameCount: number };

/** Capture seconds relative to impact of a frame of clip a. */
export const sinceImpact = (frame: number, clip: AlignClip) => captureSeconds(frame - clip.impactFrame, clip.captureFps);

/** The frame of clip b at the same time relative to impact as `frame` of clip a (clamped to b). */
export function alignedFrame(frame: number, a: AlignClip, b: AlignClip): number {
  const n = b.impactFrame + Math.round(sinceImpact(frame, a) * b.captureFps);
  return Math.min(Math.max(n, 0), Math.max(b.frameCount - 1, 0));
}

/** The shared span, in seconds relative to impact, that both clips cover. */
export function sharedSpan(a: AlignClip, b: AlignClip): { from: number; to: number } {
  const from = Math.max(sinceImpact(0, a), sinceImpact(0, b));
  const to = Math.min(sinceImpact(a.frameCount - 1, a), sinceImpact(b.frameCount - 1, b));
  return { from, to };
}

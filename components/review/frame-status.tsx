import { frameTimeMs } from "@/lib/review/frames";
import { signedMs } from "@/lib/format/signed";
import type { ReviewMoments } from "./types";

type Props = { frame: number; frameCount: number; captureFps: number; moments: ReviewMoments; suggestedImpact: number | null };

/**
 * Frame number and time at the capture rate, always in view: relative to impact (negative before
 * it), or to the suggested impact until one is set, else from the first frame. Names the moment here.
 */
export function FrameStatus({ frame, frameCount, captureFps, moments, suggestedImpact }: Props) {
  const here = Object.entries(moments).filter(([, n]) => n === frame).map(([name]) => name);
  const reference = moments.impact ?? suggestedImpact;
  const time = reference === null
    ? `${frameTimeMs(frame, captureFps).toFixed(1)} ms`
    : `${signedMs(frameTimeMs(frame - reference, captureFps))} from ${moments.impact === null ? "suggested impact" : "impact"}`;
  return (
    <p className="num flex items-baseline gap-3 text-body text-chalk" aria-live="polite">
      <span>Frame <strong data-testid="frame-number">{frame}</strong> / {frameCount - 1}</span>
      <span className="text-slate-300" data-testid="frame-time">{time}</span>
      {here.length > 0 && <span className="text-label uppercase text-signal-light">{here.join(", ")}</span>}
    </p>
  );
}

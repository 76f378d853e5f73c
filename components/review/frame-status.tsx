import { frameTimeMs } from "@/lib/review/frames";
import type { ReviewMoments } from "./types";

/** Frame number and time at the capture rate, always in view; names the moment on this frame. */
export function FrameStatus({ frame, frameCount, captureFps, moments }: { frame: number; frameCount: number; captureFps: number; moments: ReviewMoments }) {
  const here = Object.entries(moments).filter(([, n]) => n === frame).map(([name]) => name);
  return (
    <p className="num flex items-baseline gap-3 text-body text-chalk" aria-live="polite">
      <span>Frame <strong data-testid="frame-number">{frame}</strong> / {frameCount - 1}</span>
      <span className="text-slate-300">{frameTimeMs(frame, captureFps).toFixed(1)} ms</span>
      {here.length > 0 && <span className="text-label uppercase text-signal-light">{here.join(", ")}</span>}
    </p>
  );
}

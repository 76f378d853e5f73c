"use client";
// The views of one stroke side by side, stepped together in time from impact.
import { useState } from "react";
import { frameAtOffset, offsetSpan, offsetStep, type SyncedClip } from "@/lib/strokes/sync";

type StrokeClip = { id: string; view: string; state: string; frameCount: number | null; captureFps: number; impactFrame: number | null; impactConfirmed: boolean };

export function StrokeViewer({ clips }: { clips: StrokeClip[] }) {
  const synced = clips.filter((c): c is StrokeClip & SyncedClip => c.state === "ready" && c.frameCount !== null && c.impactFrame !== null);
  const span = offsetSpan(synced);
  const step = offsetStep(synced);
  const [steps, setSteps] = useState(0);
  const offsetS = Math.min(span.toS, Math.max(span.fromS, steps * step));
  if (clips.length === 0) return <p className="text-slate-600">No clips in this stroke yet.</p>;
  const move = (n: number) => setSteps((s) => Math.round(Math.min(span.toS, Math.max(span.fromS, (s + n) * step)) / step));
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <button type="button" className="btn-quiet" onClick={() => move(-10)}>−10</button>
        <button type="button" className="btn-quiet" onClick={() => move(-1)} aria-label="One frame back">◀</button>
        <button type="button" className="btn-primary" onClick={() => setSteps(0)}>Impact</button>
        <button type="button" className="btn-quiet" onClick={() => move(1)} aria-label="One frame on">▶</button>
        <button type="button" className="btn-quiet" onClick={() => move(10)}>+10</button>
        <output className="num ml-2" data-offset-ms={Math.round(offsetS * 1000)}>
          {offsetS === 0 ? "at impact" : `${offsetS > 0 ? "+" : "−"}${Math.abs(offsetS * 1000).toFixed(1)} ms from impact`}
        </output>
      </div>
      <ul className="grid gap-3 md:grid-cols-3">
        {clips.map((clip) => {
          const frame = synced.includes(clip as StrokeClip & SyncedClip) ? frameAtOffset(clip as StrokeClip & SyncedClip, offsetS) : null;
          return (
            <li key={clip.id} className="flex flex-col gap-1" data-view={clip.view} data-frame={frame ?? ""}>
              <div className="flex aspect-video items-center justify-center overflow-hidden rounded-card bg-ink text-label text-slate-300">
                {frame === null ? (
                  clip.state === "ready" ? "no frame at this moment" : clip.state.replace("_", " ")
                ) : (
                  // eslint-disable-next-line @next/next/no-img-element -- a presigned redirect per frame
                  <img src={`/api/clips/${clip.id}/frames/${frame}`} alt={`${clip.view}, frame ${frame}`} className="h-full w-full object-contain" />
                )}
              </div>
              <p className="text-label text-slate-600">
                {clip.view}{frame !== null && <span className="num"> · frame {frame}</span>}
                {clip.impactFrame !== null && !clip.impactConfirmed && " · impact suggested, not yet confirmed"}
              </p>
            </li>
          );
        })}
      </ul>
    </div>
  );
}

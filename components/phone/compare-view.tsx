"use client";
// Two clips side by side, in step at impact: clip A leads; clip B follows at the same capture
// time relative to its own impact (lib/playback/align), its speed matched to A's.
import { useCallback, useRef, useState } from "react";
import { alignedFrame } from "@/lib/playback/align";
import { formatCaptureTime, stepSize } from "@/lib/playback/timing";
import { ClipPlayer, type PlayerClip, type PlayerHandle } from "./clip-player";
import type { PlayerMark } from "./draw-marks";

type Side = { clip: PlayerClip & { moments: { address: number | null; impact: number | null } }; marks: PlayerMark[]; buildLabel: string };
const SPEEDS = [0.25, 0.5, 1] as const;

const alignOf = (c: Side["clip"]) => ({ captureFps: c.captureFps, impactFrame: c.moments.impact ?? 0, frameCount: c.frameCount });

export function CompareView({ a, b }: { a: Side; b: Side }) {
  const pa = useRef<PlayerHandle>(null);
  const pb = useRef<PlayerHandle>(null);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState<(typeof SPEEDS)[number]>(0.25);
  const [frameA, setFrameA] = useState(0);
  const stepB = stepSize(b.clip);

  const follow = useCallback((n: number) => {
    setFrameA(n);
    const target = alignedFrame(n, alignOf(a.clip), alignOf(b.clip));
    const current = pb.current?.frame() ?? target;
    // Paused: exactly in step. Playing: both run at matched speed; correct only real drift.
    if (!playing ? current !== target : Math.abs(current - target) > 2 * stepB) pb.current?.seek(target, playing);
  }, [a.clip, b.clip, playing, stepB]);

  // Once stopped, put B exactly in step with A's last frame.
  const realign = useCallback(() => {
    const n = pa.current?.frame();
    if (n !== undefined) pb.current?.seek(alignedFrame(n, alignOf(a.clip), alignOf(b.clip)));
  }, [a.clip, b.clip]);
  const onPlayingA = useCallback((p: boolean) => {
    setPlaying(p);
    if (!p) realign();
  }, [realign]);

  const play = () => {
    pa.current?.setRate(speed);
    pb.current?.setRate((speed * b.clip.slowMotionFactor) / a.clip.slowMotionFactor);
    pa.current?.play();
    pb.current?.play();
  };
  const pause = () => {
    pa.current?.pause();
    pb.current?.pause();
    realign();
  };
  const stepBy = (steps: number) => pa.current?.seek(Math.min(Math.max(frameA + steps * stepSize(a.clip), 0), a.clip.frameCount - 1));
  const sinceImpact = (frameA - (a.clip.moments.impact ?? 0)) / a.clip.captureFps;

  return (
    <div className="flex flex-col gap-3">
      <div className="grid grid-cols-2 gap-2">
        {[{ side: a, ref: pa, label: "left" }, { side: b, ref: pb, label: "right" }].map(({ side, ref, label }) => (
          <figure key={label} className="min-w-0" data-testid={`compare-${label}`}>
            <ClipPlayer
              ref={ref}
              clip={side.clip}
              marks={side.marks}
              controls={false}
              label={side.buildLabel}
              onFrame={label === "left" ? follow : undefined}
              onPlaying={label === "left" ? onPlayingA : undefined}
            />
            <figcaption className="truncate text-label">{side.buildLabel}</figcaption>
          </figure>
        ))}
      </div>
      <p className="num text-center text-label text-slate-700">{sinceImpact >= 0 ? "+" : "−"}{formatCaptureTime(Math.abs(frameA - (a.clip.moments.impact ?? 0)), a.clip.captureFps)} from impact</p>
      <div className="grid grid-cols-4 gap-2">
        <button type="button" className="btn-quiet px-2" onClick={() => stepBy(-1)} aria-label="Previous frame">◀︎</button>
        <button type="button" className="btn-primary px-2" onClick={playing ? pause : play}>{playing ? "Pause" : "Play"}</button>
        <button type="button" className="btn-quiet px-2" onClick={() => stepBy(1)} aria-label="Next frame">▶︎</button>
        <select aria-label="Speed" className="field min-h-touch px-2" value={speed} onChange={(e) => setSpeed(Number(e.target.value) as (typeof SPEEDS)[number])}>
          {SPEEDS.map((s) => <option key={s} value={s}>{s === 1 ? "1×" : s === 0.5 ? "½×" : "¼×"}</option>)}
        </select>
      </div>
      <button type="button" className="btn-quiet" onClick={() => pa.current?.seek(a.clip.moments.impact ?? 0)}>Impact</button>
    </div>
  );
}

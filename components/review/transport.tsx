"use client";

import { framesPerSecond, PLAYBACK_SPEEDS, type PlayRange } from "@/lib/review/playback";
import type { usePlayback } from "./use-playback";

type Props = {
  frame: number;
  frameCount: number;
  captureFps: number;
  playback: ReturnType<typeof usePlayback>;
  onStep: (by: number) => void;
  zoomPercent: number;
  fitted: boolean;
};

const button = "min-h-9 min-w-9 rounded border border-ink-600 px-2 text-label text-chalk hover:border-chalk disabled:opacity-40";
const field = "w-16 rounded border border-ink-600 bg-ink px-1.5 py-0.5 text-chalk num";

/** Frame-step buttons, play/pause with speed, loop and range, and the zoom level. */
export function Transport({ frame, frameCount, captureFps, playback, onStep, zoomPercent, fitted }: Props) {
  const { range } = playback;
  const setEnd = (key: keyof PlayRange, value: number) => {
    const n = Math.min(Math.max(Math.round(value), 0), frameCount - 1);
    playback.setRange({ ...range, [key]: n });
  };
  const fps = framesPerSecond(captureFps, playback.speed);
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1 border-t border-ink-700 bg-ink-800 px-3 py-1.5" role="group" aria-label="Playback">
      <div className="flex items-center gap-1">
        <button type="button" className={button} aria-label="Back 10 frames" onClick={() => onStep(-10)}>−10</button>
        <button type="button" className={button} aria-label="Previous frame" onClick={() => onStep(-1)}>‹ 1</button>
        <button type="button" className={`${button} w-20 font-medium`} aria-label={playback.playing ? "Pause" : "Play"} data-testid="play" onClick={playback.toggle}>
          {playback.playing ? "Pause" : "Play"}
        </button>
        <button type="button" className={button} aria-label="Next frame" onClick={() => onStep(1)}>1 ›</button>
        <button type="button" className={button} aria-label="Forward 10 frames" onClick={() => onStep(10)}>+10</button>
      </div>
      <label className="flex items-center gap-1.5 text-label text-slate-300">
        Speed
        <select className="rounded border border-ink-600 bg-ink px-1.5 py-0.5 text-chalk" value={playback.speed}
          onChange={(e) => {
            playback.setSpeed(Number(e.target.value));
            e.target.blur();
          }}>
          {PLAYBACK_SPEEDS.map((s) => <option key={s.label} value={s.value}>{s.label}</option>)}
        </select>
        <span className="num text-slate-400">{fps >= 10 ? Math.round(fps) : fps.toFixed(1)} frames/s</span>
      </label>
      <label className="flex items-center gap-1.5 text-label text-slate-300">
        <input type="checkbox" checked={playback.loop} onChange={(e) => playback.setLoop(e.target.checked)} />
        Loop
      </label>
      <div className="flex items-center gap-1.5 text-label text-slate-300">
        <label className="flex items-center gap-1">From<input type="number" aria-label="Play from frame" className={field} value={range.from} min={0} max={frameCount - 1} onChange={(e) => setEnd("from", Number(e.target.value))} /></label>
        <label className="flex items-center gap-1">to<input type="number" aria-label="Play to frame" className={field} value={range.to} min={0} max={frameCount - 1} onChange={(e) => setEnd("to", Number(e.target.value))} /></label>
        <button type="button" className={button} title="Start the range on this frame" onClick={() => setEnd("from", frame)}>From here</button>
        <button type="button" className={button} title="End the range on this frame" onClick={() => setEnd("to", frame)}>To here</button>
        {playback.rangeByHand && <button type="button" className={button} onClick={() => playback.setRange(null)}>Address → finish</button>}
      </div>
      <span className="num ml-auto text-label text-slate-300" data-testid="zoom-level" title="Frame pixels shown per screen pixel; 0 fits the frame">
        Zoom {zoomPercent}%{fitted ? " (fit)" : ""}
      </span>
    </div>
  );
}

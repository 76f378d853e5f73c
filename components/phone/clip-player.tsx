"use client";
// The phone player: the proxy video with the marks drawn in step on a canvas above it.
// The frame comes from requestVideoFrameCallback's media time (the frame actually shown),
// mapped to the source frame by lib/playback; marks show on their frame and fade shortly after.
import { forwardRef, useCallback, useEffect, useImperativeHandle, useRef, useState } from "react";
import { containTransform, overlayCanvasSize } from "@/lib/playback/canvas-size";
import { visibleMarks } from "@/lib/playback/marks-visible";
import { formatCaptureTime, mediaTimeOf, sourceFrameAt, stepSize, type ClipTiming } from "@/lib/playback/timing";
import { drawMarks, type PlayerMark } from "./draw-marks";
import { useSwipeStep } from "./use-swipe-step";

export type PlayerClip = ClipTiming & { id: string; width: number; height: number; moments: { address: number | null; impact: number | null } };
export type PlayerHandle = { seek: (frame: number, keepPlaying?: boolean) => void; pause: () => void; play: () => void; setRate: (rate: number) => void; frame: () => number };

type Props = { clip: PlayerClip; marks: PlayerMark[]; label?: string; onFrame?: (frame: number) => void; onPlaying?: (playing: boolean) => void; controls?: boolean };

const SPEEDS = [0.25, 0.5, 1] as const;
const LOG_MAX = 400;

type VideoWithFrames = HTMLVideoElement & {
  requestVideoFrameCallback?: (cb: (now: number, meta: { mediaTime: number }) => void) => number;
  cancelVideoFrameCallback?: (handle: number) => void;
};

export const ClipPlayer = forwardRef<PlayerHandle, Props>(function ClipPlayer({ clip, marks, label, onFrame, onPlaying, controls = true }, ref) {
  const videoRef = useRef<VideoWithFrames>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const boxRef = useRef<HTMLDivElement>(null);
  const frameRef = useRef(0);
  // A seek not yet on screen: steps in quick succession count from it, not from the old frame.
  const pendingRef = useRef<number | null>(null);
  const drawnLog = useRef<string[]>([]);
  const [frame, setFrame] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState<(typeof SPEEDS)[number]>(0.25);
  const step = stepSize(clip);

  const draw = useCallback((n: number) => {
    const canvas = canvasRef.current;
    const box = boxRef.current;
    if (!canvas || !box) return;
    const { width, height, ratio } = overlayCanvasSize(box.clientWidth, box.clientHeight, window.devicePixelRatio);
    if (canvas.width !== width || canvas.height !== height) Object.assign(canvas, { width, height });
    const ctx = canvas.getContext("2d");
    if (!ctx) return;
    const shown = visibleMarks(marks, n, clip.captureFps);
    drawMarks(ctx, shown, { ...containTransform(clip.width, clip.height, box.clientWidth, box.clientHeight), ratio });
    // For people and tests: which marks were drawn on which frames (the latest LOG_MAX).
    const drawn = shown.map((s) => `${s.mark.id}@${n}`);
    if (drawn.length) drawnLog.current = [...drawnLog.current, ...drawn].slice(-LOG_MAX);
    canvas.dataset.frame = String(n);
    canvas.dataset.marks = shown.map((s) => s.mark.id).join(" ");
    canvas.dataset.drawn = drawnLog.current.join(" ");
  }, [marks, clip]);

  const show = useCallback((n: number) => {
    frameRef.current = n;
    if (pendingRef.current === n) pendingRef.current = null;
    draw(n);
    setFrame(n);
    onFrame?.(n);
  }, [draw, onFrame]);

  // Follow the frames the video presents; fall back to timeupdate where the callback is missing.
  useEffect(() => {
    const video = videoRef.current;
    if (!video) return;
    let handle = 0;
    const fromTime = (t: number) => show(sourceFrameAt(t, clip));
    if (video.requestVideoFrameCallback) {
      const onFrameShown = (_: number, meta: { mediaTime: number }) => {
        fromTime(meta.mediaTime);
        handle = video.requestVideoFrameCallback!(onFrameShown);
      };
      handle = video.requestVideoFrameCallback(onFrameShown);
      return () => video.cancelVideoFrameCallback?.(handle);
    }
    const onTime = () => fromTime(video.currentTime);
    video.addEventListener("timeupdate", onTime);
    video.addEventListener("seeked", onTime);
    return () => {
      video.removeEventListener("timeupdate", onTime);
      video.removeEventListener("seeked", onTime);
    };
  }, [clip, show]);

  useEffect(() => {
    const box = boxRef.current;
    if (!box) return;
    const observer = new ResizeObserver(() => draw(frameRef.current));
    observer.observe(box);
    return () => observer.disconnect();
  }, [draw]);

  useEffect(() => {
    if (videoRef.current && controls) videoRef.current.playbackRate = speed;
  }, [speed, controls]);

  const seek = useCallback((n: number, keepPlaying = false) => {
    const video = videoRef.current;
    if (!video) return;
    if (!keepPlaying) video.pause();
    // Only kept proxy frames can be shown: snap to one so the pending seek is recognised.
    const target = Math.min(Math.round(n / step) * step, clip.frameCount - 1);
    pendingRef.current = target;
    video.currentTime = mediaTimeOf(target, clip);
  }, [clip, step]);
  const stepBy = useCallback((steps: number) => {
    const from = pendingRef.current ?? frameRef.current;
    seek(Math.min(Math.max(from + steps * step, 0), clip.frameCount - 1));
  }, [seek, step, clip.frameCount]);

  useImperativeHandle(ref, () => ({
    seek,
    pause: () => videoRef.current?.pause(),
    play: () => void videoRef.current?.play(),
    setRate: (rate: number) => { if (videoRef.current) videoRef.current.playbackRate = rate; },
    frame: () => frameRef.current,
  }), [seek]);

  const swipe = useSwipeStep(stepBy, controls && !playing);
  const toggle = () => {
    const video = videoRef.current;
    if (!video) return;
    if (video.paused) void video.play();
    else video.pause();
  };

  return (
    <div className="flex flex-col gap-2">
      <div
        ref={boxRef}
        className="relative w-full touch-pan-y select-none overflow-hidden rounded-card bg-ink"
        style={{ aspectRatio: `${clip.width} / ${clip.height}` }}
        data-testid="player-stage"
        {...swipe.handlers}
        onClick={() => { if (controls && !swipe.moved.current) toggle(); }}
      >
        <video
          ref={videoRef}
          className="absolute inset-0 h-full w-full object-contain"
          src={`/api/clips/${clip.id}/media/proxy`}
          poster={`/api/clips/${clip.id}/media/poster`}
          playsInline
          muted
          preload="auto"
          onPlay={() => { pendingRef.current = null; setPlaying(true); onPlaying?.(true); }}
          onPause={() => { setPlaying(false); onPlaying?.(false); }}
          aria-label={label ?? "Clip"}
        />
        <canvas ref={canvasRef} className="pointer-events-none absolute inset-0 h-full w-full" data-testid="mark-layer" aria-hidden />
      </div>
      <p className="num flex justify-between text-label text-slate-700" aria-live="polite">
        <span>Frame <span data-testid="current-frame">{frame}</span></span>
        <span>{formatCaptureTime(frame, clip.captureFps)}</span>
      </p>
      {controls && (
        <>
          <div className="grid grid-cols-4 gap-2">
            <button type="button" className="btn-quiet px-2" onClick={() => stepBy(-1)} aria-label="Previous frame">◀︎</button>
            <button type="button" className="btn-primary px-2" onClick={toggle}>{playing ? "Pause" : "Play"}</button>
            <button type="button" className="btn-quiet px-2" onClick={() => stepBy(1)} aria-label="Next frame">▶︎</button>
            <select aria-label="Speed" className="field min-h-touch px-2" value={speed} onChange={(e) => setSpeed(Number(e.target.value) as (typeof SPEEDS)[number])}>
              {SPEEDS.map((s) => <option key={s} value={s}>{s === 1 ? "1×" : s === 0.5 ? "½×" : "¼×"}</option>)}
            </select>
          </div>
          <div className="grid grid-cols-2 gap-2">
            <button type="button" className="btn-quiet" disabled={clip.moments.address === null} onClick={() => clip.moments.address !== null && seek(clip.moments.address)}>Address</button>
            <button type="button" className="btn-quiet" disabled={clip.moments.impact === null} onClick={() => clip.moments.impact !== null && seek(clip.moments.impact)}>Impact</button>
          </div>
        </>
      )}
    </div>
  );
});

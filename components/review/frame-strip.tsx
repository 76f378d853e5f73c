"use client";

import { useRef } from "react";
import { frameAtX, frameToPercent, signalPoints } from "@/lib/review/strip";
import type { ReviewMoments } from "./types";

type Props = {
  frameCount: number;
  frame: number;
  signal: number[] | null;
  moments: ReviewMoments;
  suggestedImpact: number | null;
  /** Comment threads, drawn as small flags along the top; a click on one jumps to its frame. */
  comments?: { id: string; frame: number; resolved: boolean }[];
  onSeek: (frame: number) => void;
};

const HEIGHT = 40;

/** The motion signal along the clip with pins for the moments; click or drag to seek. */
export function FrameStrip({ frameCount, frame, signal, moments, suggestedImpact, comments = [], onSeek }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const seekAt = (clientX: number) => {
    const box = ref.current?.getBoundingClientRect();
    if (box) onSeek(frameAtX(clientX - box.left, box.width, frameCount));
  };
  const pins = Object.entries(moments).filter((e): e is [string, number] => e[1] !== null);
  return (
    <div
      ref={ref}
      role="slider"
      aria-label="Frame"
      aria-valuemin={0}
      aria-valuemax={frameCount - 1}
      aria-valuenow={frame}
      tabIndex={-1}
      className="relative h-14 cursor-pointer select-none border-t border-ink-700 bg-ink-800"
      style={{ touchAction: "none" }}
      onPointerDown={(e) => {
        e.currentTarget.setPointerCapture(e.pointerId);
        seekAt(e.clientX);
      }}
      onPointerMove={(e) => e.currentTarget.hasPointerCapture(e.pointerId) && seekAt(e.clientX)}
    >
      <svg className="absolute inset-x-0 top-2 h-10 w-full" viewBox={`0 0 ${Math.max(frameCount - 1, 1)} ${HEIGHT}`} preserveAspectRatio="none" aria-hidden>
        {signal && <polyline points={signalPoints(signal, HEIGHT)} fill="none" stroke="#8E9BA5" strokeWidth={1.5} vectorEffect="non-scaling-stroke" />}
      </svg>
      {/* Once impact is confirmed on the suggested frame, one pin says both. */}
      {suggestedImpact !== null && suggestedImpact !== moments.impact && (
        <Pin at={frameToPercent(suggestedImpact, frameCount)} text="suggested impact" dashed />
      )}
      {pins.map(([name, n]) => <Pin key={name} at={frameToPercent(n, frameCount)} text={name} />)}
      {comments.map((c) => (
        <button key={c.id} type="button" data-testid="comment-marker" aria-label={`Comment at frame ${c.frame}`}
          className={`absolute -top-1.5 h-3 w-3 -translate-x-1/2 rotate-45 border border-ink ${c.resolved ? "bg-slate-400" : "bg-signal"}`}
          style={{ left: `${frameToPercent(c.frame, frameCount)}%` }}
          onPointerDown={(e) => e.stopPropagation()}
          onClick={() => onSeek(c.frame)} />
      ))}
      <div className="pointer-events-none absolute inset-y-0 w-0.5 bg-signal" style={{ left: `${frameToPercent(frame, frameCount)}%` }} />
    </div>
  );
}

// The suggestion's label sits at the foot of the strip, so a moment set a few frames away never covers it.
function Pin({ at, text, dashed = false }: { at: number; text: string; dashed?: boolean }) {
  return (
    <div className="pointer-events-none absolute inset-y-0" style={{ left: `${at}%` }}>
      <div className={`h-full border-l ${dashed ? "border-dashed border-slate-400" : "border-chalk"}`} />
      <span className={`absolute left-1 whitespace-nowrap text-[10px] leading-3 text-slate-200 ${dashed ? "bottom-0" : "top-0"}`}>{text}</span>
    </div>
  );
}

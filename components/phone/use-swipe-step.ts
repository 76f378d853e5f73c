"use client";
// Horizontal swipe on the video steps frames: one step per STEP_PX of finger travel
// (right = forward). Vertical moves are left to the page (touch-action: pan-y).
import { useRef, type PointerEvent } from "react";

const STEP_PX = 24;

export function useSwipeStep(onStep: (steps: number) => void, enabled: boolean) {
  const start = useRef<{ x: number; y: number; applied: number; id: number } | null>(null);
  const moved = useRef(false);
  return {
    moved,
    handlers: {
      onPointerDown(e: PointerEvent<HTMLElement>) {
        moved.current = false;
        if (!enabled) return;
        start.current = { x: e.clientX, y: e.clientY, applied: 0, id: e.pointerId };
      },
      onPointerMove(e: PointerEvent<HTMLElement>) {
        const s = start.current;
        if (!s || s.id !== e.pointerId) return;
        const dx = e.clientX - s.x;
        if (Math.abs(dx) < Math.abs(e.clientY - s.y)) return;
        const steps = Math.trunc(dx / STEP_PX);
        if (steps !== s.applied) {
          moved.current = true;
          onStep(steps - s.applied);
          s.applied = steps;
        }
      },
      onPointerUp() {
        start.current = null;
      },
      onPointerCancel() {
        start.current = null;
      },
    },
  };
}

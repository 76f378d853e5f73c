"use client";

import { useEffect, useRef } from "react";
import type { Vec2 } from "@/lib/geometry/vector";

const SIZE = 144;

/**
 * A magnifier while placing a point: the frame around the pointer at `zoom` screen px per frame
 * px (pixels kept sharp) with a cross at the exact spot. Sits in the corner away from the pointer.
 */
export function Loupe({ bitmap, at, zoom, pointerOnLeft }: { bitmap: ImageBitmap | null; at: Vec2; zoom: number; pointerOnLeft: boolean }) {
  const ref = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const ctx = ref.current?.getContext("2d");
    if (!ctx) return;
    ctx.fillStyle = "#0E1A24";
    ctx.fillRect(0, 0, SIZE, SIZE);
    if (bitmap) {
      const span = SIZE / zoom;
      ctx.imageSmoothingEnabled = false;
      ctx.drawImage(bitmap, at[0] - span / 2, at[1] - span / 2, span, span, 0, 0, SIZE, SIZE);
    }
    ctx.strokeStyle = "#FF5A36";
    ctx.lineWidth = 1;
    ctx.beginPath();
    ctx.moveTo(SIZE / 2, 0); ctx.lineTo(SIZE / 2, SIZE / 2 - 6);
    ctx.moveTo(SIZE / 2, SIZE / 2 + 6); ctx.lineTo(SIZE / 2, SIZE);
    ctx.moveTo(0, SIZE / 2); ctx.lineTo(SIZE / 2 - 6, SIZE / 2);
    ctx.moveTo(SIZE / 2 + 6, SIZE / 2); ctx.lineTo(SIZE, SIZE / 2);
    ctx.stroke();
  }, [bitmap, at, zoom]);
  return (
    <div data-testid="loupe" className={`pointer-events-none absolute top-2 z-10 rounded-full border-2 border-chalk shadow ${pointerOnLeft ? "right-2" : "left-2"}`}>
      <canvas ref={ref} width={SIZE} height={SIZE} className="block rounded-full" />
      <span className="num absolute -bottom-5 left-0 right-0 text-center text-[11px] text-slate-200">×{zoom.toFixed(zoom < 10 ? 1 : 0)}</span>
    </div>
  );
}

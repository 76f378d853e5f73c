// The frame strip's maths: the motion signal as an SVG polyline, and x ↔ frame.

/** Points for an SVG polyline in a `frameCount-1 × height` box, y down, the signal's peak at the top. */
export function signalPoints(signal: readonly number[], height: number): string {
  if (signal.length === 0) return "";
  const max = Math.max(...signal.filter(Number.isFinite), 0);
  const y = (v: number) => (max > 0 && Number.isFinite(v) ? height - (v / max) * height : height);
  return signal.map((v, i) => `${i},${y(v).toFixed(2)}`).join(" ");
}

/** The frame under a pointer at `x` on a strip `width` wide showing frames 0…frameCount−1. */
export function frameAtX(x: number, width: number, frameCount: number): number {
  if (width <= 0 || frameCount <= 1) return 0;
  const f = Math.round((x / width) * (frameCount - 1));
  return Math.min(Math.max(f, 0), frameCount - 1);
}

/** Where frame n sits along the strip, as a percentage of its width. */
export const frameToPercent = (n: number, frameCount: number) => (frameCount <= 1 ? 0 : (n / (frameCount - 1)) * 100);

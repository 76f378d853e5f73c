// Has the camera moved between two putts? Decided from the video itself: the first frames of both
// clips are compared in a band around the reference marks (target or ground line, scale, plane).
// For every shift of up to ±MAX_SHIFT px the median absolute grey difference over the band is
// taken — a median, so a golfer or putter covering part of the band in one clip does not count.
// The camera is still when the unshifted frames already agree (median ≤ STILL_MEDIAN grey levels)
// and no shift beyond 1 px agrees clearly better (by more than SHIFT_GAIN levels): a camera
// knocked by a few pixels is caught by the shift search even on a plain carpet with some texture.
import type { Vec2 } from "@/lib/geometry/vector";
import type { GreyImage } from "@/lib/tracking/image";

export const MAX_SHIFT = 4;
export const STILL_MEDIAN = 8;
export const SHIFT_GAIN = 1;
export const BAND_PX = 20;

export type StillVerdict = { still: boolean; shift: Vec2; medianAtZero: number; bestMedian: number; samples: number; reason: string };

/** Distance from p to the segment a–b. */
function toSegment(p: Vec2, a: Vec2, b: Vec2): number {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? Math.min(Math.max(((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2, 0), 1) : 0;
  return Math.hypot(p[0] - a[0] - t * dx, p[1] - a[1] - t * dy);
}

/** Pixel centres within `band` px of any segment, every `step` px, kept MAX_SHIFT px inside the image. */
export function bandPixels(segments: readonly [Vec2, Vec2][], width: number, height: number, band = BAND_PX, step = 2): number[] {
  const out: number[] = [];
  for (const [a, b] of segments) {
    const x0 = Math.max(MAX_SHIFT, Math.floor(Math.min(a[0], b[0]) - band)), x1 = Math.min(width - 1 - MAX_SHIFT, Math.ceil(Math.max(a[0], b[0]) + band));
    const y0 = Math.max(MAX_SHIFT, Math.floor(Math.min(a[1], b[1]) - band)), y1 = Math.min(height - 1 - MAX_SHIFT, Math.ceil(Math.max(a[1], b[1]) + band));
    for (let y = y0; y <= y1; y += step) for (let x = x0; x <= x1; x += step) if (toSegment([x + 0.5, y + 0.5], a, b) <= band) out.push(y * width + x);
  }
  return [...new Set(out)];
}

/** Median of |a(p) − b(p + shift)| over the pixels, through a 256-bin histogram. */
function medianDifference(a: GreyImage, b: GreyImage, pixels: readonly number[], dx: number, dy: number): number {
  const bins = new Uint32Array(256);
  const offset = dy * b.width + dx;
  for (const i of pixels) bins[Math.abs(a.data[i]! - b.data[i + offset]!)]! += 1;
  let below = 0;
  for (let v = 0; v < 256; v++) {
    below += bins[v]!;
    if (below * 2 >= pixels.length) return v;
  }
  return 255;
}

/** The verdict for the earlier clip's first frame `a` and this clip's first frame `b`, around `segments` (image px). */
export function cameraStill(a: GreyImage, b: GreyImage, segments: readonly [Vec2, Vec2][]): StillVerdict {
  const none = (reason: string): StillVerdict => ({ still: false, shift: [0, 0], medianAtZero: NaN, bestMedian: NaN, samples: 0, reason });
  if (a.width !== b.width || a.height !== b.height) return none("the frames differ in size");
  const pixels = bandPixels(segments, a.width, a.height);
  if (pixels.length < 50) return none("too little of the frame around the marks to compare");
  const medianAtZero = medianDifference(a, b, pixels, 0, 0);
  let best = { median: medianAtZero, shift: [0, 0] as Vec2 };
  for (let dy = -MAX_SHIFT; dy <= MAX_SHIFT; dy++)
    for (let dx = -MAX_SHIFT; dx <= MAX_SHIFT; dx++) {
      const m = medianDifference(a, b, pixels, dx, dy);
      if (m < best.median) best = { median: m, shift: [dx, dy] };
    }
  const farShift = Math.max(Math.abs(best.shift[0]), Math.abs(best.shift[1])) > 1;
  const base = { shift: best.shift, medianAtZero, bestMedian: best.median, samples: pixels.length };
  if (medianAtZero > STILL_MEDIAN) return { ...base, still: false, reason: `the frames differ by ${medianAtZero} grey levels around the marks` };
  if (farShift && medianAtZero - best.median > SHIFT_GAIN) return { ...base, still: false, reason: `the picture lines up again ${best.shift[0]}, ${best.shift[1]} px away` };
  return { ...base, still: true, reason: `the frames agree within ${medianAtZero} grey levels around the marks` };
}

/** Luma of RGBA pixels (ITU-R BT.601 weights), as the tracker's grey images. */
export function greyFromRgba(rgba: Uint8ClampedArray | Uint8Array, width: number, height: number): GreyImage {
  const data = new Uint8Array(width * height);
  for (let i = 0; i < data.length; i++) data[i] = Math.round(0.299 * rgba[4 * i]! + 0.587 * rgba[4 * i + 1]! + 0.114 * rgba[4 * i + 2]!);
  return { data, width, height };
}

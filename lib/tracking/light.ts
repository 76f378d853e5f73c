/**
 * Light that changes over the picture (a cloud's or a person's shadow drifting across, flicker):
 * each region's brightness against the background is the ratio frame / background on its turf.
 * Per cell of a coarse grid the ratio's upper quantile is the turf's (a head or shaft, darker,
 * covers less than half of any cell); interpolated between cell centres, it is divided out so
 * that only what moved still differs from the background.
 */
import type { GreyImage, PixelBox } from "./image";

/**
 * Cells are `cellPx` wide: wider than a head is deep, so turf shows in every cell, and narrower
 * than a shadow's soft edge is long.
 */
/** the share of a cell's ratios below the turf's level */
const TURF_QUANTILE = 0.75;
/**
 * Gains that vary over the box by less than this are left alone: an even change (flicker) moves
 * every pixel alike and the head's threshold and the registration's offset absorb it; a shadow's
 * edge does not.
 */
const EVEN_LIGHT = 0.08;

/** The per-cell light gain over the box (frame ÷ background on turf); 1 where nothing changed. */
export function lightGain(frame: GreyImage, background: GreyImage, box: PixelBox, cellPx: number): { cols: number; rows: number; gain: Float32Array } {
  const cols = Math.max(1, Math.ceil((box.x1 - box.x0) / cellPx));
  const rows = Math.max(1, Math.ceil((box.y1 - box.y0) / cellPx));
  const gain = new Float32Array(cols * rows).fill(1);
  const ratios: number[] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < cols; c++) {
      ratios.length = 0;
      const x0 = box.x0 + c * cellPx, y0 = box.y0 + r * cellPx;
      for (let y = y0; y < Math.min(box.y1, y0 + cellPx); y += 2) {
        for (let x = x0; x < Math.min(box.x1, x0 + cellPx); x += 2) {
          const b = background.data[y * frame.width + x]!;
          if (b >= 8) ratios.push(frame.data[y * frame.width + x]! / b);
        }
      }
      if (ratios.length < 8) continue;
      ratios.sort((a, b) => a - b);
      gain[r * cols + c] = ratios[Math.floor(TURF_QUANTILE * (ratios.length - 1))]!;
    }
  }
  return { cols, rows, gain };
}

/** The frame with the box's light brought back to the background's; the frame itself when the light is even. */
export function relit(frame: GreyImage, background: GreyImage, box: PixelBox, cellPx: number): GreyImage {
  const { cols, rows, gain } = lightGain(frame, background, box, cellPx);
  let lo = Infinity, hi = -Infinity;
  for (const g of gain) { lo = Math.min(lo, g); hi = Math.max(hi, g); }
  if (hi - lo < EVEN_LIGHT) return frame;
  const at = (gx: number, gy: number) => {
    // Bilinear between cell centres, clamped at the outer cells.
    const u = Math.min(cols - 1, Math.max(0, gx)), v = Math.min(rows - 1, Math.max(0, gy));
    const i = Math.min(cols - 2, Math.floor(u)), j = Math.min(rows - 2, Math.floor(v));
    if (cols === 1 || rows === 1) return gain[Math.round(v) * cols + Math.round(u)]!;
    const fx = u - i, fy = v - j;
    const g = (a: number, b: number) => gain[b * cols + a]!;
    return (g(i, j) * (1 - fx) + g(i + 1, j) * fx) * (1 - fy) + (g(i, j + 1) * (1 - fx) + g(i + 1, j + 1) * fx) * fy;
  };
  const data = frame.data.slice();
  for (let y = box.y0; y < box.y1; y++) {
    const gy = (y + 0.5 - box.y0) / cellPx - 0.5;
    for (let x = box.x0; x < box.x1; x++) {
      const g = at((x + 0.5 - box.x0) / cellPx - 0.5, gy);
      if (g > 0.05) data[y * frame.width + x] = Math.min(255, Math.round(frame.data[y * frame.width + x]! / g));
    }
  }
  return { data, width: frame.width, height: frame.height };
}


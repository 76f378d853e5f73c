/**
 * Grey images as plain arrays, and the sampling the tracker's fits use. Coordinates are
 * continuous: pixel (i, j) covers [i, i+1) × [j, j+1), so its centre is at (i + 0.5, j + 0.5),
 * as for hand marks.
 */
export type GreyImage = { data: Uint8Array; width: number; height: number };

/** A rectangle of whole pixels: x0 ≤ x < x1, y0 ≤ y < y1. */
export type PixelBox = { x0: number; y0: number; x1: number; y1: number };

/** Bilinear value at a continuous point; NaN outside the pixel centres' hull. */
export function sampleBilinear(image: GreyImage, x: number, y: number): number {
  const u = x - 0.5, v = y - 0.5;
  const i = Math.floor(u), j = Math.floor(v);
  if (i < 0 || j < 0 || i + 1 >= image.width || j + 1 >= image.height) return NaN;
  const fx = u - i, fy = v - j;
  const row = j * image.width + i;
  const d = image.data;
  const top = d[row]! + (d[row + 1]! - d[row]!) * fx;
  const bottom = d[row + image.width]! + (d[row + image.width + 1]! - d[row + image.width]!) * fx;
  return top + (bottom - top) * fy;
}

/** The box around a centre, clipped to the image. */
export function boxAround(image: Pick<GreyImage, "width" | "height">, cx: number, cy: number, halfSize: number): PixelBox {
  return {
    x0: Math.max(0, Math.floor(cx - halfSize)),
    y0: Math.max(0, Math.floor(cy - halfSize)),
    x1: Math.min(image.width, Math.ceil(cx + halfSize)),
    y1: Math.min(image.height, Math.ceil(cy + halfSize)),
  };
}

/** A copy of the box's pixels, as an image of its own, with its offset. */
export function cropImage(image: GreyImage, box: PixelBox): GreyImage & { offsetX: number; offsetY: number } {
  const width = box.x1 - box.x0, height = box.y1 - box.y0;
  const data = new Uint8Array(width * height);
  for (let y = 0; y < height; y++) data.set(image.data.subarray((box.y0 + y) * image.width + box.x0, (box.y0 + y) * image.width + box.x1), y * width);
  return { data, width, height, offsetX: box.x0, offsetY: box.y0 };
}

export function median(values: number[]): number {
  if (values.length === 0) return NaN;
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

/** Robust standard deviation: 1.4826 × median absolute deviation (normal consistency). */
export function robustStd(values: number[]): number {
  const m = median(values);
  return 1.4826 * median(values.map((v) => Math.abs(v - m)));
}

/**
 * Per-pixel median of same-sized crops: the background of a region through which something moved,
 * as long as it covered each pixel in fewer than half of them.
 */
export function medianOfCrops(crops: readonly Uint8Array[], size: number): Uint8Array {
  const out = new Uint8Array(size);
  const values = new Uint8Array(crops.length);
  const counts = new Uint16Array(256);
  const half = crops.length >> 1;
  for (let i = 0; i < size; i++) {
    for (let c = 0; c < crops.length; c++) values[c] = crops[c]![i]!;
    // Counting sort over 256 levels: linear in the number of crops.
    counts.fill(0);
    for (let c = 0; c < crops.length; c++) counts[values[c]!]!++;
    let seen = 0, level = 0;
    while (seen + counts[level]! <= half) seen += counts[level++]!;
    out[i] = level;
  }
  return out;
}

/**
 * A copy of the image with the box (and a margin of 3σ around it) smoothed by a separable
 * Gaussian of `sigma` px. Sub-pixel registration reads values between pixels: on a sharp edge
 * bilinear interpolation is far from what a shifted picture would show; smoothed, it is close.
 */
export function blurredInBox(image: GreyImage, box: PixelBox, sigma: number): GreyImage {
  const reach = Math.ceil(3 * sigma);
  const kernel = Array.from({ length: 2 * reach + 1 }, (_, i) => Math.exp(-((i - reach) ** 2) / (2 * sigma * sigma)));
  const total = kernel.reduce((a, b) => a + b, 0);
  for (let i = 0; i < kernel.length; i++) kernel[i]! /= total;
  const { width, height } = image;
  const x0 = Math.max(0, box.x0 - reach), x1 = Math.min(width, box.x1 + reach);
  const y0 = Math.max(0, box.y0 - reach), y1 = Math.min(height, box.y1 + reach);
  const w = x1 - x0, h = y1 - y0;
  // Rows first (clamped at the picture's edge), then columns.
  const rows = new Float32Array(w * h);
  for (let y = 0; y < h; y++) {
    const line = (y0 + y) * width;
    for (let x = 0; x < w; x++) {
      let acc = 0;
      for (let k = -reach; k <= reach; k++) acc += kernel[k + reach]! * image.data[line + Math.min(width - 1, Math.max(0, x0 + x + k))]!;
      rows[y * w + x] = acc;
    }
  }
  const data = image.data.slice();
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      let acc = 0;
      for (let k = -reach; k <= reach; k++) acc += kernel[k + reach]! * rows[Math.min(h - 1, Math.max(0, y + k)) * w + x]!;
      data[(y0 + y) * width + x0 + x] = Math.round(acc);
    }
  }
  return { data, width, height };
}

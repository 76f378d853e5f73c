// Grey test scenes drawn in plain arithmetic: each shape anti-aliased by its signed distance
// (a pixel's cover = ½ − distance from its centre, clamped to [0, 1]), as the clip fixtures do.
import type { GreyImage } from "@/lib/tracking/image";
import { seededUniform } from "@/lib/stats/random";

export type Scene = { width: number; height: number; background: number; noise?: { seed: number; sd: number } };

export function blank(scene: Scene): GreyImage {
  const data = new Uint8Array(scene.width * scene.height).fill(scene.background);
  return { data, width: scene.width, height: scene.height };
}

/** Pixel values are blended as floats and rounded once, at the end. */
export class Canvas {
  readonly values: Float32Array;
  constructor(readonly width: number, readonly height: number, background: number) {
    this.values = new Float32Array(width * height).fill(background);
  }

  private paint(box: [number, number, number, number], level: number, signedDistance: (x: number, y: number) => number) {
    const [x0, y0, x1, y1] = [Math.max(0, Math.floor(box[0])), Math.max(0, Math.floor(box[1])), Math.min(this.width - 1, Math.ceil(box[2])), Math.min(this.height - 1, Math.ceil(box[3]))];
    for (let y = y0; y <= y1; y++) {
      for (let x = x0; x <= x1; x++) {
        const cover = Math.min(1, Math.max(0, 0.5 - signedDistance(x + 0.5, y + 0.5)));
        if (cover > 0) this.values[y * this.width + x] = this.values[y * this.width + x]! + (level - this.values[y * this.width + x]!) * cover;
      }
    }
  }

  disc(cx: number, cy: number, r: number, level: number): this {
    this.paint([cx - r - 1, cy - r - 1, cx + r + 1, cy + r + 1], level, (x, y) => Math.hypot(x - cx, y - cy) - r);
    return this;
  }

  /** A rectangle centred at (cx, cy), `length` along the unit direction u, `depth` across it. */
  box(cx: number, cy: number, u: [number, number], length: number, depth: number, level: number): this {
    const reach = length / 2 + depth / 2 + 2;
    this.paint([cx - reach, cy - reach, cx + reach, cy + reach], level, (x, y) => {
      const dx = x - cx, dy = y - cy;
      return Math.max(Math.abs(dx * u[0] + dy * u[1]) - length / 2, Math.abs(-dx * u[1] + dy * u[0]) - depth / 2);
    });
    return this;
  }

  /** A thick segment from a to b. */
  segment(a: [number, number], b: [number, number], width: number, level: number): this {
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const u: [number, number] = [(b[0] - a[0]) / len, (b[1] - a[1]) / len];
    return this.box((a[0] + b[0]) / 2, (a[1] + b[1]) / 2, u, len, width, level);
  }

  /** Adds seeded Gaussian noise (Box–Muller on mulberry32) and rounds to bytes. */
  toImage(noise?: { seed: number; sd: number }): GreyImage {
    const next = noise ? random(noise.seed) : null;
    const data = new Uint8Array(this.values.length);
    for (let i = 0; i < data.length; i++) {
      let v = this.values[i]!;
      if (next) v += noise!.sd * Math.sqrt(-2 * Math.log(1 - next())) * Math.cos(2 * Math.PI * next());
      data[i] = Math.max(0, Math.min(255, Math.round(v)));
    }
    return { data, width: this.width, height: this.height };
  }
}

/** Deterministic pseudo-random numbers in [0, 1). */
export const random = seededUniform;

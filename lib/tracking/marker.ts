/**
 * The marker on the ball: a small spot darker than the ball (a coloured dot is darker in grey
 * too), inside 0.8 of the ball's radius. Its centre is the darkness-weighted centroid; the
 * precision follows from the pixel noise by error propagation of the weighted mean,
 * σx = σ·√Σ(x − x̄)² / Σw, with a floor of 0.1 px: on a turning sphere the spot is foreshortened
 * unevenly, and its darkness-weighted centroid strays from its centre by about that much.
 */
import type { Vec2 } from "@/lib/geometry/vector";
import type { BallFit } from "./ball";
import type { GreyImage } from "./image";

const MARKER_FLOOR_PX = 0.1;

export type MarkerFit = { point: Vec2; precisionPx: number; pixels: number };

export function findMarker(image: GreyImage, ball: Pick<BallFit, "x" | "y" | "r" | "inside" | "background">, noise: number): MarkerFit | null {
  const reach = ball.r * 0.8;
  const spread = ball.inside - ball.background;
  if (!(spread > 0)) return null;
  const core = Math.max(4 * noise, 0.3 * spread);
  const floor = 2 * noise;
  let corePixels = 0, area = 0;
  const cells: { x: number; y: number; w: number }[] = [];
  for (let y = Math.max(0, Math.floor(ball.y - reach)); y < Math.min(image.height, Math.ceil(ball.y + reach)); y++) {
    for (let x = Math.max(0, Math.floor(ball.x - reach)); x < Math.min(image.width, Math.ceil(ball.x + reach)); x++) {
      if (Math.hypot(x + 0.5 - ball.x, y + 0.5 - ball.y) > reach) continue;
      area++;
      const dark = ball.inside - image.data[y * image.width + x]!;
      if (dark > core) corePixels++;
      if (dark > floor) cells.push({ x: x + 0.5, y: y + 0.5, w: dark - floor });
    }
  }
  if (corePixels < 3 || corePixels > 0.25 * area) return null;
  // Only the spot and its anti-aliased rim: cells near the core's own centroid.
  const coreCells = cells.filter((c) => c.w + floor > core);
  const kx = coreCells.reduce((a, c) => a + c.x, 0) / coreCells.length, ky = coreCells.reduce((a, c) => a + c.y, 0) / coreCells.length;
  const keep = Math.sqrt(corePixels / Math.PI) + 2;
  const spot = cells.filter((c) => Math.hypot(c.x - kx, c.y - ky) <= keep);
  let w = 0, wx = 0, wy = 0;
  for (const c of spot) { w += c.w; wx += c.w * c.x; wy += c.w * c.y; }
  const mx = wx / w, my = wy / w;
  let sx = 0, sy = 0;
  for (const c of spot) { sx += (c.x - mx) ** 2; sy += (c.y - my) ** 2; }
  const precisionPx = Math.hypot((noise * Math.sqrt(Math.max(sx, sy))) / w, MARKER_FLOOR_PX);
  return { point: [mx, my], precisionPx, pixels: corePixels };
}

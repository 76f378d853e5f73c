/**
 * The ball as a disc of its own brightness: edge points where the brightness crosses half way
 * between the ball and its surroundings along rays from a guessed centre (sub-pixel by linear
 * interpolation of bilinear samples), then Kåsa's circle fit. Searching each ray from the
 * outside in ignores a marker dot inside the ball; rays whose outer end is not plain
 * background (the head touching the ball, a shadow) are left out.
 */
import type { Vec2 } from "@/lib/geometry/vector";
import { fitCircleClipped } from "./fits";
import { median, sampleBilinear, type GreyImage } from "./image";

export type BallGuess = { x: number; y: number; r: number };
export type BallFit = { x: number; y: number; r: number; precisionPx: number; residualPx: number; rays: number; inside: number; background: number };

const RAYS = 72;
const STEP_PX = 0.25;
/** below this difference between ball and background (grey levels) there is no ball to fit */
export const MIN_BALL_CONTRAST = 25;

function ringLevel(image: GreyImage, c: BallGuess, from: number, to: number): number {
  const values: number[] = [];
  for (let k = 0; k < 48; k++) {
    const a = (2 * Math.PI * k) / 48;
    for (let s = from; s <= to; s += Math.max(0.5, (to - from) / 4)) {
      const v = sampleBilinear(image, c.x + Math.cos(a) * s, c.y + Math.sin(a) * s);
      if (!Number.isNaN(v)) values.push(v);
    }
  }
  return median(values);
}

/** Edge points of the disc around `guess` (which must lie inside the ball). */
export function ballEdgePoints(image: GreyImage, guess: BallGuess): { points: Vec2[]; inside: number; background: number } | null {
  const inside = ringLevel(image, guess, 0, guess.r * 0.5);
  const background = ringLevel(image, guess, guess.r * 1.7, guess.r * 2.1);
  if (!(Math.abs(inside - background) >= MIN_BALL_CONTRAST)) return null;
  const contrast = inside - background;
  const level = (v: number) => (v - background) / contrast; // 0 background, 1 ball
  const points: Vec2[] = [];
  const outer = guess.r * 1.6, inner = guess.r * 0.3;
  for (let k = 0; k < RAYS; k++) {
    const a = (2 * Math.PI * k) / RAYS;
    const dx = Math.cos(a), dy = Math.sin(a);
    let prev = level(sampleBilinear(image, guess.x + dx * outer, guess.y + dy * outer));
    // The ray must start on plain background: not the head, not another bright thing.
    if (!(Math.abs(prev) < 0.3)) continue;
    for (let s = outer - STEP_PX; s >= inner; s -= STEP_PX) {
      const cur = level(sampleBilinear(image, guess.x + dx * s, guess.y + dy * s));
      if (Number.isNaN(cur)) break;
      if (cur >= 0.5) {
        const at = s + STEP_PX * ((cur - 0.5) / (cur - prev));
        points.push([guess.x + dx * at, guess.y + dy * at]);
        break;
      }
      prev = cur;
    }
  }
  return { points, inside, background };
}

/**
 * Sub-pixel ball from a guess: two rounds (the second casts its rays from the first fit's centre).
 * Null when fewer than half the rays found an edge or the fit is not a ball-sized circle.
 */
export function fitBall(image: GreyImage, guess: BallGuess): BallFit | null {
  let current = guess;
  let result: BallFit | null = null;
  for (let round = 0; round < 2; round++) {
    const edges = ballEdgePoints(image, current);
    if (!edges || edges.points.length < RAYS / 2) return null;
    const fit = fitCircleClipped(edges.points);
    if (!fit || !(fit.r > guess.r * 0.6 && fit.r < guess.r * 1.5)) return null;
    if (Math.hypot(fit.cx - current.x, fit.cy - current.y) > current.r) return null;
    // Precision: the fit's own standard error, plus 0.02 px for the edge interpolation's bias
    // on a sampled profile (measured on rendered discs, tests/unit/tracking).
    result = {
      x: fit.cx, y: fit.cy, r: fit.r, precisionPx: Math.hypot(fit.centreStdErr, 0.02), residualPx: fit.residualStd,
      rays: fit.n, inside: edges.inside, background: edges.background,
    };
    current = { x: fit.cx, y: fit.cy, r: fit.r };
  }
  return result;
}

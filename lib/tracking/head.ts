/**
 * The clubhead and shaft against a background frame in which they are absent near the ball.
 * `sign` says which way the head differs (+1: darker than the background). Per pixel the head's
 * coverage is its difference from the background over the head's full contrast; the leading
 * edge is where coverage crosses ½ along lines in the direction of travel (sub-pixel, bilinear),
 * and a total-least-squares line through those points is the face (overhead) or the front of the
 * head (other views). The head's one consistent point is that line's point at the middle of the
 * head's body across the travel direction.
 */
import type { Vec2 } from "@/lib/geometry/vector";
import { fitLineClipped, lineStdErrAt, pointOnLine, type LineFit } from "./fits";
import { median, sampleBilinear, type GreyImage, type PixelBox } from "./image";
import type { Sampler, Template } from "./register";

export type HeadSearch = {
  box: PixelBox;
  /** unit direction of travel: the leading edge faces this way */
  towards: Vec2;
  sign: 1 | -1;
  /** a pixel belongs to the head when it differs from the background by more than this */
  threshold: number;
  /** the pixel noise (grey levels, one s.d.) for the precision of centroids */
  noise: number;
  /** a disc left out (the ball): its pixels are not head, and edge points near it are not used */
  exclude?: { x: number; y: number; r: number };
};

export type HeadEdge = {
  edge: LineFit;
  /** the middle of the leading edge */
  point: Vec2;
  pointPrecisionPx: number;
  /** the edge line between the body's ends (across the travel direction) */
  ends: [Vec2, Vec2];
  linePrecisionPx: number;
  centroid: Vec2;
  pixels: number;
  contrast: number;
  /** the head's own grey level */
  headLevel: number;
  /** body extent across the travel direction, from the centroid (px) */
  body: [number, number];
  /** the body's extent along the travel direction, from the centroid (px) */
  reach: [number, number];
};

type MaskPixel = { x: number; y: number; d: number };

function headMask(frame: GreyImage, background: GreyImage, search: HeadSearch): MaskPixel[] {
  const { box, sign, threshold, exclude } = search;
  const out: MaskPixel[] = [];
  const w = frame.width;
  for (let y = box.y0; y < box.y1; y++) {
    for (let x = box.x0; x < box.x1; x++) {
      const d = sign * (background.data[y * w + x]! - frame.data[y * w + x]!);
      if (d <= threshold) continue;
      if (exclude && Math.hypot(x + 0.5 - exclude.x, y + 0.5 - exclude.y) < exclude.r) continue;
      out.push({ x: x + 0.5, y: y + 0.5, d });
    }
  }
  return out;
}

function percentile(values: number[], q: number): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))]!;
}

/** Bins of 1 px across the travel direction; the body is the heaviest run of well-filled bins. */
function bodyRun(across: number[]): [number, number] | null {
  const lo = Math.floor(Math.min(...across));
  const counts = new Map<number, number>();
  for (const s of across) counts.set(Math.floor(s) - lo, (counts.get(Math.floor(s) - lo) ?? 0) + 1);
  const max = Math.max(...counts.values());
  let best: [number, number] | null = null, bestSum = 0;
  let start = -1, sum = 0;
  const top = Math.max(...counts.keys());
  for (let b = 0; b <= top + 1; b++) {
    const c = counts.get(b) ?? 0;
    if (c >= 0.4 * max) {
      if (start < 0) { start = b; sum = 0; }
      sum += c;
    } else if (start >= 0) {
      if (sum > bestSum) { bestSum = sum; best = [start + lo, b - 1 + lo]; }
      start = -1;
    }
  }
  return best;
}

export const MIN_HEAD_PIXELS = 40;
/**
 * Edge points 1 px apart are read from bilinear samples 2 px wide (and from a picture the codec's
 * deblocking has smoothed): neighbours share their noise, so a line fit has about half as many
 * independent points as it has points, and its standard error is √2 times the textbook one.
 */
const EDGE_CORRELATION = Math.SQRT2;
/** edge points this close to the excluded disc (the ball) are left out of the edge fit, px */
const EDGE_CLEARANCE_PX = 4;

/** Depths inside the leading edge (px) at which the head's two ends are looked for. */
const END_DEPTHS = [1, 1.5, 2, 2.5, 3];

/**
 * The head's two ends along its leading edge. `profile(t, depth)`: coverage at position t along the
 * edge, `depth` px behind it; [tA, tB] is the rough extent. Per depth, each end is where the
 * coverage crosses ½ marching inward from 6 px outside; the middle is their mean over depths, its
 * standard error from their scatter (at least a pixel's 1/√12 over the number of depths).
 */
function headEnds(profile: (t: number, depth: number) => number, tA: number, tB: number): { middle: number; stdErr: number } | null {
  const lo = Math.min(tA, tB), hi = Math.max(tA, tB);
  const crossing = (from: number, to: number, depth: number): number | null => {
    const step = from < to ? 0.25 : -0.25;
    let prev = profile(from, depth);
    if (!(prev < 0.5)) return null;
    for (let t = from + step; step > 0 ? t <= to : t >= to; t += step) {
      const c = profile(t, depth);
      if (Number.isNaN(c)) return null;
      if (c >= 0.5) return t - step * ((c - 0.5) / (c - prev));
      prev = c;
    }
    return null;
  };
  const middles: number[] = [];
  for (const depth of END_DEPTHS) {
    const a = crossing(lo - 6, (lo + hi) / 2, depth), b = crossing(hi + 6, (lo + hi) / 2, depth);
    if (a !== null && b !== null && b - a > 0.5 * (hi - lo)) middles.push((a + b) / 2);
  }
  if (middles.length < 3) return null;
  const middle = middles.reduce((x, v) => x + v, 0) / middles.length;
  const sd = Math.sqrt(middles.reduce((x, v) => x + (v - middle) ** 2, 0) / (middles.length - 1));
  return { middle, stdErr: Math.max(sd, 1 / Math.sqrt(12)) / Math.sqrt(middles.length) };
}

/**
 * The edge at the half level between this line's own outside (2 px out) and inside (2.5 px in):
 * the background's texture makes the head's contrast differ from place to place, and a global
 * level would put the crossing too deep or too shallow.
 */
function refineEdge(profile: (a: number) => number, rough: number): number {
  const outside = profile(rough + 2), inside = profile(rough - 2.5);
  if (!(inside - outside > 0.2)) return rough;
  const half = (inside + outside) / 2;
  let prev = profile(rough + 1.5);
  for (let a = rough + 1.25; a >= rough - 1.5; a -= 0.25) {
    const c = profile(a);
    if (c >= half && prev < half) return a + 0.25 * ((c - half) / (c - prev));
    prev = c;
  }
  return rough;
}

export function findHeadEdge(frame: GreyImage, background: GreyImage, search: HeadSearch): HeadEdge | null {
  const mask = headMask(frame, background, search);
  if (mask.length < MIN_HEAD_PIXELS) return null;
  const contrast = percentile(mask.map((m) => m.d), 0.9);
  let cx = 0, cy = 0;
  for (const m of mask) { cx += m.x; cy += m.y; }
  const centroid: Vec2 = [cx / mask.length, cy / mask.length];
  const d = search.towards;
  const p: Vec2 = [-d[1], d[0]];
  const along = (x: number, y: number) => (x - centroid[0]) * d[0] + (y - centroid[1]) * d[1];
  const across = (x: number, y: number) => (x - centroid[0]) * p[0] + (y - centroid[1]) * p[1];
  const run = bodyRun(mask.map((m) => across(m.x, m.y)));
  if (!run || run[1] - run[0] < 4) return null;
  const [b0, b1] = run;
  // Coverage-weighted middle of the body across the travel direction, and its standard error.
  let sw = 0, sws = 0;
  const body: { s: number; c: number }[] = [];
  const frontByBin = new Map<number, number>();
  let alongMin = Infinity, alongMax = -Infinity;
  for (const m of mask) {
    const s = across(m.x, m.y);
    const bin = Math.floor(s);
    if (bin < b0 || bin > b1) continue;
    const c = Math.min(1, m.d / contrast);
    body.push({ s, c });
    sw += c; sws += c * s;
    const a = along(m.x, m.y);
    frontByBin.set(bin, Math.max(frontByBin.get(bin) ?? -Infinity, a));
    alongMin = Math.min(alongMin, a);
    alongMax = Math.max(alongMax, a);
  }
  const sMid = sws / sw;
  const sigmaC = search.noise / contrast;
  // Pixel noise through the weighted mean, and the body's two thresholded ends: each is uncertain
  // by a pixel's 1/√12 (uniform), the middle by half their root-sum-square.
  const sMidErr = Math.hypot((sigmaC * Math.sqrt(body.reduce((acc, b) => acc + (b.s - sMid) ** 2, 0))) / sw, Math.SQRT1_2 / Math.sqrt(12));

  const headLevel = median(mask.filter((m) => m.d >= 0.8 * contrast).map((m) => frame.data[Math.floor(m.y) * frame.width + Math.floor(m.x)]!));
  const coverage = coverageSampler(frame, background, search, headLevel, contrast);
  const trim = Math.max(1, Math.round((b1 - b0) * 0.12));
  const edgePoints: Vec2[] = [];
  for (let bin = b0 + trim; bin <= b1 - trim; bin++) {
    const front = frontByBin.get(bin);
    if (front === undefined) continue;
    const s = bin + 0.5;
    const at = (a: number): Vec2 => [centroid[0] + d[0] * a + p[0] * s, centroid[1] + d[1] * a + p[1] * s];
    let prevA = front + 2;
    let prev = coverage(...at(prevA));
    if (!(prev < 0.5)) continue;
    for (let a = prevA - 0.25; a >= front - 6; a -= 0.25) {
      const c = coverage(...at(a));
      if (Number.isNaN(c)) break;
      if (c >= 0.5) {
        const rough = a + 0.25 * ((c - 0.5) / (c - prev));
        edgePoints.push(at(refineEdge((t) => coverage(...at(t)), rough)));
        break;
      }
      prev = c; prevA = a;
    }
  }
  // Where the head touches the ball its rim blends into the ball's, not the turf's: those points
  // lean forward. Left out while most of the edge stays (overhead); a face-on face is all beside it.
  const ex = search.exclude;
  const clear = ex ? edgePoints.filter(([x, y]) => Math.hypot(x - ex.x, y - ex.y) >= ex.r + EDGE_CLEARANCE_PX) : edgePoints;
  const usable = clear.length >= 0.6 * edgePoints.length ? clear : edgePoints;
  if (usable.length < 5) return null;
  const edge = fitLineClipped(usable, 3, 3, 0.3);
  if (!edge) return null;
  const dirAcross = edge.direction[0] * p[0] + edge.direction[1] * p[1];
  // The leading edge runs across the travel direction; otherwise this is not a head's front.
  if (Math.abs(dirAcross) < 0.7) return null;
  const tAt = (s: number) => (s - across(...edge.centre)) / dirAcross;
  // The middle of the leading edge: half way between the head's two ends (heel and toe overhead,
  // sole and top line face-on), each found sub-pixel where the coverage crosses ½ along lines
  // parallel to the edge just inside the head. Those ends move with the head whatever its turn;
  // the middle of the thresholded body is the fallback.
  const headEndsFound = headEnds((t, depth) => coverage(edge.centre[0] + edge.direction[0] * t - d[0] * depth, edge.centre[1] + edge.direction[1] * t - d[1] * depth), tAt(b0), tAt(b1 + 1));
  let tMid: number, sMidSpread: number;
  if (headEndsFound) {
    tMid = headEndsFound.middle;
    sMidSpread = headEndsFound.stdErr;
  } else {
    let tw = 0, twt = 0;
    for (const m of mask) {
      const bin = Math.floor(across(m.x, m.y));
      if (bin < b0 || bin > b1) continue;
      const c = Math.min(1, m.d / contrast);
      tw += c;
      twt += c * ((m.x - edge.centre[0]) * edge.direction[0] + (m.y - edge.centre[1]) * edge.direction[1]);
    }
    tMid = twt / tw;
    sMidSpread = sMidErr;
  }
  const point = pointOnLine(edge, tMid);
  const tEnds = [tAt(b0 + trim), tAt(b1 - trim + 1)] as const;
  const ends: [Vec2, Vec2] = [pointOnLine(edge, tEnds[0]), pointOnLine(edge, tEnds[1])];
  // Floors: the sub-pixel edge interpolation's own bias on a sampled profile (0.05 px).
  const pointPrecisionPx = Math.hypot(EDGE_CORRELATION * lineStdErrAt(edge, tMid), sMidSpread, 0.05);
  const linePrecisionPx = Math.hypot(EDGE_CORRELATION * Math.max(lineStdErrAt(edge, tEnds[0]), lineStdErrAt(edge, tEnds[1])), 0.05);
  return {
    edge, point, pointPrecisionPx, ends, linePrecisionPx, centroid, pixels: mask.length, contrast, headLevel, body: [b0, b1 + 1], reach: [alongMin, alongMax],
  };
}

/**
 * Coverage by the head at any position: frame = c·head + (1 − c)·turf, so c = (turf − frame) /
 * (turf − head) against the background's own level there; the turf's grain then no longer moves
 * an edge. Where turf and head are too alike to tell, the head's overall contrast stands in.
 */
export function coverageSampler(frame: GreyImage, background: GreyImage, search: Pick<HeadSearch, "sign" | "threshold">, headLevel: number, contrast: number): Sampler {
  return (x, y) => {
    const turf = sampleBilinear(background, x, y);
    const span = search.sign * (turf - headLevel);
    return (search.sign * (turf - sampleBilinear(frame, x, y))) / (span > search.threshold ? span : contrast);
  };
}

/** Margin around the head's body for its registration patch, px. */
const PATCH_MARGIN_PX = 3;

/**
 * The head's patch for registration (lib/tracking/register): pixel centres over its body and a
 * margin, in the travel frame of `search`, with their coverage on this frame. The ball's disc is
 * left out (its rim blends with the head's when they touch); across the travel direction the patch
 * keeps to the body and a margin, so the shaft, which swings on its own, barely enters.
 */
export function headTemplate(frame: GreyImage, background: GreyImage, search: HeadSearch, head: HeadEdge): Template {
  const d = search.towards;
  const p: Vec2 = [-d[1], d[0]];
  const [c0, c1] = head.centroid;
  const coverage = coverageSampler(frame, background, search, head.headLevel, head.contrast);
  const [a0, a1] = [head.reach[0] - PATCH_MARGIN_PX, head.reach[1] + PATCH_MARGIN_PX];
  const [s0, s1] = [head.body[0] - PATCH_MARGIN_PX, head.body[1] + PATCH_MARGIN_PX];
  const corners = [[a0, s0], [a0, s1], [a1, s0], [a1, s1]].map(([a, s]) => [c0 + d[0] * a! + p[0] * s!, c1 + d[1] * a! + p[1] * s!]);
  const xs = corners.map((c) => c[0]!), ys = corners.map((c) => c[1]!);
  const points: Vec2[] = [];
  const values: number[] = [];
  const ex = search.exclude;
  for (let y = Math.max(1, Math.floor(Math.min(...ys))); y <= Math.min(frame.height - 2, Math.ceil(Math.max(...ys))); y++) {
    for (let x = Math.max(1, Math.floor(Math.min(...xs))); x <= Math.min(frame.width - 2, Math.ceil(Math.max(...xs))); x++) {
      const px = x + 0.5, py = y + 0.5;
      const a = (px - c0) * d[0] + (py - c1) * d[1], s = (px - c0) * p[0] + (py - c1) * p[1];
      if (a < a0 || a > a1 || s < s0 || s > s1) continue;
      if (ex && Math.hypot(px - ex.x, py - ex.y) < ex.r + 1) continue;
      points.push([px, py]);
      values.push(coverage(px, py));
    }
  }
  return { points, values };
}

export type ShaftLine = { ends: [Vec2, Vec2]; precisionPx: number; line: LineFit };

/**
 * The shaft rising from the head: head-coloured pixels beyond the head's body across the travel
 * direction (on the side where there are more of them). Per 1-px level across, the shaft's
 * centre is the coverage-weighted mean position along the travel direction; a clipped
 * total-least-squares line through those centres is the shaft.
 */
export function findShaftLine(frame: GreyImage, background: GreyImage, search: HeadSearch, head: HeadEdge): ShaftLine | null {
  const mask = headMask(frame, background, search);
  const d = search.towards;
  const p: Vec2 = [-d[1], d[0]];
  const [c0, c1] = head.centroid;
  const rel = mask.map((m) => ({ a: (m.x - c0) * d[0] + (m.y - c1) * d[1], s: (m.x - c0) * p[0] + (m.y - c1) * p[1], c: Math.min(1, m.d / head.contrast) }));
  const beyondHigh = rel.filter((r) => r.s > head.body[1] + 1);
  const beyondLow = rel.filter((r) => r.s < head.body[0] - 1);
  const side = beyondHigh.length >= beyondLow.length ? beyondHigh : beyondLow;
  if (side.length < 20) return null;
  const levels = new Map<number, { w: number; wa: number }>();
  for (const r of side) {
    const level = Math.floor(r.s);
    const acc = levels.get(level) ?? { w: 0, wa: 0 };
    acc.w += r.c; acc.wa += r.c * r.a;
    levels.set(level, acc);
  }
  const centres: Vec2[] = [];
  for (const [level, acc] of levels) {
    if (acc.w < 0.5) continue;
    const a = acc.wa / acc.w, s = level + 0.5;
    centres.push([c0 + d[0] * a + p[0] * s, c1 + d[1] * a + p[1] * s]);
  }
  if (centres.length < 8) return null;
  const line = fitLineClipped(centres, 2.5, 4, 0.5);
  if (!line || line.n < 8) return null;
  // The kept centres' extent along the line gives the two ends.
  const ts = centres.map(([x, y]) => (x - line.centre[0]) * line.direction[0] + (y - line.centre[1]) * line.direction[1]);
  const tMin = Math.min(...ts), tMax = Math.max(...ts);
  const precisionPx = Math.hypot(EDGE_CORRELATION * Math.max(lineStdErrAt(line, tMin), lineStdErrAt(line, tMax)), 0.05);
  return { ends: [pointOnLine(line, tMin), pointOnLine(line, tMax)], precisionPx, line };
}

/** Centroid of the pixels that differ from the background like the head does; null when too few. */
export function changedCentroid(frame: GreyImage, background: GreyImage, search: Omit<HeadSearch, "towards" | "noise">): Vec2 | null {
  const mask = headMask(frame, background, { ...search, towards: [1, 0], noise: 0 });
  if (mask.length < MIN_HEAD_PIXELS) return null;
  let x = 0, y = 0;
  for (const m of mask) { x += m.x; y += m.y; }
  return [x / mask.length, y / mask.length];
}

/** Which way the head differs from the background in the box: +1 darker, −1 lighter. */
export function headSign(frame: GreyImage, background: GreyImage, box: PixelBox, threshold: number): 1 | -1 {
  let sum = 0;
  for (let y = box.y0; y < box.y1; y++) {
    for (let x = box.x0; x < box.x1; x++) {
      const d = background.data[y * frame.width + x]! - frame.data[y * frame.width + x]!;
      if (Math.abs(d) > threshold) sum += d;
    }
  }
  return sum >= 0 ? 1 : -1;
}

/**
 * The clubhead point over the last frames before impact. Each frame's leading-edge middle
 * (lib/tracking/head) is good to a few tenths of a pixel, but path and attack angle are the
 * direction of only the last few points, a few pixels apart: their relative positions must be far
 * finer. So the head's patch on one frame (the anchor, the frame before impact) is registered on
 * every other frame (lib/tracking/register): the shifts place the head relative to the anchor to
 * a few hundredths of a pixel. The one common position is the mean over frames of (edge middle −
 * shift), so it too averages the edge's error down.
 */
import type { Vec2 } from "@/lib/geometry/vector";
import { coverageSampler, headTemplate, type HeadEdge, type HeadSearch } from "./head";
import { blurredInBox, type GreyImage, type PixelBox } from "./image";
import { movedPoint, registerPatch, type Registration, type Template } from "./register";

export type HeadOnFrame = { frame: number; image: GreyImage; head: HeadEdge };
export type ClubheadPoint = { frame: number; point: Vec2; precisionPx: number; registered: boolean };

/** Smoothing before registration (px, one s.d.): enough that values between pixels read true. */
const REGISTRATION_BLUR_PX = 1;

/** The pixels the head covers on the frames, with room for the patch's margin and the blur. */
function regionOf(heads: readonly HeadOnFrame[]): PixelBox {
  const xs: number[] = [], ys: number[] = [];
  for (const { head } of heads) {
    const reach = Math.max(head.body[1] - head.body[0], head.reach[1] - head.reach[0]) + 8;
    xs.push(head.centroid[0] - reach, head.centroid[0] + reach);
    ys.push(head.centroid[1] - reach, head.centroid[1] + reach);
  }
  const { width, height } = heads[0]!.image;
  return {
    x0: Math.max(0, Math.floor(Math.min(...xs))), x1: Math.min(width, Math.ceil(Math.max(...xs))),
    y0: Math.max(0, Math.floor(Math.min(...ys))), y1: Math.min(height, Math.ceil(Math.max(...ys))),
  };
}

/** Distance kept from the ball's rim (px): the blur's reach and a pixel. */
const BALL_CLEARANCE_PX = 3 * REGISTRATION_BLUR_PX + 1;

/** The registration's floor: bilinear interpolation's own bias on a sampled edge (px). */
const REGISTRATION_FLOOR_PX = 0.02;

export function clubheadTrack(heads: readonly HeadOnFrame[], background: GreyImage, search: HeadSearch): ClubheadPoint[] {
  const asFound = (h: HeadOnFrame): ClubheadPoint => ({ frame: h.frame, point: h.head.point, precisionPx: h.head.pointPrecisionPx, registered: false });
  if (heads.length < 2) return heads.map(asFound);
  const anchor = heads[heads.length - 2]!;
  // The patch and the pictures it is read on, smoothed over the region the head crosses.
  const region = regionOf(heads);
  const smooth = (image: GreyImage) => blurredInBox(image, region, REGISTRATION_BLUR_PX);
  const turf = smooth(background);
  const anchorImage = smooth(anchor.image);
  const template = headTemplate(anchorImage, turf, search, anchor.head);
  const templateSample = coverageSampler(anchorImage, turf, search, anchor.head.headLevel, anchor.head.contrast);
  const motions = heads.map((h) => {
    if (h === anchor) return { h, motion: null };
    const sample = coverageSampler(smooth(h.image), turf, search, anchor.head.headLevel, anchor.head.contrast);
    const start: Vec2 = [h.head.point[0] - anchor.head.point[0], h.head.point[1] - anchor.head.point[1]];
    // Pixels near the ball, here or on the anchor, are left out: where the head's blurred rim meets
    // the ball's, the picture is no longer head over turf and the coverage reads wrong.
    const ball = search.exclude;
    const clear = ball ? keepPoints(template, (p) => Math.hypot(p[0] + start[0] - ball.x, p[1] + start[1] - ball.y) >= ball.r + BALL_CLEARANCE_PX && Math.hypot(p[0] - ball.x, p[1] - ball.y) >= ball.r + BALL_CLEARANCE_PX) : template;
    const motion = registerPatch(clear, templateSample, sample, start, 4 * Math.PI * REGISTRATION_BLUR_PX ** 2);
    // A registration far from the edge's own estimate has locked onto something else.
    if (!motion || Math.hypot(motion.shift[0] - start[0], motion.shift[1] - start[1]) > 2) return null;
    return { h, motion };
  });
  const others = motions.flatMap((m) => (m?.motion ? [{ h: m.h, motion: m.motion }] : []));
  if (others.length < 1) return heads.map(asFound);
  // Trusted only when the patch matches as a rigid head should: the residual near the pixel noise
  // (a head longer than its backswing leaves itself in the background, and the patch is then
  // meaningless), and the motions agreeing with the edge's own estimates within their precision.
  const median = (values: number[]) => values.sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
  const noiseLimit = (3 * Math.SQRT2 * search.noise) / anchor.head.contrast + 0.05;
  if (median(others.map((o) => o.motion.residual)) > noiseLimit) return heads.map(asFound);
  const moved = (o: { motion: Registration }, p: Vec2) => movedPoint(o.motion, p);
  const disagreement = Math.sqrt(
    others.reduce((acc, o) => acc + Math.hypot(...sub(moved(o, anchor.head.point), o.h.head.point)) ** 2, 0) / others.length,
  );
  const edgePrecision = Math.sqrt(others.reduce((acc, o) => acc + o.h.head.pointPrecisionPx ** 2 + anchor.head.pointPrecisionPx ** 2, 0) / others.length);
  if (disagreement > 3 * edgePrecision) return heads.map(asFound);
  // The anchor's point, from every frame's edge middle carried back by that frame's motion.
  const back = others.map((o) => {
    const r = o.motion;
    const [dx, dy] = sub(sub(o.h.head.point, r.centre), r.shift);
    const c = Math.cos(-r.turnRad), s = Math.sin(-r.turnRad);
    return [r.centre[0] + c * dx - s * dy, r.centre[1] + s * dx + c * dy] as Vec2;
  });
  back.push(anchor.head.point);
  const point: Vec2 = [back.reduce((a, p) => a + p[0], 0) / back.length, back.reduce((a, p) => a + p[1], 0) / back.length];
  const precisionOf = (r: Registration) => Math.hypot(r.precisionPx, r.turnPrecisionRad * Math.hypot(...sub(point, r.centre)));
  // The anchor's own motion is nil by definition; it carries the others' typical precision.
  const anchorPrecision = median(others.map((o) => precisionOf(o.motion)));
  return heads.map((h, i) => {
    if (h === anchor) return { frame: h.frame, point, precisionPx: Math.hypot(anchorPrecision, REGISTRATION_FLOOR_PX), registered: true };
    const m = motions[i];
    if (!m?.motion) return asFound(h);
    return { frame: h.frame, point: movedPoint(m.motion, point), precisionPx: Math.hypot(precisionOf(m.motion), REGISTRATION_FLOOR_PX), registered: true };
  });
}

/**
 * Whether the head's last points travel within `maxDeg` of the direction the ball left in. A
 * putter's path and the ball's start differ by a few degrees (the face, not the path, sends the
 * ball); a track far off that is the tracker following something else (a shadow's edge, a foot).
 */
export function trackFollowsLaunch(points: readonly ClubheadPoint[], launch: Vec2, maxDeg: number, lastN = 4): boolean {
  const last = [...points].sort((a, b) => a.frame - b.frame).slice(-lastN);
  const limit = Math.cos((maxDeg * Math.PI) / 180);
  // Each step, not only the whole: one point off the track bends the fitted line as much.
  for (let i = 1; i < last.length; i++) {
    const d = sub(last[i]!.point, last[i - 1]!.point);
    const cos = (d[0] * launch[0] + d[1] * launch[1]) / (Math.hypot(...d) * Math.hypot(...launch));
    if (!(cos >= limit)) return false;
  }
  return true;
}

function keepPoints(template: Template, keep: (p: Vec2) => boolean): Template {
  const points: Vec2[] = [], values: number[] = [];
  template.points.forEach((p, i) => {
    if (!keep(p)) return;
    points.push(p);
    values.push(template.values[i]!);
  });
  return { points, values };
}

const sub = (a: Vec2, b: Vec2): Vec2 => [a[0] - b[0], a[1] - b[1]];

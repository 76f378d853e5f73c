/**
 * The tracking pass over a stream of grey frames (one at a time, in order; nothing but a ring of
 * recent frames, the first frame and a few chosen frames is kept):
 *  - frame 0: balls at rest (Hough proposes, the disc fit decides; up to three, so a second ball
 *    lying elsewhere cannot be taken for the one that is hit);
 *  - every frame until impact: each ball's centre (its displacement from rest decides impact),
 *    and how much changed near it against frame 0 (stillness gives the address frame; the frame
 *    with the most change, the top of the backswing, is the background without the head);
 *  - at impact: the head's leading edge on the last 8 frames (clubhead points), the face line
 *    (overhead) or the shaft line (face-on) on the impact and address frames;
 *  - after impact: the ball frame by frame (and, face-on, the marker on it) for up to 40 frames.
 */
import type { Vec2 } from "@/lib/geometry/vector";
import type { View } from "@/lib/marks/types";
import { fitBall, type BallFit } from "@/lib/tracking/ball";
import { changedCentroid, findHeadEdge, findShaftLine, headSign, type HeadSearch } from "@/lib/tracking/head";
import { clubheadTrack, trackFollowsLaunch, type HeadOnFrame } from "@/lib/tracking/head-track";
import { boxAround, cropImage, median, medianOfCrops, robustStd, type GreyImage, type PixelBox } from "@/lib/tracking/image";
import { relit } from "@/lib/tracking/light";
import { findMarker } from "@/lib/tracking/marker";
import { addressFromStillness, CONFIRM_FRAMES, impactFromBall, refineAddress, restJitter } from "@/lib/tracking/moments";
import type { Proposal, TrackingResult } from "@/lib/tracking/types";
import { findBallsAtRest } from "./find-balls";
import type { OpenCv } from "./opencv";

export const BALL_DIAMETER_MM = 42.67; // Rules of Golf, Appendix III: not less than 1.680 in (42.67 mm)
export const CLUBHEAD_FRAMES = 8;
export const BALL_TRACK_FRAMES = 40;
/** the last 8 frames before impact must still be here when the ball's start is confirmed */
const RING = CLUBHEAD_FRAMES + CONFIRM_FRAMES + 3;
/** a start is confirmed once the ball is this share of its radius from rest */
const CONFIRM_RADII = 0.5;
/** the region searched for the head, in ball radii around the ball */
const HEAD_REACH_RADII = 8;
/** a putt's path and start direction differ by a few degrees; a head track further off is not the head */
const MAX_PATH_TO_LAUNCH_DEG = 20;
/** cells of the light correction, in ball radii (a putter head is 1–4 radii deep) */
const LIGHT_CELL_RADII = 3;
/** sampling step of the change count (every other pixel and row is plenty for "did it move") */
const CHANGE_STRIDE = 2;
/** still frames kept for the address (it may turn out a few frames before the still run's end) */
const STILL_KEPT = 16;
/** crops of the head region kept for its background (thinned to every other one when full) */
const CROPS_KEPT = 48;

type Candidate = {
  rest: BallFit;
  box: PixelBox;
  displacement: (number | null)[];
  changed: number[];
  meanChange: number[];
  stillThreshold: number;
  still: Map<number, Uint8Array>;
  stillRunStart: number;
  /** the head region every `cropStep` frames, for the background (the head moves, turf stays) */
  crops: { frame: number; data: Uint8Array }[];
  cropStep: number;
  address: { frame: number; image: Uint8Array } | null;
};

/**
 * A fit near the rest spot is the ball only when it looks like it did at rest: its size and at
 * least half its contrast. Once the ball has gone, the head following through over its spot can
 * make a ring of edges a circle fit accepts.
 */
function sameBall(fit: BallFit, rest: BallFit): boolean {
  const contrast = rest.inside - rest.background;
  return Math.abs(fit.r - rest.r) <= 0.15 * rest.r && (fit.inside - fit.background) / contrast >= 0.5;
}

export type TrackerOptions = { view: View };

export class ClipTracker {
  private readonly ring: Uint8Array[];
  private readonly ringFrame: number[];
  private first: Uint8Array | null = null;
  private candidates: Candidate[] = [];
  private noise = 2;
  private threshold = 20;
  private hit: Candidate | null = null;
  private impact: number | null = null;
  private readonly track: { frame: number; fit: BallFit }[] = [];
  private trackEnded = false;
  private readonly proposals: Proposal[] = [];
  private readonly notes: string[] = [];
  private clubheadFrames = 0;
  private markerFrames = 0;
  private frames = 0;

  constructor(private readonly cv: OpenCv, private readonly width: number, private readonly height: number, private readonly options: TrackerOptions) {
    this.ring = Array.from({ length: RING }, () => new Uint8Array(width * height));
    this.ringFrame = Array.from({ length: RING }, () => -1);
  }

  /** True once nothing later in the clip can change the result (the decode may stop). */
  get done(): boolean {
    return this.trackEnded || (this.frames > 0 && this.candidates.length === 0);
  }

  private image(data: Uint8Array): GreyImage {
    return { data, width: this.width, height: this.height };
  }

  private fromRing(frame: number): Uint8Array | null {
    const slot = frame % RING;
    return this.ringFrame[slot] === frame ? this.ring[slot]! : null;
  }

  push(frame: Uint8Array, index: number): void {
    if (this.done) return;
    this.frames = index + 1;
    const slot = index % RING;
    this.ring[slot]!.set(frame);
    this.ringFrame[slot] = index;
    const data = this.ring[slot]!;
    if (index === 0) return this.start(data);
    if (index === 1) this.estimateNoise(data);
    if (this.impact === null) this.watchRest(data, index);
    else this.followBall(data, index);
  }

  private start(data: Uint8Array): void {
    this.first = data.slice();
    const balls = findBallsAtRest(this.cv, this.image(data));
    if (balls.length === 0) this.notes.push("No ball found on the first frame: impact falls back to the motion signal.");
    if (balls.length > 1) this.notes.push(`${balls.length} balls at rest in the picture; the one that moves is the one hit.`);
    this.candidates = balls.map((rest) => {
      const box = boxAround(this.image(data), rest.x, rest.y, rest.r * HEAD_REACH_RADII);
      const sampled = Math.ceil((box.x1 - box.x0) / CHANGE_STRIDE) * Math.ceil((box.y1 - box.y0) / CHANGE_STRIDE);
      // Still: fewer changed samples than a sliver of the head would make (0.2 % of the region).
      return {
        rest, box, displacement: [0], changed: [0], meanChange: [0], stillThreshold: Math.max(6, sampled * 0.002),
        still: new Map([[0, data.slice()]]), stillRunStart: 0, crops: [], cropStep: 1, address: null,
      };
    });
  }

  /** Pixel noise from the first two frames: robust s.d. of their difference / √2. */
  private estimateNoise(data: Uint8Array): void {
    const first = this.first!;
    const diffs: number[] = [];
    const step = Math.max(1, Math.floor(data.length / 20000));
    for (let i = 0; i < data.length; i += step) diffs.push(data[i]! - first[i]!);
    this.noise = Math.max(0.5, robustStd(diffs) / Math.SQRT2);
    this.threshold = Math.max(18, 6 * this.noise);
  }

  /** Samples near the ball changed past the threshold, and the mean absolute change less its common offset (flicker). */
  private changedNearBall(data: Uint8Array, box: PixelBox): { count: number; mean: number } {
    const first = this.first!;
    let count = 0, sum = 0, n = 0;
    for (let y = box.y0; y < box.y1; y += CHANGE_STRIDE) {
      for (let x = box.x0; x < box.x1; x += CHANGE_STRIDE) {
        const i = y * this.width + x;
        sum += data[i]! - first[i]!;
        n++;
      }
    }
    const offset = sum / n;
    let absolute = 0;
    for (let y = box.y0; y < box.y1; y += CHANGE_STRIDE) {
      for (let x = box.x0; x < box.x1; x += CHANGE_STRIDE) {
        const i = y * this.width + x;
        const d = data[i]! - first[i]! - offset;
        absolute += Math.abs(d);
        if (Math.abs(d) > this.threshold) count++;
      }
    }
    return { count, mean: absolute / n };
  }

  private watchRest(data: Uint8Array, index: number): void {
    const image = this.image(data);
    let earliest: { c: Candidate; k: number } | null = null;
    for (const c of this.candidates) {
      const fit = fitBall(image, { x: c.rest.x, y: c.rest.y, r: c.rest.r });
      c.displacement.push(fit && sameBall(fit, c.rest) ? Math.hypot(fit.x - c.rest.x, fit.y - c.rest.y) : null);
      const { count: changed, mean } = this.changedNearBall(data, c.box);
      c.changed.push(changed);
      c.meanChange.push(mean);
      if (changed <= c.stillThreshold) {
        if (c.changed[index - 1]! > c.stillThreshold) c.stillRunStart = index;
        c.still.set(index, data.slice());
        if (c.still.size > STILL_KEPT) c.still.delete(c.still.keys().next().value!);
      }
      if (addressFromStillness(c.changed, c.stillThreshold, index) === index) {
        const frame = refineAddress(c.meanChange, Math.max(c.stillRunStart, index - STILL_KEPT + 1), index);
        c.address = { frame, image: c.still.get(frame)! };
      }
      if (index % c.cropStep === 0) {
        c.crops.push({ frame: index, data: cropImage(image, c.box).data });
        if (c.crops.length > CROPS_KEPT) {
          c.cropStep *= 2;
          c.crops = c.crops.filter((crop) => crop.frame % c.cropStep === 0);
        }
      }
      const k = impactFromBall(c.displacement, restJitter(c.displacement), CONFIRM_RADII * c.rest.r);
      if (k !== null && (!earliest || k < earliest.k)) earliest = { c, k };
    }
    if (!earliest) return;
    this.hit = earliest.c;
    this.impact = earliest.k;
    this.measureHead(earliest.c, earliest.k);
    // The frames after impact already read are in the ring.
    for (let f = earliest.k + 1; f <= index && !this.trackEnded; f++) this.followBall(this.fromRing(f)!, f);
  }

  /**
   * The head region without the head: the per-pixel median of frames between address and impact
   * (the head passes through, the turf stays), pasted into the first frame.
   */
  private backgroundFor(c: Candidate, k: number): GreyImage | null {
    const from = c.address?.frame ?? 0;
    const between = c.crops.filter((crop) => crop.frame > from && crop.frame <= k);
    // The half in which most changed near the ball: the head away from its address spot, where
    // it must be seen near impact (a short backswing leaves the head over part of that spot).
    const cut = median(between.map((crop) => c.changed[crop.frame]!));
    const moving = between.filter((crop) => c.changed[crop.frame]! >= cut);
    if (moving.length < 3) return null;
    const { box } = c;
    const width = box.x1 - box.x0;
    const turf = medianOfCrops(moving.map((crop) => crop.data), width * (box.y1 - box.y0));
    const data = this.first!.slice();
    for (let y = box.y0; y < box.y1; y++) data.set(turf.subarray((y - box.y0) * width, (y - box.y0 + 1) * width), y * this.width + box.x0);
    return this.image(data);
  }

  private launchDirection(c: Candidate, k: number): Vec2 | null {
    for (let f = k + 3; f > k; f--) {
      const data = this.fromRing(f);
      const fit = data ? fitBall(this.image(data), { x: c.rest.x, y: c.rest.y, r: c.rest.r }) : null;
      if (fit && Math.hypot(fit.x - c.rest.x, fit.y - c.rest.y) >= 1) return [fit.x - c.rest.x, fit.y - c.rest.y];
    }
    return null;
  }

  private measureHead(c: Candidate, k: number): void {
    const background = this.backgroundFor(c, k);
    if (!background) return void this.notes.push("Too few frames between address and impact to see the turf without the head: no clubhead, face or shaft proposals.");
    const impactData = this.fromRing(k)!;
    // Each frame with its light matched to the background's first (a drifting shadow, flicker).
    const cell = Math.max(24, Math.round(LIGHT_CELL_RADII * c.rest.r));
    const lit = (data: Uint8Array) => relit(this.image(data), background, c.box, cell);
    const impactImage = lit(impactData);
    const sign = headSign(impactImage, background, c.box, this.threshold);
    const base = { box: c.box, sign, threshold: this.threshold, exclude: { x: c.rest.x, y: c.rest.y, r: c.rest.r } };
    const earliestFrame = Math.max(0, k - CLUBHEAD_FRAMES + 1);
    const atImpact = changedCentroid(impactImage, background, base);
    const atStart = changedCentroid(lit(this.fromRing(earliestFrame)!), background, base);
    if (!atImpact) return void this.notes.push("The head was not found near the ball at impact.");
    // The head travels about where it sends the ball (start direction and path differ by a few
    // degrees); the ball's first frames after impact are in the ring. Otherwise: the head's own motion.
    const launched = this.launchDirection(c, k);
    const moved = atStart ? Math.hypot(atImpact[0] - atStart[0], atImpact[1] - atStart[1]) : 0;
    const raw: Vec2 = launched ?? (atStart && moved >= 2 ? [atImpact[0] - atStart[0], atImpact[1] - atStart[1]] : [c.rest.x - atImpact[0], c.rest.y - atImpact[1]]);
    const norm = Math.hypot(raw[0], raw[1]);
    if (!(norm > 0)) return void this.notes.push("The head's direction of travel could not be found.");
    const search: HeadSearch = { ...base, towards: [raw[0] / norm, raw[1] / norm], noise: this.noise };

    const heads: HeadOnFrame[] = [];
    for (let f = earliestFrame; f <= k; f++) {
      const image = f === k ? impactImage : lit(this.fromRing(f)!);
      const head = findHeadEdge(image, background, search);
      if (head) heads.push({ frame: f, image, head });
    }
    const track = clubheadTrack(heads, background, search);
    if (launched && !trackFollowsLaunch(track, launched, MAX_PATH_TO_LAUNCH_DEG)) {
      this.notes.push(`The head's track runs more than ${MAX_PATH_TO_LAUNCH_DEG}° off the ball's start (something else moved near the ball, a shadow perhaps): no clubhead proposals; mark the head by hand.`);
    } else {
      for (const c of track) {
        this.clubheadFrames++;
        this.proposals.push({ frame: c.frame, kind: "point", role: "clubhead", points: [c.point], precisionPx: c.precisionPx });
      }
    }
    if (this.clubheadFrames > 0 && this.clubheadFrames < CLUBHEAD_FRAMES) this.notes.push(`Clubhead found on ${this.clubheadFrames} of the last ${CLUBHEAD_FRAMES} frames before impact.`);

    const moments: { frame: number; image: GreyImage }[] = [{ frame: k, image: impactImage }];
    if (c.address && c.address.frame !== k) moments.unshift({ frame: c.address.frame, image: lit(c.address.image) });
    for (const m of moments) {
      const head = findHeadEdge(m.image, background, search);
      if (!head) {
        this.notes.push(`The head's front was not found on frame ${m.frame}.`);
        continue;
      }
      if (this.options.view === "overhead") {
        this.proposals.push({ frame: m.frame, kind: "line", role: "face", points: head.ends, precisionPx: head.linePrecisionPx });
      } else if (this.options.view === "face-on") {
        const shaft = findShaftLine(m.image, background, search, head);
        if (shaft) this.proposals.push({ frame: m.frame, kind: "line", role: "shaft", points: shaft.ends, precisionPx: shaft.precisionPx });
        else this.notes.push(`The shaft was not found on frame ${m.frame}.`);
      }
    }
  }

  private followBall(data: Uint8Array, index: number): void {
    if (this.trackEnded || !this.hit) return;
    const rest = this.hit.rest;
    const last = this.track.at(-1)?.fit ?? rest;
    const before = this.track.at(-2)?.fit ?? (this.track.length ? rest : null);
    const guess = before ? { x: 2 * last.x - before.x, y: 2 * last.y - before.y, r: rest.r } : { x: last.x, y: last.y, r: rest.r };
    const fit = fitBall(this.image(data), guess);
    const inPicture = fit && fit.x - fit.r > 0 && fit.y - fit.r > 0 && fit.x + fit.r < this.width && fit.y + fit.r < this.height;
    if (!fit || !inPicture || Math.abs(fit.r - rest.r) > 0.25 * rest.r) {
      this.trackEnded = true;
      return;
    }
    this.track.push({ frame: index, fit });
    this.proposals.push({ frame: index, kind: "point", role: "ball", points: [[fit.x, fit.y]], precisionPx: fit.precisionPx });
    if (this.options.view === "face-on") {
      const marker = findMarker(this.image(data), fit, this.noise);
      if (marker) {
        this.markerFrames++;
        this.proposals.push({ frame: index, kind: "point", role: "marker", points: [marker.point], precisionPx: marker.precisionPx });
      }
    }
    if (this.track.length >= BALL_TRACK_FRAMES) this.trackEnded = true;
  }

  /**
   * The result in source pixels (`scale` = source px per decoded px). Without a ball impact the
   * motion signal's suggestion stands; the address falls back to frame 0.
   */
  finish(motionImpactFrame: number | null, scale: number, seconds: number): TrackingResult {
    const ball = this.hit ?? this.candidates[0] ?? null;
    const impactFrame = this.impact ?? motionImpactFrame;
    const impactSource = this.impact !== null ? "ball" : motionImpactFrame !== null ? "motion" : null;
    if (this.candidates.length > 0 && this.impact === null) this.notes.push("The ball never moved in the clip: impact falls back to the motion signal.");
    let addressFrame: number | null = ball?.address?.frame ?? null;
    if (ball && addressFrame === null && impactFrame !== null) addressFrame = addressFromStillness(ball.changed, ball.stillThreshold, impactFrame);
    addressFrame ??= 0;
    const proposals = [...this.proposals];
    if (ball) {
      // The scale: the ball's diameter at rest, on the address frame when we kept it.
      const atAddress = ball.address ? fitBall(this.image(ball.address.image), ball.rest) : null;
      const fit = atAddress ?? ball.rest;
      const frame = atAddress ? ball.address!.frame : 0;
      // An end of the diameter carries the centre's error and the radius's (var r ≈ var centre / 2).
      proposals.unshift({ frame, kind: "scale", role: "ball", points: [[fit.x - fit.r, fit.y], [fit.x + fit.r, fit.y]], precisionPx: fit.precisionPx * Math.sqrt(1.5), lengthMm: BALL_DIAMETER_MM });
    }
    const scaled = proposals.map((p) => ({ ...p, points: p.points.map(([x, y]) => [x * scale, y * scale] as Vec2), precisionPx: p.precisionPx * scale }));
    return {
      summary: {
        version: 1,
        ballFound: ball !== null,
        ball: ball ? { x: ball.rest.x * scale, y: ball.rest.y * scale, diameterPx: 2 * ball.rest.r * scale } : null,
        addressFrame,
        impactFrame,
        impactSource,
        ballTrackFrames: this.track.length,
        clubheadFrames: this.clubheadFrames,
        markerFrames: this.markerFrames,
        seconds,
        notes: this.notes,
      },
      proposals: scaled,
    };
  }
}

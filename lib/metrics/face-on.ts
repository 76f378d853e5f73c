import { toDegrees, unwrapRadians, unwrapRadiansNear } from "@/lib/geometry/angle";
import { dot, sub, type Vec2 } from "@/lib/geometry/vector";
import { BALL_RADIUS_M, launchFromTrack, skidToRoll } from "@/lib/physics/skid";
import { linearFit } from "@/lib/stats/linear-fit";
import type { StoredMark } from "@/lib/marks/types";
import { reversesReference, sideAxes } from "./axes";
import { combine, found, isMissing, missing, type Found, type Outcome } from "./outcome";
import { lastLine, plural, track, type TrackPoint } from "./pick";
import { measurementSpace } from "./space";
import { ballSpeed, fitTrack, type FittedTrack } from "./track";
import type { ClipContext } from "./types";

type Side = { g: Vec2; u: Vec2; groundIds: string[] };
const NEEDS_LEVEL_GROUND = "a ground line that is not vertical";
const NEEDS_IMPACT = "the impact frame moment";

/** The fastest putt the spin unwrap is made safe for without a speed to guide it (4 m/s, rolling; our choice). */
const FASTEST_SPIN_RAD_S = 4 / BALL_RADIUS_M;

/** Marker points further apart than this may hide more than half a turn between them (at ≤ 4 m/s rolling). */
export function largestMarkerGap(captureFps: number): number {
  return Math.max(1, Math.floor((Math.PI * captureFps) / FASTEST_SPIN_RAD_S));
}

// Face-on definitions of docs/measurements.md; g toward the target, u up in the image.
export function faceOnOutcomes(clip: ClipContext, marks: readonly StoredMark[]): Record<string, Outcome> {
  const ground = lastLine(marks, "ground");
  const axes = sideAxes(ground, reversesReference(clip));
  const side: Side | null = axes && { ...axes, groundIds: ground ? [ground.id] : [] };
  const space = measurementSpace(marks, false);
  const { address, impact } = clip.moments;
  const leanImpact = shaftLean(marks, impact, "impact", side);
  const ball = impact == null ? { needs: [NEEDS_IMPACT] } : fitTrack(marks, "ball", (f) => f > impact, space, "after impact");
  const speed = ballSpeed(ball, space, clip);
  const spin = spinRadPerSecond(clip, marks, side, speed);
  const radius = BALL_RADIUS_M;
  return {
    shaft_lean_address: shaftLean(marks, address, "address", side),
    shaft_lean_impact: leanImpact,
    // Like path overhead: the last (up to 4) clubhead points, so the backswing does not enter.
    attack_angle: rise(impact == null ? { needs: [NEEDS_IMPACT] } : fitTrack(marks, "clubhead", (f) => f <= impact, space, "up to impact", 4), side, "clubhead"),
    dynamic_loft: clip.staticLoftDeg == null
      ? missing("the build's static loft", ...(isMissing(leanImpact) ? leanImpact.needs : []))
      : combine([leanImpact], ([lean]) => (clip.staticLoftDeg as number) - (lean as number)),
    launch_angle: rise(ball, side, "ball"),
    ball_speed: speed,
    spin_rpm: combine([spin.mean], ([w]) => ((w as number) * 60) / (2 * Math.PI)),
    roll_ratio: combine([spin.mean, speed], ([w, v]) => ((w as number) * radius) / (v as number)),
    skid_distance: skid(clip, ball, speed, spin),
  };
}

/**
 * Skid from the impact instant: the tracked mean speed and spin are carried back to it with the
 * sliding model (launchFromTrack), then skidToRoll. Impact is taken half a frame after the impact
 * frame (the ball is still on it and has moved on the next).
 */
function skid(clip: ClipContext, ball: FittedTrack | { needs: string[] }, speed: Outcome, spin: SpinOutcome): Outcome {
  const needs = [...(isMissing(speed) ? speed.needs : []), ...(isMissing(spin.mean) ? spin.mean.needs : [])];
  if (!(clip.frictionMu > 0)) needs.push("the studio's ball–green friction setting (μ)");
  if (needs.length > 0 || isMissing(speed) || isMissing(spin.mean) || "needs" in ball || clip.moments.impact == null) return missing(...new Set(needs));
  const impactTime = (clip.moments.impact + 0.5) / clip.captureFps;
  const after = (frames: readonly number[]) => frames.map((f) => f / clip.captureFps - impactTime);
  const launch = launchFromTrack({
    meanSpeed: speed.value, speedTimes: after(ball.points.map((p) => p.frame)),
    meanSpin: spin.mean.value, spinTimes: after(spin.frames), mu: clip.frictionMu,
  });
  // Rolling over every tracked frame: the skid ended before the first of them.
  const start = launch ?? { speed: speed.value, spin: spin.mean.value };
  return combine([speed, spin.mean], () => skidToRoll({ ...start, mu: clip.frictionMu }).skidDistance);
}

/** s from the shaft's lower end to its upper end; lean = atan2(s·g, s·u), + handle toward the target. */
function shaftLean(marks: readonly StoredMark[], frame: number | null | undefined, label: string, side: Side | null): Outcome {
  const needs: string[] = [];
  if (frame == null) needs.push(`the ${label} frame moment`);
  if (!side) needs.push(NEEDS_LEVEL_GROUND);
  const line = frame == null ? undefined : lastLine(marks, "shaft", frame);
  if (frame != null && !line) needs.push(`a shaft line on frame ${frame} (${label})`);
  if (needs.length > 0 || !line || !side) return missing(...needs);
  let s = sub(line.points[1] as Vec2, line.points[0] as Vec2);
  if (dot(s, side.u) === 0) return missing(`a shaft line on frame ${frame} that is not parallel to the ground`);
  if (dot(s, side.u) < 0) s = [-s[0], -s[1]];
  return found(toDegrees(Math.atan2(dot(s, side.g), dot(s, side.u))), [line.frame], [line.id, ...side.groundIds]);
}

/**
 * Rise of a fitted track: atan2(d·u, d·g), + upward (attack angle, launch angle). A track moving
 * away from the target (d·g ≤ 0) gives no number: the handedness, the mirroring or the points are wrong.
 */
function rise(fitted: FittedTrack | { needs: string[] }, side: Side | null, role: "ball" | "clubhead"): Outcome {
  const needs = [...("needs" in fitted ? fitted.needs : []), ...(side ? [] : [NEEDS_LEVEL_GROUND])];
  if ("needs" in fitted || !side) return missing(...needs);
  const d = fitted.line.direction;
  if (dot(d, side.g) <= 0) {
    return missing(`${role} points that move toward the target: they move away from it (check the golfer's handedness, the clip's mirroring and the ground line)`);
  }
  return found(toDegrees(Math.atan2(dot(d, side.u), dot(d, side.g))), fitted.points.map((p) => p.frame), [...fitted.points.map((p) => p.markId), ...side.groundIds]);
}

type SpinOutcome = { mean: Outcome; frames: number[] };

/**
 * Spin ω = −dθ/dt (rad/s, least squares over the unwrapped angle of marker − centre), + topspin.
 * Between two marker frames the dot may turn more than half a turn; with a ball speed the turn
 * count nearest to rolling (ω ≈ v / r) is taken, without one the points must be close enough.
 */
function spinRadPerSecond(clip: ClipContext, marks: readonly StoredMark[], side: Side | null, speed: Outcome): SpinOutcome {
  const impact = clip.moments.impact;
  const needs: string[] = [];
  if (impact == null) needs.push(NEEDS_IMPACT);
  if (!side) needs.push(NEEDS_LEVEL_GROUND);
  if (!(clip.captureFps > 0)) needs.push("the clip's capture frame rate");
  if (needs.length > 0 || impact == null || !side) return { mean: missing(...needs), frames: [] };
  const centres = new Map(track(marks, "ball", (f) => f > impact).map((p) => [p.frame, p]));
  const pairs = track(marks, "marker", (f) => centres.has(f)).map((m) => ({ marker: m, centre: centres.get(m.frame) as TrackPoint }));
  const frames = pairs.map((p) => p.marker.frame);
  if (pairs.length < 2) return { mean: missing(`marker and ball points on the same 2 frames after impact (have ${plural(pairs.length, "frame")})`), frames };
  const offsets = pairs.map((p) => sub(p.marker.point, p.centre.point));
  if (offsets.some((m) => m[0] === 0 && m[1] === 0)) return { mean: missing("marker points away from the ball's centre"), frames };
  const raw = offsets.map((m) => Math.atan2(dot(m, side.u), dot(m, side.g)));
  const times = frames.map((f) => f / clip.captureFps);
  let theta: number[];
  if (!isMissing(speed)) {
    theta = unwrapRadiansNear(raw, times, -(speed as Found).value / BALL_RADIUS_M);
  } else {
    const gap = largestMarkerGap(clip.captureFps);
    const widest = Math.max(...frames.slice(1).map((f, i) => f - (frames[i] as number)));
    if (widest > gap) {
      return { mean: missing(`marker points at most ${plural(gap, "frame")} apart (${widest} between two now), or a ball speed to guide the count of turns`), frames };
    }
    theta = unwrapRadians(raw);
  }
  const fit = linearFit(times.map((t, i) => [t, theta[i] as number]));
  return { mean: found(-fit.slope, frames, [...pairs.flatMap((p) => [p.marker.markId, p.centre.markId]), ...side.groundIds]), frames };
}

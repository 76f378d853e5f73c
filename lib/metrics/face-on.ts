import { toDegrees, unwrapRadians } from "@/lib/geometry/angle";
import { dot, sub, type Vec2 } from "@/lib/geometry/vector";
import { BALL_RADIUS_M, skidToRoll } from "@/lib/physics/skid";
import { linearFit } from "@/lib/stats/linear-fit";
import type { StoredMark } from "@/lib/marks/types";
import { reversesReference, sideAxes } from "./axes";
import { combine, found, missing, type Outcome } from "./outcome";
import { lastLine, plural, track } from "./pick";
import { measurementSpace } from "./space";
import { ballSpeed, fitTrack } from "./track";
import type { ClipContext } from "./types";

type Side = { g: Vec2; u: Vec2; groundIds: string[] };
const NEEDS_LEVEL_GROUND = "a ground line that is not vertical";

// Face-on definitions of METRICS.md; g toward the target, u up in the image.
export function faceOnOutcomes(clip: ClipContext, marks: readonly StoredMark[]): Record<string, Outcome> {
  const ground = lastLine(marks, "ground");
  const axes = sideAxes(ground, reversesReference(clip));
  const side: Side | null = axes && { ...axes, groundIds: ground ? [ground.id] : [] };
  const space = measurementSpace(marks, false);
  const { address, impact } = clip.moments;
  const leanImpact = shaftLean(marks, impact, "impact", side);
  const ball = impact == null ? { needs: ["the impact frame moment"] } : fitTrack(marks, "ball", (f) => f > impact, space, "after impact");
  const speed = ballSpeed(ball, space, clip);
  const spin = spinRadPerSecond(clip, marks, side);
  const radius = BALL_RADIUS_M;
  return {
    shaft_lean_address: shaftLean(marks, address, "address", side),
    shaft_lean_impact: leanImpact,
    // Like path overhead: the last (up to 4) clubhead points, so the backswing does not enter.
    attack_angle: impact == null ? missing("the impact frame moment") : rise(fitTrack(marks, "clubhead", (f) => f <= impact, space, "up to impact", 4), side),
    dynamic_loft: clip.staticLoftDeg == null ? missing("the build's static loft", ...("needs" in leanImpact ? leanImpact.needs : [])) : combine([leanImpact], ([lean]) => (clip.staticLoftDeg as number) - (lean as number)),
    launch_angle: rise(ball, side),
    ball_speed: speed,
    spin_rpm: combine([spin], ([w]) => ((w as number) * 60) / (2 * Math.PI)),
    roll_ratio: combine([spin, speed], ([w, v]) => ((w as number) * radius) / (v as number)),
    skid_distance: clip.frictionMu > 0
      ? combine([spin, speed], ([w, v]) => skidToRoll({ speed: v as number, spin: w as number, mu: clip.frictionMu, radius }).skidDistance)
      : missing("the studio's ball–green friction setting (μ)"),
  };
}

/** s from the shaft's lower end to its upper end; lean = atan2(s·g, s·u), + handle toward the target. */
function shaftLean(marks: readonly StoredMark[], frame: number | null | undefined, label: string, side: Side | null): Outcome {
  if (frame == null) return missing(`the ${label} frame moment`);
  if (!side) return missing(NEEDS_LEVEL_GROUND);
  const line = lastLine(marks, "shaft", frame);
  if (!line) return missing(`a shaft line on frame ${frame} (${label})`);
  let s = sub(line.points[1] as Vec2, line.points[0] as Vec2);
  if (dot(s, side.u) === 0) return missing(`a shaft line on frame ${frame} that is not parallel to the ground`);
  if (dot(s, side.u) < 0) s = [-s[0], -s[1]];
  return found(toDegrees(Math.atan2(dot(s, side.g), dot(s, side.u))), [line.frame], [line.id, ...side.groundIds]);
}

/** Rise of a fitted track: atan2(d·u, d·g), + upward (attack angle, launch angle). */
function rise(fitted: ReturnType<typeof fitTrack>, side: Side | null): Outcome {
  const needs = [...("needs" in fitted ? fitted.needs : []), ...(side ? [] : [NEEDS_LEVEL_GROUND])];
  if ("needs" in fitted || !side) return missing(...needs);
  const d = fitted.line.direction;
  return found(toDegrees(Math.atan2(dot(d, side.u), dot(d, side.g))), fitted.points.map((p) => p.frame), [...fitted.points.map((p) => p.markId), ...side.groundIds]);
}

/**
 * Spin ω = −dθ/dt (rad/s, least squares over the unwrapped angle of marker − centre), + topspin.
 * The marker must turn less than half a turn between marked frames for the unwrapping to hold.
 */
function spinRadPerSecond(clip: ClipContext, marks: readonly StoredMark[], side: Side | null): Outcome {
  const impact = clip.moments.impact;
  if (impact == null) return missing("the impact frame moment");
  if (!side) return missing(NEEDS_LEVEL_GROUND);
  if (!(clip.captureFps > 0)) return missing("the clip's capture frame rate");
  const centres = new Map(track(marks, "ball", (f) => f > impact).map((p) => [p.frame, p]));
  const pairs = track(marks, "marker", (f) => centres.has(f)).map((m) => ({ marker: m, centre: centres.get(m.frame)! }));
  if (pairs.length < 2) return missing(`marker and ball points on the same 2 frames after impact (have ${plural(pairs.length, "frame")})`);
  const offsets = pairs.map((p) => sub(p.marker.point, p.centre.point));
  if (offsets.some((m) => m[0] === 0 && m[1] === 0)) return missing("marker points away from the ball's centre");
  const theta = unwrapRadians(offsets.map((m) => Math.atan2(dot(m, side.u), dot(m, side.g))));
  const fit = linearFit(pairs.map((p, i) => [p.marker.frame / clip.captureFps, theta[i] as number]));
  return found(-fit.slope, pairs.map((p) => p.marker.frame), [...pairs.flatMap((p) => [p.marker.markId, p.centre.markId]), ...side.groundIds]);
}

import { angleInFrameDeg, wrapDegrees } from "@/lib/geometry/angle";
import { dot, sub, type Vec2 } from "@/lib/geometry/vector";
import { linearFit } from "@/lib/stats/linear-fit";
import type { StoredMark } from "@/lib/marks/types";
import { overheadAxes, reversesReference } from "./axes";
import { combine, found, isMissing, missing, withSources, type Outcome } from "./outcome";
import { lastLine, linesByFrame, plural } from "./pick";
import { measurementSpace, type MeasurementSpace } from "./space";
import { ballSpeed, fitTrack, type FittedTrack } from "./track";
import type { ClipContext } from "./types";

type Axes = { t: Vec2; r: Vec2; target: StoredMark };

const NEEDS_TARGET = "a target line (from the ball toward the hole)";
const momentNeed = (label: string) => `the ${label} frame moment`;

// Overhead definitions of docs/measurements.md: angle(d) = atan2(d·r, d·t).
export function overheadOutcomes(clip: ClipContext, marks: readonly StoredMark[]): Record<string, Outcome> {
  const space = measurementSpace(marks, true);
  const axes = targetAxes(clip, marks, space);
  const { address, impact } = clip.moments;
  const faceAt = (frame: number | null | undefined, label: string): Outcome => {
    const needs: string[] = [];
    if (frame == null) needs.push(momentNeed(label));
    if (!axes) needs.push(NEEDS_TARGET);
    const line = frame == null ? undefined : lastLine(marks, "face", frame);
    if (frame != null && !line) needs.push(`a face line on frame ${frame} (${label})`);
    if (needs.length > 0 || !line || !axes) return missing(...needs);
    return faceAngle(line, axes, space);
  };
  const aim = faceAt(address, "address");
  const faceImpact = faceAt(impact, "impact");
  const path = pathAngle(clip, marks, space, axes);
  const rate = faceRotationRate(clip, marks, space, axes);
  const ball = impact == null ? { needs: [momentNeed("impact")] } : fitTrack(marks, "ball", (f) => f > impact, space, "after impact");
  return {
    aim,
    face_angle_impact: faceImpact,
    path,
    face_to_path: combine([faceImpact, path], ([f, p]) => wrapDegrees((f as number) - (p as number))),
    face_rotation_rate: rate,
    twist: twist(clip, faceAt, faceImpact, rate),
    start_direction: trackDirection(ball, axes, space, "ball"),
    ball_speed: ballSpeed(ball, space, clip),
  };
}

/** Face change over the frame after impact, less what the rotation rate accounts for. */
function twist(clip: ClipContext, faceAt: (frame: number, label: string) => Outcome, faceImpact: Outcome, rate: Outcome): Outcome {
  const impact = clip.moments.impact;
  if (impact == null) return missing(momentNeed("impact"));
  if (impact + 1 >= clip.frameCount) {
    return missing(`a frame after impact: impact is frame ${impact}, the clip's last — set impact earlier if the ball has already moved there`);
  }
  return combine([faceAt(impact + 1, "first after impact"), faceImpact, rate], ([after, at, perSecond]) => wrapDegrees((after as number) - (at as number)) - (perSecond as number) / clip.captureFps);
}

function targetAxes(clip: ClipContext, marks: readonly StoredMark[], space: MeasurementSpace): Axes | null {
  const target = lastLine(marks, "target");
  if (!target || target.points.length < 2) return null;
  const [a, b] = [space.map(target.points[0] as Vec2), space.map(target.points[1] as Vec2)];
  return { ...overheadAxes(sub(b, a), reversesReference(clip)), target };
}

/** Face normal n ⟂ face line with n·t > 0; face angle = angle(n). */
function faceAngle(line: StoredMark, axes: Axes, space: MeasurementSpace): Outcome {
  const f = sub(space.map(line.points[1] as Vec2), space.map(line.points[0] as Vec2));
  let n: Vec2 = [-f[1], f[0]];
  const along = dot(n, axes.t);
  if (along === 0) return missing(`a face line on frame ${line.frame} that is not parallel to the target line`);
  if (along < 0) n = [-n[0], -n[1]];
  return found(angleInFrameDeg(n, axes.t, axes.r), [line.frame, axes.target.frame], [line.id, axes.target.id, ...space.angleMarkIds]);
}

/**
 * The direction of a fitted track against the target line. A track running backwards along it
 * (d·t ≤ 0) is not a putt toward the hole: the target line is drawn the wrong way round (or the
 * points are misplaced), so it gives no number.
 */
function trackDirection(fitted: FittedTrack | { needs: string[] }, axes: Axes | null, space: MeasurementSpace, role: "ball" | "clubhead"): Outcome {
  const needs = [...("needs" in fitted ? fitted.needs : []), ...(axes ? [] : [NEEDS_TARGET])];
  if ("needs" in fitted || !axes) return missing(...needs);
  const d = fitted.line.direction;
  if (dot(d, axes.t) <= 0) {
    return missing(`a target line drawn from the ball toward the hole: the ${role} moves backwards along the one drawn (it may be drawn the wrong way round)`);
  }
  const points = fitted.points;
  return found(angleInFrameDeg(d, axes.t, axes.r), [...points.map((p) => p.frame), axes.target.frame], [...points.map((p) => p.markId), axes.target.id, ...space.angleMarkIds]);
}

/** Path: line through the last (up to 4) clubhead points up to impact, oriented by time. */
function pathAngle(clip: ClipContext, marks: readonly StoredMark[], space: MeasurementSpace, axes: Axes | null): Outcome {
  const impact = clip.moments.impact;
  if (impact == null) return missing(momentNeed("impact"), ...(axes ? [] : [NEEDS_TARGET]));
  return trackDirection(fitTrack(marks, "clubhead", (f) => f <= impact, space, "up to impact", 4), axes, space, "clubhead");
}

/** Least-squares slope of face angle against time over the frames after address up to impact, °/s. */
function faceRotationRate(clip: ClipContext, marks: readonly StoredMark[], space: MeasurementSpace, axes: Axes | null): Outcome {
  const { address, impact } = clip.moments;
  const needs: string[] = [];
  if (address == null) needs.push(momentNeed("address"));
  if (impact == null) needs.push(momentNeed("impact"));
  if (!axes) needs.push(NEEDS_TARGET);
  if (!(clip.captureFps > 0)) needs.push("the clip's capture frame rate");
  const lines = address == null || impact == null ? [] : linesByFrame(marks, "face", (f) => f > address && f <= impact);
  if (address != null && impact != null && lines.length < 2) needs.push(`face lines on 2 frames after address up to impact (have ${plural(lines.length, "frame")})`);
  if (needs.length > 0 || !axes) return missing(...needs);
  const angles = lines.map((l) => faceAngle(l, axes, space));
  const bad = angles.find(isMissing);
  if (bad) return bad;
  // Face angles lie in (−90°, 90°) (the normal is taken toward the target), so no unwrapping is needed.
  const fit = linearFit(lines.map((l, i) => [l.frame / clip.captureFps, (angles[i] as { value: number }).value]));
  return withSources(found(fit.slope, lines.map((l) => l.frame), lines.map((l) => l.id)), [axes.target.frame], [axes.target.id, ...space.angleMarkIds]);
}

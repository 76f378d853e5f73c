import { angleInFrameDeg } from "@/lib/geometry/angle";
import { dot, sub, type Vec2 } from "@/lib/geometry/vector";
import { linearFit } from "@/lib/stats/linear-fit";
import type { StoredMark } from "@/lib/marks/types";
import { overheadAxes, reversesReference } from "./axes";
import { combine, found, isMissing, missing, withSources, type Outcome } from "./outcome";
import { lastLine, linesByFrame, plural } from "./pick";
import { measurementSpace, type MeasurementSpace } from "./space";
import { ballSpeed, fitTrack } from "./track";
import type { ClipContext } from "./types";

type Axes = { t: Vec2; r: Vec2; target: StoredMark };

// Overhead definitions of METRICS.md: angle(d) = atan2(d·r, d·t).
export function overheadOutcomes(clip: ClipContext, marks: readonly StoredMark[]): Record<string, Outcome> {
  const space = measurementSpace(marks, true);
  const axes = targetAxes(clip, marks, space);
  const { address, impact } = clip.moments;
  const faceAt = (frame: number | null | undefined, label: string): Outcome => {
    if (frame == null) return missing(`the ${label} frame moment`);
    if (!axes) return missing("a target line (from the ball toward the hole)");
    const line = lastLine(marks, "face", frame);
    if (!line) return missing(`a face line on frame ${frame} (${label})`);
    return faceAngle(line, axes, space);
  };
  const aim = faceAt(address, "address");
  const faceImpact = faceAt(impact, "impact");
  const path = pathAngle(clip, marks, space, axes);
  const rate = faceRotationRate(clip, marks, space, axes);
  const twist = impact == null ? missing("the impact frame moment") : combine([faceAt(impact + 1, "first after impact"), faceImpact, rate], ([after, at, perSecond]) => (after as number) - (at as number) - (perSecond as number) / clip.captureFps);
  const ball = impact == null ? { needs: ["the impact frame moment"] } : fitTrack(marks, "ball", (f) => f > impact, space, "after impact");
  const start = "needs" in ball ? missing(...ball.needs, ...(axes ? [] : ["a target line (from the ball toward the hole)"])) : directionOutcome(ball.line.direction, ball.points, axes, space);
  return {
    aim,
    face_angle_impact: faceImpact,
    path,
    face_to_path: combine([faceImpact, path], ([f, p]) => (f as number) - (p as number)),
    face_rotation_rate: rate,
    twist,
    start_direction: start,
    ball_speed: ballSpeed(ball, space, clip),
  };
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

function directionOutcome(d: Vec2, points: { frame: number; markId: string }[], axes: Axes | null, space: MeasurementSpace): Outcome {
  if (!axes) return missing("a target line (from the ball toward the hole)");
  const value = angleInFrameDeg(d, axes.t, axes.r);
  return found(value, [...points.map((p) => p.frame), axes.target.frame], [...points.map((p) => p.markId), axes.target.id, ...space.angleMarkIds]);
}

/** Path: line through the last (up to 4) clubhead points up to impact, oriented by time. */
function pathAngle(clip: ClipContext, marks: readonly StoredMark[], space: MeasurementSpace, axes: Axes | null): Outcome {
  const impact = clip.moments.impact;
  if (impact == null) return missing("the impact frame moment");
  const head = fitTrack(marks, "clubhead", (f) => f <= impact, space, "up to impact", 4);
  if ("needs" in head) return missing(...head.needs, ...(axes ? [] : ["a target line (from the ball toward the hole)"]));
  return directionOutcome(head.line.direction, head.points, axes, space);
}

/** Least-squares slope of face angle against time over the frames after address up to impact, °/s. */
function faceRotationRate(clip: ClipContext, marks: readonly StoredMark[], space: MeasurementSpace, axes: Axes | null): Outcome {
  const { address, impact } = clip.moments;
  const needs: string[] = [];
  if (address == null) needs.push("the address frame moment");
  if (impact == null) needs.push("the impact frame moment");
  if (!axes) needs.push("a target line (from the ball toward the hole)");
  if (!(clip.captureFps > 0)) needs.push("the clip's capture frame rate");
  if (needs.length > 0 || address == null || impact == null || !axes) return missing(...needs);
  const lines = linesByFrame(marks, "face", (f) => f > address && f <= impact);
  if (lines.length < 2) return missing(`face lines on 2 frames after address up to impact (have ${plural(lines.length, "frame")})`);
  const angles = lines.map((l) => faceAngle(l, axes, space));
  const bad = angles.find(isMissing);
  if (bad) return bad;
  const fit = linearFit(lines.map((l, i) => [l.frame / clip.captureFps, (angles[i] as { value: number }).value]));
  return withSources(found(fit.slope, lines.map((l) => l.frame), lines.map((l) => l.id)), [axes.target.frame], [axes.target.id, ...space.angleMarkIds]);
}

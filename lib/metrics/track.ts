import { fitLine, positionsAlong, type FittedLine } from "@/lib/geometry/fit-line";
import { linearFit } from "@/lib/stats/linear-fit";
import type { StoredMark } from "@/lib/marks/types";
import { found, missing, type Outcome } from "./outcome";
import { plural, track, type TrackPoint } from "./pick";
import type { MeasurementSpace } from "./space";
import type { ClipContext } from "./types";

export type FittedTrack = { line: FittedLine; points: TrackPoint[] };

/** Line through a role's points on the chosen frames, mapped into the measurement space; oriented by time. */
export function fitTrack(
  marks: readonly StoredMark[],
  role: "ball" | "clubhead",
  keep: (frame: number) => boolean,
  space: MeasurementSpace,
  describe: string,
  lastN?: number,
): FittedTrack | { needs: string[] } {
  let points = track(marks, role, keep);
  if (lastN !== undefined) points = points.slice(-lastN);
  if (points.length < 2) return { needs: [`${role} points on 2 frames ${describe} (have ${plural(points.length, "frame")})`] };
  const mapped = points.map((p) => space.map(p.point));
  try {
    return { line: fitLine(mapped), points };
  } catch {
    return { needs: [`${role} points ${describe} that are not all in one place`] };
  }
}

/** Ball speed (m/s): least-squares slope of distance along the fitted line against time. */
export function ballSpeed(ball: FittedTrack | { needs: string[] }, space: MeasurementSpace, clip: ClipContext): Outcome {
  const needs = "needs" in ball ? [...ball.needs] : [];
  if (space.mmPerUnit === null) needs.push("a scale mark (the ball's diameter) or a ground plane");
  if (!(clip.captureFps > 0)) needs.push("the clip's capture frame rate");
  if ("needs" in ball || space.mmPerUnit === null || needs.length > 0) return missing(...needs);
  const along = positionsAlong(ball.line, ball.points.map((p) => space.map(p.point)));
  const fit = linearFit(ball.points.map((p, i) => [p.frame / clip.captureFps, (along[i] as number) * (space.mmPerUnit as number)]));
  return found(fit.slope / 1000, ball.points.map((p) => p.frame), [...ball.points.map((p) => p.markId), ...space.lengthMarkIds]);
}

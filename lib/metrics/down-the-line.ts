import { toDegrees } from "@/lib/geometry/angle";
import { dot, sub, type Vec2 } from "@/lib/geometry/vector";
import type { StoredMark } from "@/lib/marks/types";
import { reversesReference, sideAxes } from "./axes";
import { found, missing, type Outcome } from "./outcome";
import { lastLine } from "./pick";
import type { ClipContext } from "./types";

// Down-the-line definitions of docs/measurements.md: g toward the toe, u up; heel up positive.
export function downTheLineOutcomes(clip: ClipContext, marks: readonly StoredMark[]): Record<string, Outcome> {
  const tilt = soleTilt(clip, marks);
  // Heel up asks for a more upright lie by about the tilt, toe up a flatter one (common practice).
  return { sole_tilt_impact: tilt, lie_change: tilt };
}

function soleTilt(clip: ClipContext, marks: readonly StoredMark[]): Outcome {
  const impact = clip.moments.impact;
  if (impact == null) return missing("the impact frame moment");
  const ground = lastLine(marks, "ground");
  const side = sideAxes(ground, reversesReference(clip));
  if (!side) return missing("a ground line that is not vertical");
  const sole = lastLine(marks, "sole", impact);
  if (!sole) return missing(`a sole line on frame ${impact} (impact)`);
  let d = sub(sole.points[1] as Vec2, sole.points[0] as Vec2);
  if (dot(d, side.g) === 0) return missing(`a sole line on frame ${impact} that is not upright`);
  if (dot(d, side.g) < 0) d = [-d[0], -d[1]];
  return found(-toDegrees(Math.atan2(dot(d, side.u), dot(d, side.g))), [sole.frame], [sole.id, ...(ground ? [ground.id] : [])]);
}

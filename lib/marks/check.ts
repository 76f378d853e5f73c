import { homographyFromPoints, rectangleCornersMm, type Quad } from "@/lib/geometry/homography";
import { cross, distance, sub, type Vec2 } from "@/lib/geometry/vector";
import { roleFits } from "./roles";
import { POINTS_PER_KIND, type ClipFrameInfo, type MarkInput } from "./types";

/** Plain-English problems of a mark on a given clip; an empty list means the mark is acceptable. */
export function checkMarkAgainstClip(mark: MarkInput, clip: ClipFrameInfo): string[] {
  const problems: string[] = [];
  if (!Number.isInteger(mark.frame) || mark.frame < 0 || mark.frame >= clip.frameCount) {
    problems.push(`Frame ${mark.frame} is outside the clip, which has frames 0 to ${clip.frameCount - 1}.`);
  }
  const expected = POINTS_PER_KIND[mark.kind];
  if (mark.points.length !== expected) {
    problems.push(`A ${mark.kind} mark needs ${expected} point${expected === 1 ? "" : "s"}, not ${mark.points.length}.`);
  }
  mark.points.forEach((p, i) => {
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1])) {
      problems.push(`Point ${i + 1} is not a finite number.`);
    } else if (p[0] < 0 || p[0] > clip.width || p[1] < 0 || p[1] > clip.height) {
      problems.push(`Point ${i + 1} (${p[0]}, ${p[1]}) lies outside the ${clip.width}×${clip.height} frame.`);
    }
  });
  if (problems.length === 0) problems.push(...shapeProblems(mark));
  if (!roleFits(clip.view, mark.kind, mark.role)) {
    problems.push(`A ${mark.role} ${mark.kind} does not belong on a ${clip.view} clip.`);
  }
  for (const key of ["lengthMm", "widthMm", "heightMm"] as const) {
    const v = mark[key];
    if (v !== undefined && !(Number.isFinite(v) && v > 0)) problems.push(`${key} must be a positive length in millimetres.`);
  }
  if (mark.kind === "plane" && (mark.widthMm === undefined || mark.heightMm === undefined)) {
    problems.push("A plane mark needs the rectangle's width and height in millimetres.");
  }
  return problems;
}

function shapeProblems(mark: MarkInput): string[] {
  const p = mark.points;
  const at = (i: number): Vec2 => p[i] as Vec2;
  switch (mark.kind) {
    case "line":
    case "scale":
      return distance(at(0), at(1)) > 0 ? [] : [`The ${mark.kind}'s two points coincide: it has zero length.`];
    case "angle":
      return distance(at(0), at(1)) > 0 && distance(at(2), at(1)) > 0 ? [] : ["An arm of the angle has zero length."];
    case "plane":
      if (!planeIsProper(p)) return ["The plane's four points do not form a proper four-sided shape (three lie on one line)."];
      if (!isConvexRing(p)) {
        return ["The plane's corners must go round the rectangle in order (1 → 2 → 3 → 4, clockwise or anticlockwise); these cross over, as when corners are clicked in Z order."];
      }
      if (mark.widthMm !== undefined && mark.heightMm !== undefined && !keepsSideOfHorizon(p, mark.widthMm, mark.heightMm)) {
        return ["The plane's corners cannot be the image of that rectangle (its ground map passes through infinity between them): check the corners' order and its width (corner 1 → 2) and height (corner 2 → 3)."];
      }
      return [];
    default:
      return [];
  }
}

/**
 * A convex ring in drawing order: the cross products of consecutive edges all have one sign.
 * Corners clicked in Z order (1, 2, 4, 3) make a crossed shape whose products change sign.
 */
export function isConvexRing(p: readonly Vec2[]): boolean {
  const signs = p.map((_, i) => {
    const a = p[i] as Vec2, b = p[(i + 1) % p.length] as Vec2, c = p[(i + 2) % p.length] as Vec2;
    return Math.sign(cross(sub(b, a), sub(c, b)));
  });
  return signs.every((s) => s !== 0 && s === signs[0]);
}

/** The image → ground map's w keeps one sign over the four corners (the horizon does not cross the shape). */
function keepsSideOfHorizon(p: readonly Vec2[], widthMm: number, heightMm: number): boolean {
  const h = homographyFromPoints(p as unknown as Quad, rectangleCornersMm(widthMm, heightMm));
  const w = p.map(([x, y]) => Math.sign(h[2][0] * x + h[2][1] * y + h[2][2]));
  return w.every((s) => s !== 0 && s === w[0]);
}

/** No three of the four corners may be collinear, or the ground-plane map does not exist. */
function planeIsProper(p: readonly Vec2[]): boolean {
  const triples = [[0, 1, 2], [0, 1, 3], [0, 2, 3], [1, 2, 3]] as const;
  return triples.every(([a, b, c]) => {
    const pa = p[a] as Vec2, pb = p[b] as Vec2, pc = p[c] as Vec2;
    const area = Math.abs(cross(sub(pb, pa), sub(pc, pa)));
    const size = Math.max(distance(pa, pb), distance(pa, pc), distance(pb, pc)) ** 2;
    return area > 1e-9 * size && size > 0;
  });
}

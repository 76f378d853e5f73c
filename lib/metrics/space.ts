import { applyHomography, homographyFromPoints, keepsOrientation, rectangleCornersMm, type Quad } from "@/lib/geometry/homography";
import { mmPerPixel, BALL_DIAMETER_MM } from "@/lib/geometry/scale";
import type { Vec2 } from "@/lib/geometry/vector";
import type { StoredMark } from "@/lib/marks/types";
import { preferred, preferredSet } from "./pick";

/**
 * Where a view's points are measured. With a ground plane (overhead only) points are mapped onto
 * the ground in mm; otherwise they stay in pixels and a scale mark gives mm per pixel.
 */
export type MeasurementSpace = {
  map: (p: Vec2) => Vec2;
  /** mm per unit of the mapped space; null when no scale or plane is marked. */
  mmPerUnit: number | null;
  /** Marks every angle in this space depends on (the plane, if any). */
  angleMarkIds: string[];
  /** Marks every length depends on (plane or scales). */
  lengthMarkIds: string[];
};

export function measurementSpace(marks: readonly StoredMark[], usePlane: boolean): MeasurementSpace {
  const plane = usePlane ? preferred(marks.filter((m) => m.kind === "plane")) : undefined;
  if (plane && plane.widthMm && plane.heightMm && plane.points.length === 4) {
    return { map: groundMap(plane.points as unknown as Quad, plane.widthMm, plane.heightMm), mmPerUnit: 1, angleMarkIds: [plane.id], lengthMarkIds: [plane.id] };
  }
  // Several scale marks are averaged: each is an independent reading of the same mm/px. A hand
  // scale overrides the tracker's ball-diameter scale.
  const scales = preferredSet(marks.filter((m) => m.kind === "scale" && m.points.length === 2));
  const readings = scales.map((s) => mmPerPixel(s.points[0] as Vec2, s.points[1] as Vec2, s.lengthMm ?? BALL_DIAMETER_MM));
  return {
    map: (p) => p,
    mmPerUnit: readings.length > 0 ? readings.reduce((a, b) => a + b, 0) / readings.length : null,
    angleMarkIds: [],
    lengthMarkIds: scales.map((s) => s.id),
  };
}

/**
 * Image → ground (mm) through the plane's homography. If the drawn order makes the map flip
 * orientation, x is reflected afterwards so that signed angles keep their image sense.
 */
function groundMap(corners: Quad, widthMm: number, heightMm: number): (p: Vec2) => Vec2 {
  const h = homographyFromPoints(corners, rectangleCornersMm(widthMm, heightMm));
  const centre: Vec2 = [corners.reduce((s, c) => s + c[0], 0) / 4, corners.reduce((s, c) => s + c[1], 0) / 4];
  const flip = !keepsOrientation(h, centre);
  return (p) => {
    const q = applyHomography(h, p);
    return flip ? [-q[0], q[1]] : q;
  };
}

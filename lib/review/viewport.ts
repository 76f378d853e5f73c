// Screen ↔ image maths for the review stage, in one place. Image points are source-frame
// pixels (x right, y down); screen points are CSS pixels inside the stage. The map is
// screen = image · scale + offset, so every pointer position goes through `screenToImage`.
import type { Vec2 } from "@/lib/geometry/vector";

export type Viewport = { scale: number; x: number; y: number };
export type Size = { width: number; height: number };

export const MIN_ZOOM = 0.25;
export const MAX_ZOOM = 40;

export const imageToScreen = (vp: Viewport, p: Vec2): Vec2 => [p[0] * vp.scale + vp.x, p[1] * vp.scale + vp.y];
export const screenToImage = (vp: Viewport, p: Vec2): Vec2 => [(p[0] - vp.x) / vp.scale, (p[1] - vp.y) / vp.scale];

/** The whole image centred in the stage, as large as fits. */
export function fitViewport(image: Size, stage: Size): Viewport {
  if (image.width <= 0 || image.height <= 0 || stage.width <= 0 || stage.height <= 0) return { scale: 1, x: 0, y: 0 };
  const scale = Math.min(stage.width / image.width, stage.height / image.height);
  return { scale, x: (stage.width - image.width * scale) / 2, y: (stage.height - image.height * scale) / 2 };
}

/** Zoom by `factor` keeping the image point under `anchor` (a screen point) where it is. */
export function zoomAbout(vp: Viewport, anchor: Vec2, factor: number, fitScale = 1): Viewport {
  const scale = Math.min(Math.max(vp.scale * factor, fitScale * MIN_ZOOM), fitScale * MAX_ZOOM);
  const under = screenToImage(vp, anchor);
  return { scale, x: anchor[0] - under[0] * scale, y: anchor[1] - under[1] * scale };
}

export const panBy = (vp: Viewport, dx: number, dy: number): Viewport => ({ ...vp, x: vp.x + dx, y: vp.y + dy });

/** Two-finger pinch: zoom by the ratio of finger distances about the new midpoint, and follow the midpoint. */
export function pinch(vp: Viewport, before: [Vec2, Vec2], after: [Vec2, Vec2], fitScale = 1): Viewport {
  const mid = (a: Vec2, b: Vec2): Vec2 => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
  const dist = (a: Vec2, b: Vec2) => Math.hypot(a[0] - b[0], a[1] - b[1]);
  const m0 = mid(...before);
  const m1 = mid(...after);
  const d0 = dist(...before);
  const moved = panBy(vp, m1[0] - m0[0], m1[1] - m0[1]);
  return d0 > 0 ? zoomAbout(moved, m1, dist(...after) / d0, fitScale) : moved;
}

export const insideImage = (p: Vec2, image: Size): boolean => p[0] >= 0 && p[1] >= 0 && p[0] <= image.width && p[1] <= image.height;

// Plane vectors as [x, y] pairs in image order (x right, y down) unless a caller says otherwise.
export type Vec2 = readonly [number, number];

export const add = (a: Vec2, b: Vec2): Vec2 => [a[0] + b[0], a[1] + b[1]];
export const sub = (a: Vec2, b: Vec2): Vec2 => [a[0] - b[0], a[1] - b[1]];
export const scale = (a: Vec2, k: number): Vec2 => [a[0] * k, a[1] * k];
export const dot = (a: Vec2, b: Vec2): number => a[0] * b[0] + a[1] * b[1];
/** z-component of the 3-D cross product: positive when b is clockwise from a on a y-down image. */
export const cross = (a: Vec2, b: Vec2): number => a[0] * b[1] - a[1] * b[0];
export const length = (a: Vec2): number => Math.hypot(a[0], a[1]);
export const distance = (a: Vec2, b: Vec2): number => length(sub(a, b));
export const negate = (a: Vec2): Vec2 => [-a[0], -a[1]];

/** Unit vector along a; throws on a zero vector because no direction exists. */
export function normalize(a: Vec2): Vec2 {
  const n = length(a);
  if (!(n > 0) || !Number.isFinite(n)) throw new Error("cannot normalise a zero or non-finite vector");
  return [a[0] / n, a[1] / n];
}

export const isFiniteVec = (a: Vec2): boolean => Number.isFinite(a[0]) && Number.isFinite(a[1]);

import { GRAMS_PER_OUNCE } from "@/lib/physics/units";

// Swing weight on the 14-inch fulcrum scale: moment = Σ mass × (distance from grip end − 14 in)
// (common practice; clubmaking handbooks).
export const FULCRUM_IN = 14;
/** One swing-weight point ≈ 1.75 in·oz ≈ 50 g·in (common practice; clubmaking handbooks). */
export const IN_OZ_PER_POINT = 1.75;
/** Letter anchors A0 ≈ 161.0 in·oz and D0 ≈ 213.5 in·oz: from memory, weakly sourced; shown only as a label. */
export const A0_IN_OZ = 161.0;
export const D0_IN_OZ = 213.5;

export type Component = { name: string; massG: number; /** centre of mass, inches from the grip end */ positionIn: number };

export type SwingWeight = {
  momentInOz: number;
  /** Points above A0 on the 1.75 in·oz scale; differences between builds are the trustworthy part. */
  points: number;
  /** e.g. "D2.4" from the from-memory anchors; null outside A0–G9.9. */
  letterFromMemory: string | null;
};

/** Swing weight from components placed along the club (head, shaft, grip, …). */
export function swingWeightFromComponents(components: readonly Component[]): SwingWeight {
  if (components.length === 0) throw new Error("at least one component is needed");
  const momentGIn = components.reduce((s, c) => s + c.massG * (c.positionIn - FULCRUM_IN), 0);
  return fromMoment(momentGIn / GRAMS_PER_OUNCE);
}

/** Swing weight from the assembled club's total mass and balance point (inches from the grip end). */
export function swingWeightFromBalance(totalMassG: number, balancePointIn: number): SwingWeight {
  if (!(totalMassG > 0)) throw new Error("the total mass must be positive");
  return fromMoment((totalMassG / GRAMS_PER_OUNCE) * (balancePointIn - FULCRUM_IN));
}

/** Balance point (inches from the grip end) of components placed along the club. */
export function balancePointIn(components: readonly Component[]): number {
  const mass = components.reduce((s, c) => s + c.massG, 0);
  if (!(mass > 0)) throw new Error("the total mass must be positive");
  return components.reduce((s, c) => s + c.massG * c.positionIn, 0) / mass;
}

/** Change from build a to build b in swing-weight points (positive: b is heavier in the swing). */
export function swingWeightChangePoints(a: SwingWeight, b: SwingWeight): number {
  return (b.momentInOz - a.momentInOz) / IN_OZ_PER_POINT;
}

function fromMoment(momentInOz: number): SwingWeight {
  const points = (momentInOz - A0_IN_OZ) / IN_OZ_PER_POINT;
  return { momentInOz, points, letterFromMemory: letterFor(points) };
}

function letterFor(points: number): string | null {
  const tenths = Math.round(points * 10);
  if (tenths < 0 || tenths >= 700) return null;
  const letter = "ABCDEFG"[Math.floor(tenths / 100)] as string;
  return `${letter}${((tenths % 100) / 10).toFixed(1)}`;
}

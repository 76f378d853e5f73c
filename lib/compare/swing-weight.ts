import { swingWeightChangePoints, swingWeightFromBalance, swingWeightFromComponents, type SwingWeight } from "@/lib/equipment/swing-weight";

export type BuildMasses = {
  headMassG: number | null;
  gripMassG: number | null;
  shaftMassG: number | null;
  lengthIn: number | null;
  /** Balance point of the assembled putter, inches from the grip end. */
  balancePointIn: number | null;
};

export type BuildSwingWeight =
  | { ok: true; swingWeight: SwingWeight; method: "balance point" | "estimate"; note: string }
  | { ok: false; missing: string[] };

// Where a component's mass sits when no balance point is measured (an estimate, stated on screen):
// the head at the far end, the shaft's mass at its middle, the grip's about 5 in from the grip end.
const GRIP_CENTRE_IN = 5;

/** Swing weight on the 14-inch fulcrum scale from a build's masses, length and balance point. */
export function buildSwingWeight(b: BuildMasses): BuildSwingWeight {
  const missing = (["headMassG", "gripMassG", "shaftMassG"] as const).filter((k) => b[k] == null);
  if (missing.length === 0 && b.balancePointIn != null) {
    const total = b.headMassG! + b.gripMassG! + b.shaftMassG!;
    return { ok: true, swingWeight: swingWeightFromBalance(total, b.balancePointIn), method: "balance point", note: "From the total mass and the measured balance point." };
  }
  if (missing.length === 0 && b.lengthIn != null) {
    const length = b.lengthIn;
    const swingWeight = swingWeightFromComponents([
      { name: "head", massG: b.headMassG!, positionIn: length },
      { name: "shaft", massG: b.shaftMassG!, positionIn: length / 2 },
      { name: "grip", massG: b.gripMassG!, positionIn: GRIP_CENTRE_IN },
    ]);
    return { ok: true, swingWeight, method: "estimate", note: "Estimate: head mass at the end, shaft mass at its middle, grip mass 5 in from the end; measure the balance point for a true value." };
  }
  return { ok: false, missing: [...missing, ...(b.lengthIn == null && b.balancePointIn == null ? ["lengthIn or balancePointIn"] : [])] };
}

/** Change in points from build a to build b (computed), and what the trade's rules of thumb would say. */
export function swingWeightChange(a: BuildMasses, b: BuildMasses) {
  const sa = buildSwingWeight(a);
  const sb = buildSwingWeight(b);
  const computed = sa.ok && sb.ok ? swingWeightChangePoints(sa.swingWeight, sb.swingWeight) : null;
  return { computedPoints: computed, ruleOfThumbPoints: ruleOfThumbPoints(a, b) };
}

/**
 * Common practice (a rule of thumb, not a measurement): +2 g head ≈ +1 point, +½ in length ≈ +3
 * points, +5 g grip ≈ −1 point. Null when a needed value is missing on either build.
 */
export function ruleOfThumbPoints(a: BuildMasses, b: BuildMasses): number | null {
  const d = (k: "headMassG" | "lengthIn" | "gripMassG") => (a[k] == null || b[k] == null ? null : b[k]! - a[k]!);
  const head = d("headMassG"), length = d("lengthIn"), grip = d("gripMassG");
  if (head === null || length === null || grip === null) return null;
  return head / 2 + (length / 0.5) * 3 - grip / 5;
}

export const RULES_OF_THUMB = [
  "+2 g head weight ≈ +1 point",
  "+½ in length ≈ +3 points",
  "+5 g grip weight ≈ −1 point",
] as const;

import { equipmentWarnings, type RuleWarning } from "@/lib/equipment/rules";
import { buildSwingWeight, type BuildMasses } from "./swing-weight";

export type BuildChecks = {
  warnings: RuleWarning[];
  swingWeight: { points: number; letterFromMemory: string | null; momentInOz: number; method: string; note: string } | null;
};

/** What the screens and the API show beside a build: equipment-rule warnings and its swing weight. */
export function withChecks<B extends BuildMasses & { loftDeg: number | null; lieDeg: number | null }>(build: B): B & BuildChecks {
  const sw = buildSwingWeight(build);
  return {
    ...build,
    warnings: equipmentWarnings(build),
    swingWeight: sw.ok ? { points: sw.swingWeight.points, letterFromMemory: sw.swingWeight.letterFromMemory, momentInOz: sw.swingWeight.momentInOz, method: sw.method, note: sw.note } : null,
  };
}

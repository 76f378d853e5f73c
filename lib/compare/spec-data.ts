import { equipmentWarnings, type RuleWarning } from "@/lib/equipment/rules";
import type { BuildComparison, KeyStats } from "./compare";
import { buildSwingWeight } from "./swing-weight";

export type SpecBuild = {
  label: string; headModel: string; neckStyle: string; lengthIn: number | null; lieDeg: number | null; loftDeg: number | null;
  offsetIn: number | null; toeHang: string; headMassG: number | null; gripName: string; gripMassG: number | null;
  shaftMassG: number | null; balancePointIn: number | null; alignmentAid: string; notes: string;
  // Absent in specs issued before the equipment-rule fields were recorded.
  designShaftLeanDeg?: number | null; gripMaxWidthIn?: number | null; gripCount?: number; gripsCircular?: boolean | null; gripGapIn?: number | null;
};

export type BuildShop = {
  head: string; neck: string; lengthIn: number | null; lieDeg: number | null; loftDeg: number | null; grip: string;
  gripOrientation: string; headMassG: number | null; swingWeight: string; finishNotes: string;
};

export type SpecData = {
  version: 1;
  studioName: string;
  golfer: { name: string; handedness: "right" | "left" };
  fitting: { id: string; date: string; notes: string };
  issuedBy: string;
  issuedAt: string;
  build: SpecBuild;
  buildShop: BuildShop;
  swingWeight: { points: number; letterFromMemory: string | null; method: string } | null;
  /** meanUncertainty (standard error of the mean) and noise (a putt's own ±): absent on specs issued before them. */
  keyMeasurements: (Pick<KeyStats, "key" | "label" | "unit" | "window"> & KeyStats["summary"] & Partial<Pick<KeyStats, "meanUncertainty" | "noise">>)[];
  makeChances: { distanceFt: number; probability: number | null }[];
  notes: string;
  warnings: RuleWarning[];
};

/** The measurements a spec carries, when the build has them. */
export const SPEC_KEYS = ["face_angle_impact", "path", "start_direction", "aim", "shaft_lean_impact", "launch_angle", "dynamic_loft", "sole_tilt_impact", "roll_ratio", "skid_distance"];

export type FreezeInput = {
  studioName: string;
  golfer: { name: string; handedness: "right" | "left" };
  fitting: { id: string; scheduledAt: Date; notes: string };
  build: SpecBuild;
  comparison: BuildComparison | null;
  notes: string;
  buildShop: Partial<BuildShop>;
  issuedBy: string;
  issuedAt: Date;
};

/**
 * The spec as issued: a deep, self-contained copy (no references into the inputs), so that later
 * changes to the build, the fitting or the measurements never change a spec. Build-shop fields left
 * out are taken from the build.
 */
export function freezeSpec(input: FreezeInput): SpecData {
  const b = input.build;
  const sw = buildSwingWeight(b);
  const swingWeight = sw.ok ? { points: sw.swingWeight.points, letterFromMemory: sw.swingWeight.letterFromMemory, method: sw.method } : null;
  const defaults: BuildShop = {
    head: b.headModel, neck: b.neckStyle, lengthIn: b.lengthIn, lieDeg: b.lieDeg, loftDeg: b.loftDeg, grip: b.gripName,
    gripOrientation: "", headMassG: b.headMassG, swingWeight: swingWeight?.letterFromMemory ?? "", finishNotes: "",
  };
  const buildShop = { ...defaults, ...Object.fromEntries(Object.entries(input.buildShop).filter(([, v]) => v !== undefined)) } as BuildShop;
  const stats = input.comparison?.stats ?? [];
  const data: SpecData = {
    version: 1,
    studioName: input.studioName,
    golfer: { ...input.golfer },
    fitting: { id: input.fitting.id, date: input.fitting.scheduledAt.toISOString(), notes: input.fitting.notes },
    issuedBy: input.issuedBy,
    issuedAt: input.issuedAt.toISOString(),
    build: { ...b },
    buildShop,
    swingWeight,
    keyMeasurements: SPEC_KEYS.flatMap((key) => {
      const s = stats.find((x) => x.key === key);
      return s ? [{ key: s.key, label: s.label, unit: s.unit, window: s.window, ...s.summary, meanUncertainty: s.meanUncertainty, noise: s.noise }] : [];
    }),
    makeChances: (input.comparison?.make ?? []).map((m) => ({ distanceFt: m.distanceFt, probability: m.probability })),
    notes: input.notes,
    warnings: equipmentWarnings({
      lengthIn: buildShop.lengthIn, lieDeg: buildShop.lieDeg, loftDeg: buildShop.loftDeg, designShaftLeanDeg: b.designShaftLeanDeg,
      gripMaxWidthIn: b.gripMaxWidthIn, gripCount: b.gripCount, gripsCircular: b.gripsCircular, gripGapIn: b.gripGapIn,
    }),
  };
  return structuredClone(data);
}

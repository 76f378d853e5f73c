// The build fields as the forms and the board show them: label, unit, input step or choices.
export type BuildFieldKey =
  | "headModel" | "neckStyle" | "lengthIn" | "lieDeg" | "loftDeg" | "designShaftLeanDeg" | "offsetIn" | "toeHang" | "headMassG"
  | "gripName" | "gripMassG" | "gripMaxWidthIn" | "gripCount" | "gripsCircular" | "gripGapIn"
  | "shaftMassG" | "balancePointIn" | "alignmentAid";

type Choice = { value: string; label: string; api: number | boolean | null };

export type BuildFieldInfo = {
  key: BuildFieldKey;
  label: string;
  unit?: string;
  step?: number;
  choices?: readonly Choice[];
  hint?: string;
  /** Read only for a putter with two grips (Equipment Rules 2019, Part 2, 3c). */
  twoGripsOnly?: boolean;
};

export const BUILD_FIELDS: readonly BuildFieldInfo[] = [
  { key: "headModel", label: "Head" },
  { key: "neckStyle", label: "Neck" },
  { key: "lengthIn", label: "Length", unit: "in", step: 0.25 },
  { key: "lieDeg", label: "Lie", unit: "°", step: 0.5 },
  { key: "loftDeg", label: "Loft", unit: "°", step: 0.5 },
  { key: "designShaftLeanDeg", label: "Designed shaft lean", unit: "°", step: 0.5, hint: "At address along the line of play; + toward the target, − away" },
  { key: "offsetIn", label: "Offset", unit: "in", step: 0.05 },
  { key: "toeHang", label: "Toe hang" },
  { key: "headMassG", label: "Head mass", unit: "g", step: 1 },
  { key: "gripName", label: "Grip" },
  { key: "gripMassG", label: "Grip mass", unit: "g", step: 1 },
  { key: "gripMaxWidthIn", label: "Grip width", unit: "in", step: 0.01, hint: "Largest cross-section dimension, in any direction" },
  { key: "gripCount", label: "Grips", choices: [{ value: "1", label: "One", api: 1 }, { value: "2", label: "Two", api: 2 }] },
  {
    key: "gripsCircular", label: "Both grips round", twoGripsOnly: true,
    choices: [{ value: "", label: "Not recorded", api: null }, { value: "yes", label: "Yes", api: true }, { value: "no", label: "No", api: false }],
  },
  { key: "gripGapIn", label: "Gap between grips", unit: "in", step: 0.01, twoGripsOnly: true },
  { key: "shaftMassG", label: "Shaft mass", unit: "g", step: 1 },
  { key: "balancePointIn", label: "Balance point (from grip end)", unit: "in", step: 0.25 },
  { key: "alignmentAid", label: "Alignment aid" },
];

export const isNumericField = (f: BuildFieldInfo) => f.step !== undefined;

/** What a form's raw string means for the API: a number, a choice's value, or text. */
export function fieldValue(f: BuildFieldInfo, raw: string): string | number | boolean | null | undefined {
  if (f.choices) return f.choices.find((c) => c.value === raw)?.api;
  if (isNumericField(f)) return raw === "" ? null : Number(raw);
  return raw;
}

/** A stored value as the board shows it: the choice's label, or the value and its unit; "—" when not recorded. */
export function fieldText(f: BuildFieldInfo, v: unknown): string {
  if (f.choices) return f.choices.find((c) => c.api === (v ?? null))?.label ?? "—";
  if (v === null || v === undefined || v === "") return "—";
  if (f.key === "designShaftLeanDeg" && typeof v === "number" && v !== 0) return `${Math.abs(v)}° ${v > 0 ? "forward" : "back"}`;
  return `${v}${f.unit ? (f.unit === "°" ? "°" : ` ${f.unit}`) : ""}`;
}

/** The fields that apply to a build with this many grips. */
export const fieldsForGrips = (gripCount: unknown) => BUILD_FIELDS.filter((f) => !f.twoGripsOnly || gripCount === 2);

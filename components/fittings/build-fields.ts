// The build fields as the forms and the board show them: label, unit and input step.
export type BuildFieldKey =
  | "headModel" | "neckStyle" | "lengthIn" | "lieDeg" | "loftDeg" | "offsetIn" | "toeHang" | "headMassG"
  | "gripName" | "gripMassG" | "shaftMassG" | "balancePointIn" | "alignmentAid";

export type BuildFieldInfo = { key: BuildFieldKey; label: string; unit?: string; step?: number };

export const BUILD_FIELDS: readonly BuildFieldInfo[] = [
  { key: "headModel", label: "Head" },
  { key: "neckStyle", label: "Neck" },
  { key: "lengthIn", label: "Length", unit: "in", step: 0.25 },
  { key: "lieDeg", label: "Lie", unit: "°", step: 0.5 },
  { key: "loftDeg", label: "Loft", unit: "°", step: 0.5 },
  { key: "offsetIn", label: "Offset", unit: "in", step: 0.05 },
  { key: "toeHang", label: "Toe hang" },
  { key: "headMassG", label: "Head mass", unit: "g", step: 1 },
  { key: "gripName", label: "Grip" },
  { key: "gripMassG", label: "Grip mass", unit: "g", step: 1 },
  { key: "shaftMassG", label: "Shaft mass", unit: "g", step: 1 },
  { key: "balancePointIn", label: "Balance point (from grip end)", unit: "in", step: 0.25 },
  { key: "alignmentAid", label: "Alignment aid" },
];

export const isNumericField = (f: BuildFieldInfo) => f.step !== undefined;

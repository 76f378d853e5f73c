import type { Comparison } from "@/lib/compare/compare";

export type ComparisonReply = Comparison & { windows: Record<string, { min: number; max: number }>; units: "ft" | "m"; speedUnit?: "m/s" | "ft/s" | "mph"; handedness?: "right" | "left" };

// Series styles: colour and marker shape together, so colour is never the only cue.
export const SERIES = [
  { color: "#0E1A24", shape: "circle" },
  { color: "#C23A1C", shape: "square" },
  { color: "#2F6F9F", shape: "triangle" },
  { color: "#5E7A2E", shape: "diamond" },
  { color: "#7A4E93", shape: "star" },
  { color: "#8A6A1F", shape: "cross" },
] as const;
export const seriesOf = (i: number) => SERIES[i % SERIES.length]!;

import type { View } from "@/lib/marks/types";
import type { Handedness } from "./types";

export type MetricDefinition = {
  key: string;
  label: string;
  unit: string;
  /** Words for the sign, for a right-handed golfer; null when the number has no sign. */
  signWords: { positive: string; negative: string } | null;
};

const def = (key: string, label: string, unit: string, positive?: string, negative?: string): MetricDefinition => ({
  key,
  label,
  unit,
  signWords: positive && negative ? { positive, negative } : null,
});

/** Keys each view knows, in the order the API lists them (docs/measurements.md). */
export const METRICS_BY_VIEW: Record<View, readonly MetricDefinition[]> = {
  overhead: [
    def("aim", "Aim at address", "deg", "open", "closed"),
    def("face_angle_impact", "Face angle at impact", "deg", "open", "closed"),
    def("path", "Path", "deg", "in-to-out", "out-to-in"),
    def("face_to_path", "Face to path", "deg", "open to path", "closed to path"),
    def("face_rotation_rate", "Face rotation rate", "deg/s", "opening", "closing"),
    def("twist", "Twist through impact", "deg", "opened by the strike", "closed by the strike"),
    def("start_direction", "Start direction", "deg", "right of target", "left of target"),
    def("ball_speed", "Ball speed", "m/s"),
  ],
  "face-on": [
    def("shaft_lean_address", "Shaft lean at address", "deg", "forward", "back"),
    def("shaft_lean_impact", "Shaft lean at impact", "deg", "forward", "back"),
    def("attack_angle", "Attack angle", "deg", "rising", "descending"),
    def("dynamic_loft", "Dynamic loft", "deg"),
    def("launch_angle", "Launch angle", "deg", "upward", "downward"),
    def("ball_speed", "Ball speed", "m/s"),
    def("spin_rpm", "Spin", "rpm", "topspin", "backspin"),
    def("roll_ratio", "Roll ratio", "ratio"),
    def("skid_distance", "Skid distance", "m"),
  ],
  "down-the-line": [
    def("sole_tilt_impact", "Sole tilt at impact", "deg", "heel up", "toe up"),
    def("lie_change", "Lie change suggested", "deg", "more upright", "flatter"),
  ],
};

/** Sign words for a golfer: only start direction names a side of the target, which mirrors for a left-hander. */
export function signWordsFor(view: View, key: string, handedness: Handedness): MetricDefinition["signWords"] {
  const words = METRICS_BY_VIEW[view].find((d) => d.key === key)?.signWords ?? null;
  if (key === "start_direction" && handedness === "left") return { positive: "left of target", negative: "right of target" };
  return words;
}

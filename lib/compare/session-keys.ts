import type { View } from "@/lib/marks/types";

/**
 * The numbers a session shows for each putt as it arrives, per view: the ones a fitter reads between
 * putts (face, path and start line overhead; launch and roll face-on; sole tilt down the line).
 */
export const SESSION_KEYS: Record<View, readonly string[]> = {
  overhead: ["face_angle_impact", "path", "start_direction", "ball_speed"],
  "face-on": ["launch_angle", "spin_rpm", "roll_ratio", "ball_speed"],
  "down-the-line": ["sole_tilt_impact"],
};

/** The running summaries a session shows per build, in this order. */
export const SESSION_SUMMARY_KEYS = ["face_angle_impact", "path", "start_direction", "launch_angle", "sole_tilt_impact"] as const;

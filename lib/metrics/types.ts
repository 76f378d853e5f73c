import type { StoredMark, View } from "@/lib/marks/types";

export type Handedness = "right" | "left";

export type Moments = {
  address?: number | null;
  takeaway?: number | null;
  top?: number | null;
  impact?: number | null;
  finish?: number | null;
};

export type ClipContext = {
  view: View;
  width: number;
  height: number;
  frameCount: number;
  /** Frames per second of the camera (never the file's playback rate). */
  captureFps: number;
  handedness: Handedness;
  mirrored: boolean;
  moments: Moments;
  staticLoftDeg?: number | null;
  /** Sliding friction ball–green, a studio setting. */
  frictionMu: number;
};

/** Which marks a value was computed from: hand marks only, the tracker's proposals only, or both. */
export type MeasurementMethod = "marked" | "tracked" | "mixed";

// Values keep full precision; rounding to 0.1° is for display only, and the API rounds nothing.
// `uncertainty` is one standard error in the value's unit (null when it could not be estimated).
export type Measurement =
  | { key: string; value: number; uncertainty: number | null; unit: string; frames: number[]; markIds: string[]; method: MeasurementMethod }
  | { key: string; value: null; unit: string; needs: string[] };

export type { StoredMark };

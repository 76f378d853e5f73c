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

// Values keep full precision; rounding to 0.1° is for display only, and the API rounds nothing.
export type Measurement =
  | { key: string; value: number; unit: string; frames: number[]; markIds: string[]; method: "derived" }
  | { key: string; value: null; unit: string; needs: string[] };

export type { StoredMark };

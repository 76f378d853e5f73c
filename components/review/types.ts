import type { View } from "@/lib/marks/types";
import type { Handedness } from "@/lib/metrics/types";
import type { Window } from "@/lib/review/readout";

export type MomentName = "address" | "takeaway" | "top" | "impact" | "finish";
export type ReviewMoments = Record<MomentName, number | null>;

/** What the review page hands the browser: plain data only. */
export type ReviewClip = {
  id: string;
  view: View;
  state: string;
  failureReason: string | null;
  width: number;
  height: number;
  frameCount: number;
  captureFps: number;
  mirrored: boolean;
  handedness: Handedness;
  motionSignal: number[] | null;
  suggestedImpactFrame: number | null;
  moments: ReviewMoments;
  windows: Record<string, Window>;
};

export type MeasurementEntry = {
  key: string;
  value: number | null;
  unit: string;
  frames?: number[];
  markIds?: string[];
  method?: string;
  needs?: string[];
  window?: Window | null;
};

export type MeasurementsReply = { measurements: MeasurementEntry[]; windows?: Record<string, Window> };

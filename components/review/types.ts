import type { View } from "@/lib/marks/types";
import type { Handedness } from "@/lib/metrics/types";
import type { MeasurementMethod, Window } from "@/lib/review/readout";
import type { ReviewTracking } from "@/lib/review/tracking";

export type { ReviewTracking };

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
  /** Optional until every page passes them: tracking is on unless turned off. */
  trackingEnabled?: boolean;
  tracking?: ReviewTracking | null;
};

export type MeasurementEntry = {
  key: string;
  value: number | null;
  unit: string;
  /** One standard error, same unit; null (or absent, from an older server) when unknown. */
  uncertainty?: number | null;
  frames?: number[];
  markIds?: string[];
  method?: MeasurementMethod | string;
  needs?: string[];
  window?: Window | null;
};

export type MeasurementsReply = { measurements: MeasurementEntry[]; windows?: Record<string, Window> };

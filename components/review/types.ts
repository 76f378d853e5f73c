import type { View } from "@/lib/marks/types";
import type { Handedness } from "@/lib/metrics/types";
import type { MeasurementMethod, Window } from "@/lib/review/readout";
import type { UnitPrefs } from "@/lib/format/units";
import type { ReviewMark } from "@/lib/review/marks";
import type { PuttRef } from "@/lib/review/putts";
import type { ReviewTracking } from "@/lib/review/tracking";

export type { ReviewTracking };

export type MomentName = "address" | "takeaway" | "top" | "impact" | "finish";
export type ReviewMoments = Record<MomentName, number | null>;

/** Where the clip sits in its fitting (header, previous/next putt, reference marks to carry over). */
export type ReviewPlace = {
  golferName: string;
  fittingId: string;
  buildId: string;
  buildLabel: string;
  putt: number | null;
  previous: PuttRef | null;
  next: PuttRef | null;
  carry: { clipId: string; label: string; marks: ReviewMark[] } | null;
};

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
  place?: ReviewPlace;
  /** The studio's units for speeds and distances (values stay SI). */
  unitPrefs?: UnitPrefs;
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

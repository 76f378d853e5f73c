// The tracker's output (contract of issue 12): proposals are marks in source-frame pixels
// (x right, y down) with one standard deviation per point, and a summary of what was found.
import type { Vec2 } from "@/lib/geometry/vector";
import type { MarkRole } from "@/lib/marks/types";

export type Proposal = { frame: number; kind: "point" | "line" | "scale"; role: MarkRole; points: Vec2[]; precisionPx: number; lengthMm?: number };

export type TrackingSummary = {
  version: 1;
  ballFound: boolean;
  ball: { x: number; y: number; diameterPx: number } | null;
  addressFrame: number | null;
  impactFrame: number | null;
  impactSource: "ball" | "motion" | null;
  ballTrackFrames: number;
  clubheadFrames: number;
  markerFrames: number;
  seconds: number;
  notes: string[];
};

export type TrackingResult = { summary: TrackingSummary; proposals: Proposal[] };

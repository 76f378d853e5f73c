// The tracker's summary as the review screen reads it, in one quiet line, and whether there is
// anything left to accept.

/**
 * What the screen reads of the worker's tracking summary (lib/tracking/types.ts), plus
 * `acceptedAt` once the fitter accepted it. Read loosely: an older summary may lack a field.
 */
export type ReviewTracking = {
  ballFound?: boolean;
  impactFrame?: number | null;
  impactSource?: "ball" | "motion" | null;
  addressFrame?: number | null;
  notes?: string[];
  acceptedAt?: string;
};

/** "Ball found · impact from the ball at frame 212 · accepted"; what is true when there is no summary. */
export function trackingLine(enabled: boolean, tracking: ReviewTracking | null | undefined): string {
  if (!enabled) return "Tracking is off: only hand marks are measured.";
  if (!tracking) return "Not tracked yet.";
  const ball = tracking.ballFound ? "Ball found" : "No ball found";
  const at = tracking.impactFrame != null ? ` at frame ${tracking.impactFrame}` : "";
  const impact =
    tracking.impactSource === "ball" ? `impact from the ball${at}` : tracking.impactSource === "motion" ? `impact from motion${at}` : "no impact found";
  return `${ball} · ${impact}${tracking.acceptedAt ? " · accepted" : ""}`;
}

/** Proposals wait for the fitter while tracking is on, has run, and has not been accepted. */
export const canAccept = (enabled: boolean, tracking: ReviewTracking | null | undefined): boolean => enabled && !!tracking && !tracking.acceptedAt;

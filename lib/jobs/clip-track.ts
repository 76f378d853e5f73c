// The tracking re-run job (after the fitter changes the capture rate or the moments): its queue
// name, payload and retry policy, shared by the web process (which sends it) and the worker.
import { z } from "zod";

export const CLIP_TRACK_QUEUE = "clip-track";
export const clipTrackPayload = z.object({ clipId: z.string().uuid() });
export type ClipTrackPayload = z.infer<typeof clipTrackPayload>;

/** Two tries: a re-run that fails twice leaves the previous proposals in place. */
export function clipTrackPolicy(expireInSeconds: number) {
  return { retryLimit: 1, retryDelay: 2, retryBackoff: true, expireInSeconds } as const;
}

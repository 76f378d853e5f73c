// The clip-processing job: its queue name, payload and retry policy, shared by the web
// process (which sends it) and the worker (which runs it).
import { z } from "zod";

export const CLIP_PROCESS_QUEUE = "clip-process";
export const clipProcessPayload = z.object({ clipId: z.string().uuid() });
export type ClipProcessPayload = z.infer<typeof clipProcessPayload>;

/** Three tries in all, with growing delays; a job still active past its expiry is retried. */
export function clipProcessPolicy(expireInSeconds: number) {
  return { retryLimit: 2, retryDelay: 2, retryBackoff: true, expireInSeconds } as const;
}

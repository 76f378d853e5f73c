import "server-only";
import type { SignedInActor } from "../access";
import { ApiError } from "../http/errors";
import { clipKeys, presignDownload } from "../storage";
import { loadClip } from "./clip-access";

export const MEDIA_KINDS = ["poster", "strip", "proxy"] as const;
export type MediaKind = (typeof MEDIA_KINDS)[number];
/** Presigned links live 5 minutes; browsers may reuse the redirect for 4. */
export const LINK_SECONDS = 300;

/**
 * A short-lived link to frame n. While the clip is processing the frames around the
 * suggested impact are written first, so a frame may be asked for before the clip is ready.
 */
export async function frameLink(actor: SignedInActor, clipId: string, frame: number) {
  const { clip } = await loadClip(actor, clipId);
  if (clip.state !== "ready" && clip.state !== "processing") throw new ApiError("conflict", `The clip is ${clip.state.replace("_", " ")}; its frames are not there yet`);
  if (clip.frameCount !== null && frame >= clip.frameCount) throw new ApiError("not_found", `The clip has ${clip.frameCount} frames (0 to ${clip.frameCount - 1})`);
  return presignDownload(clipKeys(clip.studioId, clip.id).frame(frame), LINK_SECONDS);
}

export async function mediaLink(actor: SignedInActor, clipId: string, kind: MediaKind) {
  const { clip } = await loadClip(actor, clipId);
  if (clip.state !== "ready") throw new ApiError("conflict", `The clip is ${clip.state.replace("_", " ")}; its ${kind} is not there yet`);
  return presignDownload(clipKeys(clip.studioId, clip.id)[kind], LINK_SECONDS);
}

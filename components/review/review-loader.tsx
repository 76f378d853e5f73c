"use client";

import Link from "next/link";
import type { CommentList, Viewer } from "@/components/comments/comment-threads";
import { ReviewScreen } from "./review-screen";
import type { ReviewClip } from "./types";

const STATE_WORDS: Record<string, string> = {
  awaiting_upload: "is waiting for its upload",
  queued: "is queued for processing",
  processing: "is being processed",
  failed: "could not be processed",
};

/** The review screen once the clip's frames exist; a plain message before that. */
export function ReviewLoader({ clip, comments, viewer }: { clip: ReviewClip; comments?: CommentList; viewer?: Viewer }) {
  if (clip.state === "ready" && clip.frameCount > 0 && clip.width > 0) return <ReviewScreen key={clip.id} clip={clip} comments={comments} viewer={viewer} />;
  return (
    <section className="card max-w-xl">
      <h1 className="text-title">Clip review</h1>
      <p className="mt-2">This clip {STATE_WORDS[clip.state] ?? "is not ready"}.{clip.failureReason ? ` ${clip.failureReason}` : ""}</p>
      <Link href={clip.place ? `/studio/fittings/${clip.place.fittingId}` : "/studio"} className="btn-quiet mt-4">{clip.place ? "Back to the fitting" : "Back to the studio"}</Link>
    </section>
  );
}

"use client";
// The phone clip page's interactive part: the player, the comment timeline and the threads,
// sharing the current frame (comments are written at it; markers and threads seek to theirs).
import { useQuery } from "@tanstack/react-query";
import { useCallback, useRef, useState } from "react";
import { CommentThreads, commentsKey, type CommentList, type Viewer } from "@/components/comments/comment-threads";
import { CommentTimeline } from "@/components/comments/comment-timeline";
import { apiFetch } from "@/lib/client/api";
import { ClipPlayer, type PlayerClip, type PlayerHandle } from "./clip-player";
import type { PlayerMark } from "./draw-marks";

type Props = { clip: PlayerClip; marks: PlayerMark[]; comments: CommentList; viewer: Viewer; children?: React.ReactNode };

export function PhoneClipView({ clip, marks, comments, viewer, children }: Props) {
  const player = useRef<PlayerHandle>(null);
  const [frame, setFrame] = useState(0);
  const seek = useCallback((n: number) => player.current?.seek(n), []);
  const { data = comments } = useQuery({ queryKey: commentsKey(clip.id), queryFn: () => apiFetch<CommentList>(`/api/clips/${clip.id}/comments`), initialData: comments });
  return (
    <div className="flex flex-col gap-4">
      <ClipPlayer ref={player} clip={clip} marks={marks} onFrame={setFrame} />
      <CommentTimeline frameCount={clip.frameCount} frame={frame} markers={data.threads.map((t) => ({ id: t.id, frame: t.frame }))} moments={clip.moments} onSeek={seek} />
      {children}
      <CommentThreads clipId={clip.id} initial={comments} viewer={viewer} frame={frame} onSeek={seek} />
    </div>
  );
}

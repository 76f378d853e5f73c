"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { apiFetch } from "@/lib/client/api";
import { puttNumbers } from "@/lib/review/putts";

type ClipSummary = { id: string; buildId: string; strokeId: string | null; view: "overhead" | "face-on" | "down-the-line"; createdAt: string; state: "awaiting_upload" | "queued" | "processing" | "ready" | "failed"; progress: number; failureReason: string | null; originalName: string; frameCount: number | null; captureFps: number };

const stateWords: Record<ClipSummary["state"], string> = { awaiting_upload: "awaiting upload", queued: "queued", processing: "processing", ready: "ready", failed: "failed" };
const settled = (c: ClipSummary) => c.state === "ready" || c.state === "failed";

/** The fitting's clips with live states: polls while any clip is still on its way. */
export function ClipList({ fittingId, builds = [] }: { fittingId: string; builds?: { id: string; label: string }[] }) {
  const { data, error } = useQuery({
    queryKey: ["clips", fittingId],
    queryFn: () => apiFetch<{ clips: ClipSummary[] }>(`/api/clips?fittingId=${fittingId}`),
    refetchInterval: (query) => (query.state.data?.clips.every(settled) ?? true ? false : 1000),
  });
  if (error) return <p className="field-error" role="alert">{error.message}</p>;
  if (!data) return <p className="text-slate-600">Loading clips…</p>;
  if (data.clips.length === 0) return <p className="text-slate-600">No clips yet.</p>;
  const putt = puttNumbers(data.clips);
  const buildLabel = new Map(builds.map((b) => [b.id, b.label]));
  return (
    <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3" aria-label="Clips">
      {data.clips.map((clip) => (
        <li key={clip.id} className="card flex flex-col gap-2 p-3" data-clip-state={clip.state} data-clip-name={clip.originalName}>
          {clip.state === "ready" ? (
            // eslint-disable-next-line @next/next/no-img-element -- a presigned redirect, not an optimisable asset
            <img src={`/api/clips/${clip.id}/media/poster`} alt={`Poster of ${clip.originalName}`} className="aspect-video w-full rounded bg-ink object-contain" />
          ) : (
            <div className="flex aspect-video w-full items-center justify-center rounded bg-ink-800 text-label text-slate-300">{stateWords[clip.state]}</div>
          )}
          <div className="flex items-baseline justify-between gap-2">
            <span className="truncate font-medium" data-testid="clip-place">{buildLabel.get(clip.buildId) ?? "Build"} · putt {putt.get(clip.id)}</span>
            <span className="text-label text-slate-600">{clip.view}</span>
          </div>
          <span className="truncate text-label text-slate-600">{clip.originalName}</span>
          <p className="text-label text-slate-600" aria-live="polite">
            <span className="clip-state">{stateWords[clip.state]}</span>
            {clip.state === "processing" && <span className="num"> · {clip.progress}%</span>}
            {clip.state === "ready" && clip.frameCount !== null && <span className="num"> · {clip.frameCount} frames at {clip.captureFps} fps</span>}
          </p>
          {clip.state === "processing" && <progress className="h-1 w-full" max={100} value={clip.progress} aria-label="Processing" />}
          {clip.state === "failed" && <p className="field-error">{clip.failureReason}</p>}
          {clip.state === "ready" && <Link className="btn-quiet" href={`/studio/clips/${clip.id}`}>Review and mark</Link>}
          {clip.strokeId && <Link className="text-label underline" href={`/studio/strokes/${clip.strokeId}`}>All views of this stroke</Link>}
        </li>
      ))}
    </ul>
  );
}

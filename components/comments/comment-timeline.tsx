"use client";
// The clip's timeline: a scrubber over the source frames with a marker per comment thread
// and pins for address and impact. A marker jumps to its thread's frame.
type Props = { frameCount: number; frame: number; markers: { id: string; frame: number }[]; moments: { address: number | null; impact: number | null }; onSeek: (frame: number) => void };

export function CommentTimeline({ frameCount, frame, markers, moments, onSeek }: Props) {
  const pct = (n: number) => `${(n / Math.max(frameCount - 1, 1)) * 100}%`;
  return (
    <div className="flex flex-col gap-1">
      <div className="relative h-11" aria-label="Comments on the timeline" role="group">
        {[["A", moments.address], ["I", moments.impact]].map(([letter, n]) => n === null ? null : (
          <span key={String(letter)} className="absolute top-0 h-3 w-px bg-slate-500" style={{ left: pct(n as number) }} aria-hidden>
            <span className="absolute -top-0.5 left-1 text-[10px] text-slate-600">{letter}</span>
          </span>
        ))}
        {markers.map((m) => (
          <button
            key={m.id}
            type="button"
            className="absolute top-0 flex h-11 w-11 -translate-x-1/2 items-end justify-center"
            style={{ left: pct(m.frame) }}
            onClick={() => onSeek(m.frame)}
            aria-label={`Comment at frame ${m.frame}`}
            data-testid="comment-marker"
          >
            <span className="mb-1 block h-4 w-2.5 rounded-sm bg-signal-dark" />
          </button>
        ))}
      </div>
      <input
        type="range"
        min={0}
        max={Math.max(frameCount - 1, 0)}
        value={frame}
        onChange={(e) => onSeek(Number(e.target.value))}
        className="h-11 w-full accent-signal-dark"
        aria-label="Frame"
      />
    </div>
  );
}

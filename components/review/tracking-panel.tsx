import { canAccept, trackingLine } from "@/lib/review/tracking";
import type { useTracking } from "./use-tracking";

type Props = { tracking: ReturnType<typeof useTracking>; proposals: number };

/** The clip's tracking in the readout column: the switch, one quiet line of what it found, accept and re-run. */
export function TrackingPanel({ tracking: t, proposals }: Props) {
  const acceptable = canAccept(t.enabled, t.tracking);
  return (
    <section aria-labelledby="tracking-heading" className="flex flex-col gap-2 border-b border-ink-700 p-4">
      <div className="flex items-center justify-between gap-3">
        <h2 id="tracking-heading" className="text-label font-medium uppercase text-slate-300">Tracking</h2>
        <label className="flex items-center gap-2 text-label text-slate-200">
          <input type="checkbox" role="switch" aria-label="Tracking on this clip" className="h-4 w-4 accent-signal" checked={t.enabled} disabled={t.busy !== null}
            onChange={(e) => t.toggle(e.target.checked)} aria-describedby="tracking-line" />
          {t.enabled ? "On" : "Off"}
        </label>
      </div>
      <p id="tracking-line" className="text-label text-slate-400" data-testid="tracking-line" aria-live="polite">
        {t.busy === "run" ? "Tracking again…" : trackingLine(t.enabled, t.tracking)}
        {acceptable && proposals > 0 ? ` · ${proposals} proposed mark${proposals === 1 ? "" : "s"}` : ""}
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="button" className="rounded bg-signal-dark px-3 py-1 text-label text-white disabled:bg-transparent disabled:text-slate-400 disabled:ring-1 disabled:ring-ink-600"
          disabled={!acceptable || t.busy !== null} onClick={t.accept} title="T">
          Accept tracked marks <span className="font-mono opacity-80">(T)</span>
        </button>
        <button type="button" className="rounded border border-ink-600 px-3 py-1 text-label text-chalk disabled:opacity-40" disabled={!t.enabled || t.busy !== null} onClick={t.rerun}>
          Run tracking again
        </button>
      </div>
    </section>
  );
}

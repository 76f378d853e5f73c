import { gaugeScale, standing, type Window } from "@/lib/review/readout";

/** A thin scale centred on zero: the window as a shaded band, the value as a tick, and words. */
export function Gauge({ value, window: w, label }: { value: number; window: Window; label: string }) {
  const at = gaugeScale(value, w);
  const words = standing(value, w);
  return (
    <div className="mt-1 flex items-center gap-3">
      <div className="relative h-3 flex-1" role="img" aria-label={`${label}: ${words} (window ${w.min} to ${w.max})`}>
        <div className="absolute inset-x-0 top-1/2 h-px bg-slate-500" />
        <div className="absolute inset-y-0.5 bg-band/70" style={{ left: `${at(w.min)}%`, width: `${at(w.max) - at(w.min)}%` }} />
        <div className="absolute inset-y-0 w-px bg-slate-400" style={{ left: "50%" }} />
        <div className="absolute -inset-y-0.5 w-0.5 -translate-x-1/2 bg-chalk" style={{ left: `${at(value)}%` }} />
      </div>
      <span className="w-16 text-label text-slate-300" data-testid="standing">{words}</span>
    </div>
  );
}

import { gaugeScale, standing, windowText, type Window } from "@/lib/review/readout";

type Props = { value: number; uncertainty: number | null; unit: string; signed: boolean; window: Window; label: string };

/** A thin scale centred on zero: the window as a shaded band, the value as a tick with its ± whisker, and words. */
export function Gauge({ value, uncertainty, unit, signed, window: w, label }: Props) {
  const at = gaugeScale(value, w, uncertainty);
  const words = standing(value, w, uncertainty);
  const whisker = uncertainty !== null && uncertainty > 0 ? { left: at(value - uncertainty), right: at(value + uncertainty) } : null;
  return (
    <div className="mt-1 flex items-center gap-3">
      <div className="relative h-3 flex-1" role="img" aria-label={`${label}: ${words} (window ${windowText(w, unit, signed)})`}>
        <div className="absolute inset-x-0 top-1/2 h-px bg-slate-500" />
        <div className="absolute inset-y-0.5 bg-band/70" style={{ left: `${at(w.min)}%`, width: `${at(w.max) - at(w.min)}%` }} />
        <div className="absolute inset-y-0 w-px bg-slate-400" style={{ left: "50%" }} />
        {whisker && (
          <div data-testid="whisker" className="absolute top-1/2 h-1.5 -translate-y-1/2 border-x border-chalk/80"
            style={{ left: `${whisker.left}%`, width: `${whisker.right - whisker.left}%` }}>
            <div className="absolute inset-x-0 top-1/2 h-px bg-chalk/80" />
          </div>
        )}
        <div className="absolute -inset-y-0.5 w-0.5 -translate-x-1/2 bg-chalk" style={{ left: `${at(value)}%` }} />
      </div>
      <span className="w-20 text-label text-slate-300" data-testid="standing">{words}</span>
    </div>
  );
}

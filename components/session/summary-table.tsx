// A build's running summary: n, mean with its ± (standard error), spread (sd, never below the
// putts' own noise) and share in the studio's window — the comparison's own statistics.
import { metricDefinition } from "@/lib/compare/metric-labels";
import { uncertaintyText, valueText } from "@/lib/review/readout";
import type { SessionStat } from "./types";

export function SummaryTable({ stats }: { stats: SessionStat[] }) {
  if (stats.length === 0) return <p className="text-label text-slate-600">The summary starts with the first measured putt.</p>;
  return (
    <table className="w-full text-label" aria-label="Running summary">
      <thead>
        <tr className="text-left text-slate-600">
          <th className="py-1 pr-2 font-medium">Measurement</th><th className="py-1 pr-2 text-right font-medium">n</th>
          <th className="py-1 pr-2 text-right font-medium">mean</th><th className="py-1 pr-2 text-right font-medium">spread</th>
          <th className="py-1 text-right font-medium">in window</th>
        </tr>
      </thead>
      <tbody>
        {stats.map((s) => {
          const signed = metricDefinition(s.key).signWords !== null;
          return (
            <tr key={s.key} data-stat={s.key} className="border-t border-chalk-200">
              <td className="py-1 pr-2">{s.label}</td>
              <td className="num py-1 pr-2 text-right" data-testid="stat-n">{s.summary.n}</td>
              <td className="num py-1 pr-2 text-right">
                {valueText(s.summary.mean, s.unit, signed)}
                {s.meanUncertainty !== null && <span className="font-light text-slate-600"> {uncertaintyText(s.meanUncertainty, s.unit)}</span>}
              </td>
              <td className="num py-1 pr-2 text-right">{s.spread === null ? "—" : valueText(s.spread, s.unit, false)}</td>
              <td className="num py-1 text-right">{s.summary.shareInWindow === null ? "—" : `${Math.round(s.summary.shareInWindow * 100)}%`}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

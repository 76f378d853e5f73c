// Per measurement and per build: n, mean with its ± (standard error), sd, a putt's own ±
// (measurement noise), median, range and the share inside the studio's window.
import { metricDefinition } from "@/lib/compare/metric-labels";
import { formatMeasurement } from "@/lib/metrics/display";
import { uncertaintyText, windowText } from "@/lib/review/readout";
import type { ComparisonReply } from "./types";

const unitText = (u: string) => (u === "deg" ? "°" : u === "ratio" ? "" : ` ${u}`);

export function StatsTable({ data }: { data: ComparisonReply }) {
  const keys = [...new Map(data.builds.flatMap((b) => b.stats.map((s) => [s.key, s] as const))).values()];
  return (
    <section className="card overflow-x-auto" aria-labelledby="stats-heading">
      <h3 id="stats-heading" className="field-label">Consistency per measurement</h3>
      <table className="num w-full text-left text-label">
        <thead className="uppercase text-slate-600">
          <tr>
            <th className="py-1 pr-3">Measurement</th><th className="py-1 pr-3">Build</th>
            <th className="py-1 pr-3 text-right">n</th><th className="py-1 pr-3 text-right">mean</th><th className="py-1 pr-3 text-right">sd</th>
            <th className="py-1 pr-3 text-right" title="A putt's own measurement uncertainty (root mean square of the putts' ±)">± per putt</th>
            <th className="py-1 pr-3 text-right">median</th><th className="py-1 pr-3 text-right">range</th><th className="py-1 pr-3 text-right">in window</th>
          </tr>
        </thead>
        <tbody>
          {keys.map((k) =>
            data.builds.map((b, i) => {
              const s = b.stats.find((x) => x.key === k.key);
              const f = (v: number | null) => (v === null ? "—" : `${formatMeasurement(v, k.unit)}${unitText(k.unit)}`);
              return (
                <tr key={`${k.key}-${b.buildId}`} className={i === 0 ? "border-t border-chalk-300" : ""}>
                  <td className="py-1 pr-3">{i === 0 ? <>{k.label}{k.window && <span className="text-slate-600"> (window {windowText(k.window, k.unit, metricDefinition(k.key).signWords !== null)})</span>}</> : ""}</td>
                  <td className="py-1 pr-3">{b.label}</td>
                  <td className="py-1 pr-3 text-right">{s?.summary.n ?? 0}</td>
                  <td className="whitespace-nowrap py-1 pr-3 text-right">
                    {s ? f(s.summary.mean) : "—"}
                    {s?.meanUncertainty != null && <span className="ml-1 font-light text-slate-600">{uncertaintyText(s.meanUncertainty, k.unit)}</span>}
                  </td>
                  <td className="py-1 pr-3 text-right">{s ? f(s.summary.sd) : "—"}</td>
                  <td className="py-1 pr-3 text-right font-light text-slate-600">{s?.noise != null ? uncertaintyText(s.noise, k.unit) : "—"}</td>
                  <td className="py-1 pr-3 text-right">{s ? f(s.summary.median) : "—"}</td>
                  <td className="py-1 pr-3 text-right">{s ? f(s.summary.range) : "—"}</td>
                  <td className="py-1 pr-3 text-right">{s?.summary.shareInWindow == null ? "—" : `${Math.round(s.summary.shareInWindow * s.summary.n)} of ${s.summary.n}`}</td>
                </tr>
              );
            }),
          )}
        </tbody>
      </table>
      <p className="mt-2 text-label text-slate-600">
        The mean&apos;s ± is its standard error: the build&apos;s spread (never taken below a putt&apos;s own ±) over the square root of the putts.
      </p>
    </section>
  );
}

// Per measurement and per build: n, mean with its ± (standard error), sd, a putt's own ±
// (measurement noise), median, range and the share inside the studio's window.
import { metricDefinition } from "@/lib/compare/metric-labels";
import { signedWithWords } from "@/lib/format/signed";
import { shownUnit } from "@/lib/format/units";
import { decimalsOf, formatMeasurement } from "@/lib/metrics/display";
import { METRICS_BY_VIEW, signWordsFor } from "@/lib/metrics/keys";
import { VIEWS } from "@/lib/marks/types";
import { uncertaintyText, windowText } from "@/lib/review/readout";
import type { ComparisonReply } from "./types";

const unitText = (u: string) => (u === "deg" ? "°" : u === "ratio" ? "" : ` ${u}`);

/** Per measurement, the build with the smallest spread over at least three putts (ties: none marked). */
function steadiest(data: ComparisonReply, key: string): string | null {
  const ranked = data.builds
    .map((b) => ({ id: b.buildId, s: b.stats.find((x) => x.key === key) }))
    .filter((r) => r.s && r.s.summary.n >= 3 && r.s.spread !== null)
    .sort((a, b) => a.s!.spread! - b.s!.spread!);
  if (ranked.length < 2 || ranked[0]!.s!.spread === ranked[1]!.s!.spread) return null;
  return ranked[0]!.id;
}

export function StatsTable({ data }: { data: ComparisonReply }) {
  const keys = [...new Map(data.builds.flatMap((b) => b.stats.map((s) => [s.key, s] as const))).values()];
  const view = (key: string) => VIEWS.find((v) => METRICS_BY_VIEW[v].some((d) => d.key === key)) ?? "overhead";
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
            <th className="py-1 pr-3" title="The build with the smallest spread over at least three putts">steadiest</th>
          </tr>
        </thead>
        <tbody>
          {keys.map((k) =>
            data.builds.map((b, i) => {
              const s = b.stats.find((x) => x.key === k.key);
              const best = steadiest(data, k.key) === b.buildId;
              const words = signWordsFor(view(k.key), k.key, data.handedness ?? "right");
              const shown = shownUnit(k.unit, { units: data.units, speedUnit: data.speedUnit });
              const f = (v: number | null) => (v === null ? "—" : `${formatMeasurement(v * shown.factor, shown.unit)}${unitText(shown.unit)}`);
              return (
                <tr key={`${k.key}-${b.buildId}`} className={`${i === 0 ? "border-t border-chalk-300" : ""} ${best ? "font-medium" : ""}`} data-best={best ? "1" : undefined}>
                  <td className="py-1 pr-3">{i === 0 ? <>{k.label}{k.window && <span className="text-slate-600"> (window {windowText({ min: k.window.min * shownUnit(k.unit, { units: data.units, speedUnit: data.speedUnit }).factor, max: k.window.max * shownUnit(k.unit, { units: data.units, speedUnit: data.speedUnit }).factor }, shownUnit(k.unit, { units: data.units, speedUnit: data.speedUnit }).unit, metricDefinition(k.key).signWords !== null)})</span>}</> : ""}</td>
                  <td className="py-1 pr-3">{b.label}</td>
                  <td className="py-1 pr-3 text-right">{s?.summary.n ?? 0}</td>
                  <td className="whitespace-nowrap py-1 pr-3 text-right">
                    {s ? (words ? signedWithWords(s.summary.mean, decimalsOf(k.unit), unitText(k.unit), words) : f(s.summary.mean)) : "—"}
                    {s?.meanUncertainty != null && <span className="ml-1 font-light text-slate-600">{uncertaintyText(s.meanUncertainty * shown.factor, shown.unit)}</span>}
                  </td>
                  <td className="py-1 pr-3 text-right">{s ? f(s.summary.sd) : "—"}</td>
                  <td className="py-1 pr-3 text-right font-light text-slate-600">{s?.noise != null ? uncertaintyText(s.noise * shown.factor, shown.unit) : "—"}</td>
                  <td className="py-1 pr-3 text-right">{s ? f(s.summary.median) : "—"}</td>
                  <td className="py-1 pr-3 text-right">{s ? f(s.summary.range) : "—"}</td>
                  <td className="py-1 pr-3 text-right">{s?.summary.shareInWindow == null ? "—" : `${Math.round(s.summary.shareInWindow * s.summary.n)} of ${s.summary.n}`}</td>
                  <td className="py-1 pr-3">{best && <span data-testid="steadiest" className="font-medium text-signal-dark">● steadiest</span>}</td>
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

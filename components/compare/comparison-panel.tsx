"use client";
// The builds compared on consistency: statistics per measurement, plots, make chances and a suggestion.
import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api";
import { MAKE_DISTANCES_FT, MIN_PUTTS_FOR_MAKE } from "@/lib/compare/probability";
import { METRES_PER_FOOT } from "@/lib/physics/units";
import { FacePerPuttPlot, FaceVsPathPlot, StartFanPlot } from "./plots";
import { PuttTable } from "./putt-table";
import { StatsTable } from "./stats-table";
import type { ComparisonReply } from "./types";

export function ComparisonPanel({ fittingId }: { fittingId: string }) {
  const [distanceFt, setDistanceFt] = useState<number>(6);
  const { data, error, isLoading } = useQuery({
    queryKey: ["comparison", fittingId],
    queryFn: ({ signal }) => apiFetch<ComparisonReply>(`/api/fittings/${fittingId}/comparison`, { signal }),
    refetchInterval: 15_000,
  });
  if (isLoading) return <p className="text-slate-600">Comparing builds…</p>;
  if (error || !data) return <p role="alert" className="field-error">{error?.message ?? "No comparison"}</p>;
  const measured = data.builds.some((b) => b.stats.length > 0);
  if (!measured) return <p className="text-slate-600">No measured putts yet: the comparison appears once clips of the builds have measurements.</p>;
  const startCount = (b: ComparisonReply["builds"][number]) => b.stats.find((x) => x.key === "start_direction")?.summary.n ?? 0;
  const enough = data.builds.filter((b) => startCount(b) >= MIN_PUTTS_FOR_MAKE);
  const few = data.builds.filter((b) => startCount(b) < MIN_PUTTS_FOR_MAKE);
  const dist = (ft: number) => (data.units === "m" ? `${(ft * METRES_PER_FOOT).toFixed(2)} m` : `${ft} ft`);
  return (
    <div className="flex flex-col gap-6">
      {data.recommendation ? (
        <section className="card border-ink" aria-labelledby="suggestion-heading">
          <h3 id="suggestion-heading" className="field-label">Suggested from the numbers — the fitter decides</h3>
          <p className="text-readout">{data.recommendation.label}</p>
          <ul className="mt-2 list-disc pl-5">{data.recommendation.reasons.map((r) => <li key={r}>{r}</li>)}</ul>
        </section>
      ) : (
        <p className="text-slate-600">No suggestion yet: each build needs at least three measured putts.</p>
      )}

      <section className="card overflow-x-auto" aria-labelledby="make-heading">
        <h3 id="make-heading" className="field-label">Estimated share holed, from each build&apos;s start-direction mean and spread</h3>
        {enough.length > 0 && (
          <table className="num w-full text-left" data-testid="make-table">
            <thead className="text-label uppercase text-slate-600">
              <tr><th className="py-1 pr-4">Build</th>{MAKE_DISTANCES_FT.map((d) => <th key={d} className="py-1 pr-4 text-right">{dist(d)}</th>)}</tr>
            </thead>
            <tbody className="divide-y divide-chalk-200">
              {enough.map((b) => (
                <tr key={b.buildId} data-testid="make-row">
                  <th scope="row" className="py-1 pr-4 font-normal">{b.label}</th>
                  {b.make.map((m) => <td key={m.distanceFt} className="py-1 pr-4 text-right">{m.probability === null ? "—" : `${(m.probability * 100).toFixed(0)}%`}</td>)}
                </tr>
              ))}
            </tbody>
          </table>
        )}
        {few.length > 0 && (
          <p className="mt-2 text-label text-slate-600" data-testid="make-too-few">
            Not estimated for {few.map((b) => `${b.label} (${startCount(b)} of ${MIN_PUTTS_FOR_MAKE} putts)`).join(", ")}: a share needs at least {MIN_PUTTS_FOR_MAKE} putts
            with a start direction. With fewer, even a record of half holed has a 95% Wilson interval (Wilson 1927) wider than ±33 points, so it could not tell mostly holed from mostly missed.
          </p>
        )}
        <p className="mt-2 text-label text-slate-600">Start direction taken as a normal spread; the ball holes when it starts within the hole&apos;s angular width (dying speed, straight putt).</p>
      </section>

      <StatsTable data={data} />
      <PuttTable data={data} />

      <div className="grid gap-4 lg:grid-cols-2">
        <FacePerPuttPlot data={data} />
        <FaceVsPathPlot data={data} />
      </div>
      <div className="flex flex-col gap-2">
        <label className="flex items-center gap-2">
          <span className="field-label mb-0">Hole at</span>
          <select className="field w-32" value={distanceFt} onChange={(e) => setDistanceFt(Number(e.target.value))}>
            {MAKE_DISTANCES_FT.map((d) => <option key={d} value={d}>{dist(d)}</option>)}
          </select>
        </label>
        <StartFanPlot data={data} distanceFt={distanceFt} />
      </div>
    </div>
  );
}

"use client";

// The studio screen: chalk on ink, read from a few metres. The current putt's main numbers, one
// per line, very large, with the side word under; beside them the builds as spread plots; the
// build leading on consistency in the one accent. No controls; it follows the session by polling.
import { useQuery } from "@tanstack/react-query";
import { apiFetch } from "@/lib/client/api";
import type { SessionData } from "@/components/session/types";
import { SESSION_POLL_MS } from "@/lib/config/session";
import { sideWords, uncertaintyText, valueText } from "@/lib/review/readout";
import { SpreadPlot, plotKeyOf, plotReach } from "./spread-plot";

type ScreenData = SessionData & { expiresAt: string };

export function StudioScreen({ fittingId, token, initial }: { fittingId: string; token: string; initial: ScreenData }) {
  const { data, error } = useQuery({
    queryKey: ["studio-screen", fittingId],
    queryFn: ({ signal }) => apiFetch<ScreenData>(`/api/screen/${fittingId}/${encodeURIComponent(token)}`, { signal }),
    initialData: initial,
    refetchInterval: (q) => (q.state.error ? false : SESSION_POLL_MS),
    retry: false,
  });
  if (error) {
    return (
      <main className="flex min-h-screen items-center justify-center bg-ink p-10 text-chalk">
        <h1 role="alert" className="max-w-3xl text-5xl font-semibold leading-tight">{error.message}</h1>
      </main>
    );
  }
  const current = data.current;
  const currentBuild = current ? data.builds.find((b) => b.id === current.buildId) : null;
  const puttNumber = current && currentBuild ? currentBuild.putts.findIndex((p) => p.clipId === current.clipId) + 1 : 0;
  const shown = current?.numbers.filter((n) => n.value !== null).slice(0, 3) ?? [];
  const plotKey = plotKeyOf(data.builds);
  const reach = plotReach(data.builds, plotKey.key);
  return (
    <main className="grid min-h-screen grid-cols-1 gap-12 bg-ink p-10 text-chalk xl:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]" data-testid="studio-screen">
      <section aria-label="Current putt" className="flex flex-col gap-6">
        <p className="text-3xl text-slate-300" data-testid="current-putt">
          {current && currentBuild ? <>{currentBuild.label} · putt <span className="num">{puttNumber}</span>{current.mishit && " · set aside"}</> : "Waiting for the first putt"}
        </p>
        {current && shown.length === 0 && <p className="text-5xl text-slate-300">{current.state === "ready" ? "Measuring…" : "On its way…"}</p>}
        <div className="flex flex-col gap-8">
          {shown.map((n) => {
            const side = sideWords(n.value!, n.unit, n.signWords);
            return (
              <div key={n.key} data-number={n.key}>
                <p className="text-2xl uppercase tracking-wide text-slate-300">{n.label}</p>
                <p className="num text-[clamp(3.5rem,7vw,7.5rem)] font-semibold leading-none">
                  {valueText(n.value!, n.unit, n.signWords !== null)}
                  {n.uncertainty != null && <span className="text-[0.4em] font-light text-slate-300"> {uncertaintyText(n.uncertainty, n.unit)}</span>}
                </p>
                <p className="mt-2 text-4xl text-slate-200">{side || "\u00a0"}</p>
              </div>
            );
          })}
        </div>
      </section>
      <section aria-label="Builds" className="flex flex-col gap-4">
        <p className="text-2xl text-slate-300">{plotKey.label}, putt by putt · band: the studio&apos;s window</p>
        <ol className="grid gap-6" style={{ gridTemplateColumns: `repeat(${Math.max(1, Math.min(data.builds.length, 3))}, minmax(0, 1fr))` }}>
          {data.builds.map((b) => {
            const leading = data.leading?.buildId === b.id;
            const stat = b.summary.find((s) => s.key === plotKey.key);
            return (
              <li key={b.id} data-build-label={b.label} data-leading={leading}
                className={`flex flex-col gap-2 rounded-card border-2 p-4 ${leading ? "border-signal" : "border-ink-600"}`}>
                <p className="text-3xl font-semibold">{b.label}</p>
                <p className="text-2xl text-slate-300">
                  <span className="num" data-testid="screen-n">{stat?.summary.n ?? 0}</span> putts
                  {stat?.spread != null && <> · spread <span className="num">{valueText(stat.spread, stat.unit, false)}</span></>}
                </p>
                <SpreadPlot build={b} plotKey={plotKey.key} reach={reach} />
                {leading && <p className="text-2xl font-semibold text-signal">Leading on consistency</p>}
              </li>
            );
          })}
        </ol>
      </section>
    </main>
  );
}

// A build's putts as dots on one horizontal scale centred on zero, the studio's window as a band
// behind them: the spread reads at a glance from across the room.
import type { SessionBuild, SessionData } from "@/components/session/types";

type PlotKey = { key: "start_direction" | "face_angle_impact"; label: string };

/** Start direction when any build has one, else face angle at impact. */
export function plotKeyOf(builds: SessionData["builds"]): PlotKey {
  return builds.some((b) => b.plotted.some((p) => p.start !== null))
    ? { key: "start_direction", label: "Start direction" }
    : { key: "face_angle_impact", label: "Face angle at impact" };
}

const plottedValues = (build: SessionBuild, plotKey: PlotKey["key"]) =>
  build.plotted.map((p) => (plotKey === "start_direction" ? p.start : p.face)).filter((v): v is number => v !== null);

/** One half-width for every build's plot, so that their spreads compare side by side. */
export function plotReach(builds: SessionData["builds"], plotKey: PlotKey["key"]): number {
  const values = builds.flatMap((b) => plottedValues(b, plotKey));
  const window = builds.flatMap((b) => b.summary).find((s) => s.key === plotKey)?.window ?? null;
  return Math.max(2, ...values.map((v) => Math.abs(v) * 1.15), ...(window ? [Math.abs(window.min) * 1.5, Math.abs(window.max) * 1.5] : []));
}

export function SpreadPlot({ build, plotKey, reach }: { build: SessionBuild; plotKey: PlotKey["key"]; reach: number }) {
  const values = plottedValues(build, plotKey);
  const window = build.summary.find((s) => s.key === plotKey)?.window ?? null;
  const x = (v: number) => 50 + (v / reach) * 48;
  return (
    <svg viewBox="0 0 100 24" className="h-20 w-full" role="img" aria-label={`${values.length} putts`}>
      {window && <rect x={x(window.min)} width={x(window.max) - x(window.min)} y={2} height={20} fill="#D9E7F5" opacity={0.25} />}
      <line x1={50} x2={50} y1={1} y2={23} stroke="#8E9BA5" strokeWidth={0.4} />
      <line x1={2} x2={98} y1={12} y2={12} stroke="#3A4B55" strokeWidth={0.4} />
      {values.map((v, i) => <circle key={i} cx={x(v)} cy={12} r={1.8} fill="#F6F4EF" opacity={0.85} />)}
    </svg>
  );
}

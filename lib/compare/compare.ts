import { summarize, type Summary } from "@/lib/stats/summary";
import { metricDefinition, metricOrder } from "./metric-labels";
import { makeChances, type MakeChance } from "./probability";
import { recommend, type Recommendation } from "./recommend";
import type { CompareBuild, CompareClip, CompareMeasurement, StudioWindows } from "./types";

export type KeyStats = { key: string; label: string; unit: string; window: { min: number; max: number } | null; summary: Summary };
/** One overhead putt's plotted numbers (null when not measured). */
export type PuttPoint = { clipId: string; putt: number; face: number | null; path: number | null; start: number | null };

export type BuildComparison = {
  buildId: string;
  label: string;
  isBaseline: boolean;
  clipCount: number;
  stats: KeyStats[];
  make: MakeChance[];
  putts: PuttPoint[];
};

export type Comparison = { builds: BuildComparison[]; recommendation: Recommendation | null };

const time = (d: Date | string) => new Date(d).getTime();

/** Per build and per measurement: n, mean, sd, median, range and share inside the studio's window. */
export function compareBuilds(
  builds: readonly CompareBuild[],
  clips: readonly CompareClip[],
  measurements: readonly CompareMeasurement[],
  windows: StudioWindows,
): Comparison {
  const byClip = new Map<string, Map<string, CompareMeasurement>>();
  for (const m of measurements) {
    if (!byClip.has(m.clipId)) byClip.set(m.clipId, new Map());
    byClip.get(m.clipId)!.set(m.key, m);
  }
  const ordered = [...builds].sort((a, b) => a.position - b.position);
  const result = ordered.map((build) => {
    const own = clips.filter((c) => c.buildId === build.id).sort((a, b) => time(a.createdAt) - time(b.createdAt) || a.id.localeCompare(b.id));
    const values = new Map<string, { unit: string; xs: number[] }>();
    for (const clip of own) {
      for (const m of byClip.get(clip.id)?.values() ?? []) {
        if (m.value === null || !Number.isFinite(m.value)) continue;
        if (!values.has(m.key)) values.set(m.key, { unit: m.unit, xs: [] });
        values.get(m.key)!.xs.push(m.value);
      }
    }
    const stats: KeyStats[] = [...values.entries()]
      .sort(([a], [b]) => metricOrder(a) - metricOrder(b) || a.localeCompare(b))
      .map(([key, { unit, xs }]) => {
        const window = windows[key] ?? null;
        return { key, label: metricDefinition(key).label, unit, window, summary: summarize(xs, window ? { lo: window.min, hi: window.max } : undefined)! };
      });
    const value = (clipId: string, key: string) => byClip.get(clipId)?.get(key)?.value ?? null;
    const putts = own
      .filter((c) => c.view === "overhead")
      .map((c, i) => ({ clipId: c.id, putt: i + 1, face: value(c.id, "face_angle_impact"), path: value(c.id, "path"), start: value(c.id, "start_direction") }));
    const start = stats.find((s) => s.key === "start_direction")?.summary ?? null;
    return { buildId: build.id, label: build.label, isBaseline: build.isBaseline, clipCount: own.length, stats, make: makeChances(start), putts };
  });
  return { builds: result, recommendation: recommend(result) };
}

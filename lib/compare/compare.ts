import { summarize, type Summary } from "@/lib/stats/summary";
import { metricDefinition, metricOrder } from "./metric-labels";
import { makeChances, type MakeChance } from "./probability";
import { recommend, type Recommendation } from "./recommend";
import type { CompareBuild, CompareClip, CompareMeasurement, StudioWindows } from "./types";

export type KeyStats = {
  key: string; label: string; unit: string; window: { min: number; max: number } | null; summary: Summary;
  /** Root-mean-square of the putts' own uncertainties: the spread measurement alone would give. */
  noise: number | null;
  /** The spread the build is judged on: its sd, never credited below its measurement noise. */
  spread: number | null;
  /** Standard error of the mean, spread / √n. */
  meanUncertainty: number | null;
};
/** One overhead putt's plotted numbers (null when not measured), each with its uncertainty (null when not known). */
export type PuttPoint = {
  clipId: string; putt: number;
  face: number | null; path: number | null; start: number | null;
  faceUncertainty: number | null; pathUncertainty: number | null; startUncertainty: number | null;
};

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
    const values = new Map<string, { unit: string; xs: number[]; us: number[] }>();
    // One value per putt: a stroke filmed from two views (ball speed overhead and face-on) counts once, as their mean.
    for (const putt of putts(own)) {
      const perKey = new Map<string, { unit: string; xs: number[]; us: number[] }>();
      for (const clip of putt) {
        for (const m of byClip.get(clip.id)?.values() ?? []) {
          if (m.value === null || !Number.isFinite(m.value)) continue;
          const entry = perKey.get(m.key) ?? { unit: m.unit, xs: [], us: [] };
          entry.xs.push(m.value);
          if (m.uncertainty != null) entry.us.push(m.uncertainty);
          perKey.set(m.key, entry);
        }
      }
      for (const [key, { unit, xs, us }] of perKey) {
        if (!values.has(key)) values.set(key, { unit, xs: [], us: [] });
        const v = values.get(key)!;
        v.xs.push(xs.reduce((a, b) => a + b, 0) / xs.length);
        // The mean of k readings with uncertainties uᵢ has uncertainty √Σuᵢ² / k.
        if (us.length === xs.length) v.us.push(Math.sqrt(us.reduce((a, u) => a + u * u, 0)) / us.length);
      }
    }
    const stats: KeyStats[] = [...values.entries()]
      .sort(([a], [b]) => metricOrder(a) - metricOrder(b) || a.localeCompare(b))
      .map(([key, { unit, xs, us }]) => {
        const window = windows[key] ?? null;
        const summary = summarize(xs, window ? { lo: window.min, hi: window.max } : undefined)!;
        const noise = us.length > 0 ? Math.sqrt(us.reduce((a, u) => a + u * u, 0) / us.length) : null;
        const spread = summary.sd === null ? null : Math.max(summary.sd, noise ?? 0);
        return { key, label: metricDefinition(key).label, unit, window, summary, noise, spread, meanUncertainty: spread === null ? null : spread / Math.sqrt(summary.n) };
      });
    const value = (clipId: string, key: string) => byClip.get(clipId)?.get(key)?.value ?? null;
    const uncertainty = (clipId: string, key: string) => (value(clipId, key) === null ? null : (byClip.get(clipId)?.get(key)?.uncertainty ?? null));
    const plotted = own
      .filter((c) => c.view === "overhead")
      .map((c, i) => ({
        clipId: c.id, putt: i + 1,
        face: value(c.id, "face_angle_impact"), path: value(c.id, "path"), start: value(c.id, "start_direction"),
        faceUncertainty: uncertainty(c.id, "face_angle_impact"), pathUncertainty: uncertainty(c.id, "path"), startUncertainty: uncertainty(c.id, "start_direction"),
      }));
    const start = stats.find((s) => s.key === "start_direction");
    const make = makeChances(start ? { ...start.summary, sd: start.spread } : null);
    return { buildId: build.id, label: build.label, isBaseline: build.isBaseline, clipCount: own.length, stats, make, putts: plotted };
  });
  return { builds: result, recommendation: recommend(result) };
}

/** A build's clips grouped into putts: the clips of one stroke together, any other clip alone. */
function putts(clips: readonly CompareClip[]): CompareClip[][] {
  const groups = new Map<string, CompareClip[]>();
  for (const c of clips) {
    const key = c.strokeId ?? `clip:${c.id}`;
    groups.set(key, [...(groups.get(key) ?? []), c]);
  }
  return [...groups.values()];
}

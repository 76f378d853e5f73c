// Where a clip sits in its fitting: its putt number within the build (per view: each camera
// records every putt once) and the putts before and after it. A fitter marks one camera's clips
// in a row, so previous/next stay in the same view, going through the builds in their order.
import type { View } from "@/lib/marks/types";

export type PuttClip = { id: string; buildId: string; view: View; state: string; createdAt: string };
export type PuttBuild = { id: string; position: number; label: string };
export type PuttRef = { id: string; buildLabel: string; putt: number };

const byTime = (a: PuttClip, b: PuttClip) => a.createdAt.localeCompare(b.createdAt) || a.id.localeCompare(b.id);

/** 1-based putt numbers: order of upload among the build's clips of the same view. */
export function puttNumbers(clips: readonly PuttClip[]): Map<string, number> {
  const seen = new Map<string, number>();
  const numbers = new Map<string, number>();
  for (const c of [...clips].sort(byTime)) {
    const slot = `${c.buildId}|${c.view}`;
    const n = (seen.get(slot) ?? 0) + 1;
    seen.set(slot, n);
    numbers.set(c.id, n);
  }
  return numbers;
}

/**
 * The ready clips of `view` in reading order — builds by position, putts by number — and the
 * neighbours of `clipId` in it (null at either end). Clips still processing or failed are skipped.
 */
export function puttNeighbours(clips: readonly PuttClip[], builds: readonly PuttBuild[], clipId: string) {
  const numbers = puttNumbers(clips);
  const buildOf = new Map(builds.map((b) => [b.id, b]));
  const self = clips.find((c) => c.id === clipId);
  const order = clips
    .filter((c) => c.view === self?.view && (c.state === "ready" || c.id === clipId) && buildOf.has(c.buildId))
    .sort((a, b) => buildOf.get(a.buildId)!.position - buildOf.get(b.buildId)!.position || numbers.get(a.id)! - numbers.get(b.id)!);
  const at = order.findIndex((c) => c.id === clipId);
  const ref = (c: PuttClip | undefined): PuttRef | null => (c ? { id: c.id, buildLabel: buildOf.get(c.buildId)!.label, putt: numbers.get(c.id)! } : null);
  return { putt: numbers.get(clipId) ?? null, previous: at > 0 ? ref(order[at - 1]) : null, next: at >= 0 ? ref(order[at + 1]) : null };
}

/** The clips of the same view uploaded before this one, latest first: where reference marks may be carried from. */
export function earlierOfSameView(clips: readonly PuttClip[], clipId: string): PuttClip[] {
  const sorted = [...clips].sort(byTime);
  const at = sorted.findIndex((c) => c.id === clipId);
  if (at < 0) return [];
  const view = sorted[at]!.view;
  return sorted.slice(0, at).filter((c) => c.view === view && c.state === "ready").reverse();
}

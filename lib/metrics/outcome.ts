// A step of a computation: either a value with what it came from, or what is missing.
export type Found = { value: number; frames: number[]; markIds: string[] };
export type Missing = { needs: string[] };
export type Outcome = Found | Missing;

export const isMissing = (o: Outcome): o is Missing => "needs" in o;
export const missing = (...needs: string[]): Missing => ({ needs });

/** Sources may repeat here; compute.ts sorts and de-duplicates them once for the answer (the Monte Carlo runs never need them). */
export function found(value: number, frames: readonly number[], markIds: readonly string[]): Found {
  return { value, frames: frames as number[], markIds: markIds as string[] };
}

/** Combines several outcomes: all their needs if any is missing, else fn of the values with merged sources. */
export function combine(parts: readonly Outcome[], fn: (values: number[]) => number): Outcome {
  const needs = parts.flatMap((p) => (isMissing(p) ? p.needs : []));
  if (needs.length > 0) return missing(...new Set(needs));
  const ok = parts as Found[];
  return found(fn(ok.map((p) => p.value)), ok.flatMap((p) => p.frames), ok.flatMap((p) => p.markIds));
}

/** Adds the marks and frames a value also depends on (target line, scale, plane…). */
export const withSources = (o: Found, frames: readonly number[], markIds: readonly string[]): Found =>
  found(o.value, [...o.frames, ...frames], [...o.markIds, ...markIds]);

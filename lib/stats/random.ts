// Seeded pseudo-random numbers, so that every Monte Carlo figure and every generated test clip
// is the same on each run.

/** Uniform in [0, 1): mulberry32, a small 32-bit generator (T. Ettinger, public domain). */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by the Box–Muller transform (Box & Muller 1958) over `seededUniform`. */
export function seededNormal(seed: number): () => number {
  const uniform = seededUniform(seed);
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

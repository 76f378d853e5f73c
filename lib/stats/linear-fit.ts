import { linearRegression } from "simple-statistics";

export type LinearFit = {
  slope: number;
  intercept: number;
  /** √(SSE / (n − 2)); null with only two points. */
  residualSd: number | null;
  /** 1 − SSE/SST; null when all y are equal. */
  rSquared: number | null;
};

/** Ordinary least-squares straight line y = intercept + slope·x (the model of NIST StRD "Norris"). */
export function linearFit(points: readonly (readonly [number, number])[]): LinearFit {
  if (points.length < 2) throw new Error("a straight-line fit needs at least two points");
  const xs = points.map((p) => p[0]);
  if (xs.every((x) => x === xs[0])) throw new Error("a straight-line fit needs at least two different x values");
  const { m: slope, b: intercept } = linearRegression(points.map((p) => [p[0], p[1]]));
  const meanY = points.reduce((s, p) => s + p[1], 0) / points.length;
  let sse = 0, sst = 0;
  for (const [x, y] of points) {
    sse += (y - (intercept + slope * x)) ** 2;
    sst += (y - meanY) ** 2;
  }
  return {
    slope,
    intercept,
    residualSd: points.length > 2 ? Math.sqrt(sse / (points.length - 2)) : null,
    rSquared: sst > 0 ? 1 - sse / sst : null,
  };
}

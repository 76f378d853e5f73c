import { describe, expect, it } from "vitest";
import { linearFit } from "@/lib/stats/linear-fit";
import { summarize } from "@/lib/stats/summary";
import { LEW, LEW_CERTIFIED, MAVRO, MAVRO_CERTIFIED, MICHELSO, MICHELSO_CERTIFIED, NORRIS_CERTIFIED, NORRIS_X, NORRIS_Y } from "./fixtures/nist-strd";

const relativeError = (actual: number, expected: number) => Math.abs(actual - expected) / Math.abs(expected);

describe("summary against NIST StRD univariate certified values", () => {
  it.each([
    ["Michelso", MICHELSO, MICHELSO_CERTIFIED, 100],
    ["Mavro", MAVRO, MAVRO_CERTIFIED, 50],
    ["Lew", LEW, LEW_CERTIFIED, 200],
  ] as const)("NIST StRD %s: mean and sample sd", (_name, data, certified, n) => {
    const s = summarize(data)!;
    expect(s.n).toBe(n);
    expect(relativeError(s.mean, certified.mean)).toBeLessThan(1e-13);
    // Mavro is the "average difficulty" set: its sd sits 4 digits below the data; 1e-9 relative is ~9 digits.
    expect(relativeError(s.sd!, certified.sd)).toBeLessThan(1e-9);
  });
});

describe("straight-line fit against NIST StRD Norris certified values", () => {
  const fit = linearFit(NORRIS_X.map((x, i) => [x, NORRIS_Y[i]!] as const));
  it("NIST StRD Norris: slope, intercept, residual sd and R²", () => {
    expect(NORRIS_X).toHaveLength(36);
    expect(relativeError(fit.slope, NORRIS_CERTIFIED.slope)).toBeLessThan(1e-12);
    expect(relativeError(fit.intercept, NORRIS_CERTIFIED.intercept)).toBeLessThan(1e-10);
    expect(relativeError(fit.residualSd!, NORRIS_CERTIFIED.residualSd)).toBeLessThan(1e-10);
    expect(relativeError(fit.rSquared!, NORRIS_CERTIFIED.rSquared)).toBeLessThan(1e-12);
  });
});

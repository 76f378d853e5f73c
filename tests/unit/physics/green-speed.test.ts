import { describe, expect, it } from "vitest";
import { meanOfDirections, slopeCorrectedReading, stimpmeterReading } from "@/lib/physics/green-speed";
import { rollOutDistance, rollingDeceleration, speedToRoll, STIMP_RAMP_SPEED_MPS } from "@/lib/physics/roll";

// 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959).
const FOOT_M = 0.3048;

describe("Stimpmeter reading (USGA Stimpmeter Instruction Booklet)", () => {
  it("USGA booklet: 10.0 ft and 10.5 ft give 10.25 ft", () => {
    expect(meanOfDirections(10.0, 10.5)).toBeCloseTo(10.25, 12);
    const r = stimpmeterReading([9.9, 10.0, 10.1], [10.4, 10.5, 10.6]);
    expect(r.readingFt).toBeCloseTo(10.25, 12);
    expect(r.problems).toEqual([]);
  });
  it("USGA booklet: a set of three more than 8 in apart, or directions more than 18 in apart, call for re-measuring", () => {
    expect(stimpmeterReading([9.0, 9.5, 10.0], [9.5, 9.5, 9.5]).problems).toHaveLength(1);
    expect(stimpmeterReading([8, 8, 8], [9.6, 9.6, 9.6]).problems).toHaveLength(1);
    expect(stimpmeterReading([8, 8, 8], [9.5, 9.5, 9.5]).problems).toEqual([]); // exactly 18 in passes
  });
});

describe("slope correction (Brede 1990, USGA Green Section Record 28(6))", () => {
  it("Brede 1990: 9 ft up and 14 ft down give 10.957 ft", () => {
    expect(slopeCorrectedReading(9, 14)).toBeCloseTo(10.957, 3);
  });
});

describe("flat-green roll model a = v0²/(2S) (derived; ramp speed 6.0 ft/s from memory)", () => {
  it("ramp speed 6.0 ft/s (from memory) = 6.0 × 0.3048 = 1.8288 m/s", () => {
    expect(STIMP_RAMP_SPEED_MPS).toBeCloseTo(1.8288, 12);
  });
  it("derived: S = 10 ft → 0.5486 m/s², S = 8 ft → 0.6858 m/s²", () => {
    expect(rollingDeceleration(10 * FOOT_M)).toBeCloseTo(0.5486, 4);
    expect(rollingDeceleration(8 * FOOT_M)).toBeCloseTo(0.6858, 4);
  });
  it("derived: 20 ft on a 10 ft green needs 6·√(20/10) = 8.485 ft/s", () => {
    expect(speedToRoll(20 * FOOT_M, 10 * FOOT_M) / FOOT_M).toBeCloseTo(8.485, 3);
  });
  it("derived: 8.485 ft/s on a 10 ft green rolls S·(v/v₀)² = 10 × (8.485/6)² = 19.9987 ft; 3 ft/s on an 8 ft green 8 × (3/6)² = 2 ft", () => {
    expect(rollOutDistance(8.485 * FOOT_M, 10 * FOOT_M) / FOOT_M).toBeCloseTo(19.9987, 4);
    expect(rollOutDistance(3 * FOOT_M, 8 * FOOT_M) / FOOT_M).toBeCloseTo(2, 10);
  });
});

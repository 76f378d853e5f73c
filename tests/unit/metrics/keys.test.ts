import { describe, expect, it } from "vitest";
import { VIEWS } from "@/lib/marks/types";
import { computeMeasurements } from "@/lib/metrics/compute";
import { formatMeasurement } from "@/lib/metrics/display";
import { METRICS_BY_VIEW, signWordsFor } from "@/lib/metrics/keys";
import { overheadClip } from "./scene";

describe("metric keys for the screens", () => {
  it("computeMeasurements lists exactly the keys and units each view declares", () => {
    for (const view of VIEWS) {
      const list = computeMeasurements(overheadClip({ view }), []);
      expect(list.map((m) => [m.key, m.unit])).toEqual(METRICS_BY_VIEW[view].map((d) => [d.key, d.unit]));
    }
  });
  it("carries the sign words of METRICS.md, with start direction mirrored for a left-hander", () => {
    expect(signWordsFor("overhead", "face_angle_impact", "right")).toEqual({ positive: "open", negative: "closed" });
    expect(signWordsFor("overhead", "path", "left")).toEqual({ positive: "in-to-out", negative: "out-to-in" });
    expect(signWordsFor("overhead", "start_direction", "left")).toEqual({ positive: "left of target", negative: "right of target" });
    expect(signWordsFor("face-on", "spin_rpm", "right")).toEqual({ positive: "topspin", negative: "backspin" });
    expect(signWordsFor("down-the-line", "sole_tilt_impact", "right")).toEqual({ positive: "heel up", negative: "toe up" });
    expect(signWordsFor("face-on", "roll_ratio", "right")).toBeNull();
  });
});

describe("display rounding", () => {
  it("shows angles to 0.1° (METRICS.md) without a negative zero", () => {
    expect(formatMeasurement(-0.6123, "deg")).toBe("-0.6");
    expect(formatMeasurement(-0.04, "deg")).toBe("0.0");
    expect(formatMeasurement(287.6, "rpm")).toBe("288");
  });
});

import { describe, expect, it } from "vitest";
import { computeMeasurements } from "@/lib/metrics/compute";
import { formatMeasurement } from "@/lib/metrics/display";
import { METRICS_BY_VIEW, signWordsFor } from "@/lib/metrics/keys";
import { overheadClip } from "./scene";

describe("metric keys for the screens", () => {
  it("lists the keys and units of docs/measurements.md for each view, in its order", () => {
    const keysAndUnits = (view: "overhead" | "face-on" | "down-the-line") => computeMeasurements(overheadClip({ view }), []).map((m) => [m.key, m.unit]);
    expect(keysAndUnits("overhead")).toEqual([
      ["aim", "deg"], ["face_angle_impact", "deg"], ["path", "deg"], ["face_to_path", "deg"],
      ["face_rotation_rate", "deg/s"], ["twist", "deg"], ["start_direction", "deg"], ["ball_speed", "m/s"],
    ]);
    expect(keysAndUnits("face-on")).toEqual([
      ["shaft_lean_address", "deg"], ["shaft_lean_impact", "deg"], ["attack_angle", "deg"], ["dynamic_loft", "deg"],
      ["launch_angle", "deg"], ["ball_speed", "m/s"], ["spin_rpm", "rpm"], ["roll_ratio", "ratio"], ["skid_distance", "m"],
    ]);
    expect(keysAndUnits("down-the-line")).toEqual([["sole_tilt_impact", "deg"], ["lie_change", "deg"]]);
    expect(METRICS_BY_VIEW.overhead.find((d) => d.key === "path")?.label).toBe("Path");
  });
  it("carries the sign words of docs/measurements.md, with start direction mirrored for a left-hander", () => {
    expect(signWordsFor("overhead", "face_angle_impact", "right")).toEqual({ positive: "open", negative: "closed" });
    expect(signWordsFor("overhead", "path", "left")).toEqual({ positive: "in-to-out", negative: "out-to-in" });
    expect(signWordsFor("overhead", "start_direction", "left")).toEqual({ positive: "left of target", negative: "right of target" });
    expect(signWordsFor("face-on", "spin_rpm", "right")).toEqual({ positive: "topspin", negative: "backspin" });
    expect(signWordsFor("down-the-line", "sole_tilt_impact", "right")).toEqual({ positive: "heel up", negative: "toe up" });
    expect(signWordsFor("face-on", "roll_ratio", "right")).toBeNull();
  });
});

describe("display rounding", () => {
  it("shows angles to 0.1° (docs/measurements.md) without a negative zero", () => {
    expect(formatMeasurement(-0.6123, "deg")).toBe("-0.6");
    expect(formatMeasurement(-0.04, "deg")).toBe("0.0");
    expect(formatMeasurement(287.6, "rpm")).toBe("288");
  });
});

import { describe, expect, it } from "vitest";
import { measurementSentence } from "@/lib/playback/measurement-words";

describe("measurements in plain words", () => {
  it("face closed at impact inside a ±1° window", () => {
    expect(measurementSentence({ key: "face_angle_impact", value: -0.6, unit: "deg", window: { min: -1, max: 1 } }, "overhead", "right"))
      .toEqual({ label: "Face angle at impact", text: "0.6° closed — in window (±1.0°)" });
  });
  it("an asymmetric window is shown as a range; outside by more than half its width is 'outside'", () => {
    expect(measurementSentence({ key: "shaft_lean_impact", value: 9, unit: "deg", window: { min: 0, max: 4 } }, "face-on", "right").text)
      .toBe("9.0° forward — outside (0.0° to +4.0°)");
  });
  it("start direction mirrors for a left-handed golfer; a missing value says so", () => {
    expect(measurementSentence({ key: "start_direction", value: 0.4, unit: "deg" }, "overhead", "left").text).toBe("0.4° left of target");
    expect(measurementSentence({ key: "path", value: null, unit: "deg" }, "overhead", "right").text).toBe("not measured on this clip");
  });
  it("a number without a sign keeps its value and unit", () => {
    expect(measurementSentence({ key: "ball_speed", value: 1.854, unit: "m/s" }, "overhead", "right").text).toBe("1.85 m/s");
  });
});

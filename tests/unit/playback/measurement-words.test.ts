import { describe, expect, it } from "vitest";
import { measurementSentence } from "@/lib/playback/measurement-words";

describe("measurements in plain words", () => {
  it("face closed at impact inside a window written as a range", () => {
    expect(measurementSentence({ key: "face_angle_impact", value: -0.6, unit: "deg", window: { min: -1, max: 1 } }, "overhead", "right"))
      .toEqual({ label: "Face angle at impact", value: "0.6°", uncertainty: "", rest: "closed — in window (\u22121° to +1°)", text: "0.6° closed — in window (\u22121° to +1°)" });
  });
  it("the ± beside the value is its precision, at the value's decimals", () => {
    const s = measurementSentence({ key: "face_angle_impact", value: -0.6, unit: "deg", uncertainty: 0.34, window: { min: -1, max: 1 } }, "overhead", "right");
    expect(s.uncertainty).toBe("±0.3°");
    expect(s.text).toBe("0.6° ±0.3° closed — in window (\u22121° to +1°)");
  });
  it("an uncertainty wider than half the window cannot decide: 'undecided'", () => {
    // Window −1° to +1°: half its width is 1°; ±1.8° is wider.
    expect(measurementSentence({ key: "path", value: 0.4, unit: "deg", uncertainty: 1.8, window: { min: -1, max: 1 } }, "overhead", "right").text)
      .toBe("0.4° ±1.8° in-to-out — undecided (\u22121° to +1°)");
  });
  it("an asymmetric window is shown as a range; outside by more than half its width is 'outside'", () => {
    expect(measurementSentence({ key: "shaft_lean_impact", value: 9, unit: "deg", window: { min: 0, max: 4 } }, "face-on", "right").text)
      .toBe("9.0° forward — outside (0° to +4°)");
  });
  it("start direction mirrors for a left-handed golfer; a missing value says so", () => {
    expect(measurementSentence({ key: "start_direction", value: 0.4, unit: "deg" }, "overhead", "left").text).toBe("0.4° left of target");
    expect(measurementSentence({ key: "path", value: null, unit: "deg" }, "overhead", "right").text).toBe("not measured on this clip");
  });
  it("a number without a sign keeps its value and unit, with its ±", () => {
    expect(measurementSentence({ key: "ball_speed", value: 1.854, unit: "m/s" }, "overhead", "right").text).toBe("1.85 m/s");
    expect(measurementSentence({ key: "ball_speed", value: 1.854, unit: "m/s", uncertainty: 0.012 }, "overhead", "right").text).toBe("1.85 m/s ±0.01 m/s");
  });
});

// Every limit below is a literal from the R&A/USGA Equipment Rules 2019, Part 2 (rule cited per check).
import { describe, expect, it } from "vitest";
import { equipmentWarnings } from "@/lib/equipment/rules";

const fields = (b: Parameters<typeof equipmentWarnings>[0]) => equipmentWarnings(b).map((w) => w.field);

describe("equipment-rule warnings (R&A/USGA Equipment Rules 2019, Part 2)", () => {
  it("Equipment Rules: putter loft at most 10° — 10.0° passes, 10.1° warns", () => {
    expect(fields({ loftDeg: 10.0 })).toEqual([]);
    expect(fields({ loftDeg: 10.1 })).toEqual(["loftDeg"]);
  });
  it("Equipment Rules: length at least 18 in", () => {
    expect(fields({ lengthIn: 18 })).toEqual([]);
    expect(fields({ lengthIn: 17.9 })).toEqual(["lengthIn"]);
  });
  it("Equipment Rules Part 2, 1d(i): shaft at least 10° from vertical, so lie at most 80° — 80.0° passes, 80.5° warns", () => {
    expect(fields({ lieDeg: 80.0 })).toEqual([]);
    expect(fields({ lieDeg: 80.5 })).toEqual(["lieDeg"]);
  });

  describe("Part 2, 1d(ii): shaft along the line of play at most 20° forward or 10° back at normal address", () => {
    it("20.0° forward passes, 20.5° forward warns", () => {
      expect(fields({ designShaftLeanDeg: 20.0 })).toEqual([]);
      const over = equipmentWarnings({ designShaftLeanDeg: 20.5 });
      expect(over.map((w) => w.field)).toEqual(["designShaftLeanDeg"]);
      expect(over[0]!.rule).toContain("1d(ii)");
      expect(over[0]!.message).toContain("20.5° forward");
    });
    it("10.0° back passes, 10.5° back warns (back lean is negative: + is toward the target)", () => {
      expect(fields({ designShaftLeanDeg: -10.0 })).toEqual([]);
      const over = equipmentWarnings({ designShaftLeanDeg: -10.5 });
      expect(over.map((w) => w.field)).toEqual(["designShaftLeanDeg"]);
      expect(over[0]!.message).toContain("10.5° back");
    });
    it("the limits are not symmetric: 15° forward passes, 15° back warns", () => {
      expect(fields({ designShaftLeanDeg: 15 })).toEqual([]);
      expect(fields({ designShaftLeanDeg: -15 })).toEqual(["designShaftLeanDeg"]);
    });
  });

  it("Part 2, 3b(iii): grip cross-section at most 1.75 in in any direction — 1.75 in passes, 1.76 in warns", () => {
    expect(fields({ gripMaxWidthIn: 1.75 })).toEqual([]);
    const over = equipmentWarnings({ gripMaxWidthIn: 1.76 });
    expect(over.map((w) => w.field)).toEqual(["gripMaxWidthIn"]);
    expect(over[0]!.rule).toContain("3b(iii)");
  });

  describe("Part 2, 3c: a putter may have two grips, each circular, at least 1.5 in apart", () => {
    it("two circular grips 1.5 in apart pass, 1.4 in apart warn", () => {
      expect(fields({ gripCount: 2, gripsCircular: true, gripGapIn: 1.5 })).toEqual([]);
      const close = equipmentWarnings({ gripCount: 2, gripsCircular: true, gripGapIn: 1.4 });
      expect(close.map((w) => w.field)).toEqual(["gripGapIn"]);
      expect(close[0]!.rule).toContain("3c");
    });
    it("two non-circular grips warn", () => {
      expect(fields({ gripCount: 2, gripsCircular: false, gripGapIn: 2 })).toEqual(["gripsCircular"]);
    });
    it("both faults together give both warnings", () => {
      expect(fields({ gripCount: 2, gripsCircular: false, gripGapIn: 1.4 })).toEqual(["gripsCircular", "gripGapIn"]);
    });
    it("one grip may be non-circular (3b(ii)) and has no gap to check", () => {
      expect(fields({ gripCount: 1, gripsCircular: false, gripGapIn: 0.5 })).toEqual([]);
    });
    it("unrecorded shape or gap on two grips is not guessed", () => {
      expect(fields({ gripCount: 2, gripsCircular: null, gripGapIn: null })).toEqual([]);
    });
  });

  it("a conforming typical putter has no warnings and unknown fields are not guessed", () => {
    expect(equipmentWarnings({ loftDeg: 3, lengthIn: 34, lieDeg: 70, designShaftLeanDeg: 0, gripMaxWidthIn: 1.2, gripCount: 1 })).toEqual([]);
    expect(equipmentWarnings({})).toEqual([]);
  });
});

import { describe, expect, it } from "vitest";
import { equipmentWarnings } from "@/lib/equipment/rules";

const fields = (b: Parameters<typeof equipmentWarnings>[0]) => equipmentWarnings(b).map((w) => w.field);

describe("equipment-rule warnings (R&A/USGA Equipment Rules 2019, Part 2 and Appendix III)", () => {
  it("Equipment Rules: putter loft at most 10° — 10.0° passes, 10.1° warns", () => {
    expect(fields({ loftDeg: 10.0 })).toEqual([]);
    expect(fields({ loftDeg: 10.1 })).toEqual(["loftDeg"]);
  });
  it("Equipment Rules: length at least 18 in", () => {
    expect(fields({ lengthIn: 18 })).toEqual([]);
    expect(fields({ lengthIn: 17.9 })).toEqual(["lengthIn"]);
  });
  it("Equipment Rules: shaft at least 10° from vertical, so lie at most 80° — 80.0° passes, 80.5° warns", () => {
    expect(fields({ lieDeg: 80.0 })).toEqual([]);
    expect(fields({ lieDeg: 80.5 })).toEqual(["lieDeg"]);
  });
  it("Equipment Rules Appendix III: putter grip cross-section at most 1.75 in", () => {
    expect(fields({ gripMaxDimensionIn: 1.75 })).toEqual([]);
    expect(fields({ gripMaxDimensionIn: 1.8 })).toEqual(["gripMaxDimensionIn"]);
  });
  it("a conforming typical putter has no warnings and unknown fields are not guessed", () => {
    expect(equipmentWarnings({ loftDeg: 3, lengthIn: 34, lieDeg: 70, gripMaxDimensionIn: 1.2 })).toEqual([]);
    expect(equipmentWarnings({})).toEqual([]);
  });
});

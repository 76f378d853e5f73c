// Speeds and distances in the studio's units: 1 ft = 0.3048 m and 1 mile = 1609.344 m exactly
// (International yard and pound agreement, 1959).
import { describe, expect, it } from "vitest";
import { inStudioUnits, shownUnit } from "@/lib/format/units";
import { valueText } from "@/lib/review/readout";

describe("studio units", () => {
  it("1.8 m/s is 5.91 ft/s (1.8 / 0.3048) and 4.03 mph (1.8 × 3600 / 1609.344)", () => {
    expect(inStudioUnits(1.8, 0.05, "m/s", { units: "m", speedUnit: "ft/s" }).value).toBeCloseTo(5.9055, 4);
    const mph = inStudioUnits(1.8, 0.05, "m/s", { units: "m", speedUnit: "mph" });
    expect(mph.value).toBeCloseTo(4.0265, 4);
    expect(mph.uncertainty).toBeCloseTo(0.11185, 4);
    expect(valueText(mph.value, mph.unit, false)).toBe("4.03 mph");
  });
  it("distances follow the distance setting; angles never change", () => {
    expect(shownUnit("m", { units: "ft" })).toEqual({ unit: "ft", factor: 1 / 0.3048 });
    expect(shownUnit("m", { units: "m" }).factor).toBe(1);
    expect(shownUnit("deg", { units: "ft", speedUnit: "mph" })).toEqual({ unit: "deg", factor: 1 });
  });
});

// The weekly opening hours an admin saves for a fitter: several windows a day, never overlapping.
import { describe, expect, it } from "vitest";
import { weeklyRulesSchema } from "@/lib/booking/schemas";

const parse = (rules: { weekday: number; start: string; end: string }[]) => weeklyRulesSchema.safeParse({ rules });

describe("weekly opening hours", () => {
  it("takes a split day: two windows on one weekday", () => {
    expect(parse([{ weekday: 1, start: "09:00", end: "12:00" }, { weekday: 1, start: "14:00", end: "18:00" }]).success).toBe(true);
  });

  it("takes windows that touch (one ends when the next starts)", () => {
    expect(parse([{ weekday: 2, start: "09:00", end: "12:00" }, { weekday: 2, start: "12:00", end: "15:00" }]).success).toBe(true);
  });

  it("refuses two windows on one weekday that overlap, and says so", () => {
    const result = parse([{ weekday: 3, start: "09:00", end: "13:00" }, { weekday: 3, start: "12:30", end: "17:00" }]);
    expect(result.success).toBe(false);
    expect(result.error!.issues[0]!.message).toMatch(/overlap/);
  });

  it("takes the same hours on different weekdays", () => {
    expect(parse([{ weekday: 4, start: "09:00", end: "17:00" }, { weekday: 5, start: "09:00", end: "17:00" }]).success).toBe(true);
  });

  it("refuses a window that ends before it starts", () => {
    expect(parse([{ weekday: 6, start: "17:00", end: "09:00" }]).success).toBe(false);
  });
});

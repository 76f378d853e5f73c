// Precision on the review screen (± one standard error, ranges for windows, the `undecided` word),
// proposals drawn apart until accepted, the tracker's one-line summary, and the plane's side labels.
// Expected values are written out by hand.
import { describe, expect, it } from "vitest";
import { commandForKey, KEY_HELP } from "@/lib/review/keys";
import { isProposal, movedByHand, type ReviewMark } from "@/lib/review/marks";
import { gaugeScale, methodWord, standing, uncertaintyText, windowText } from "@/lib/review/readout";
import { planeSideLabels } from "@/lib/review/tools";
import { canAccept, trackingLine } from "@/lib/review/tracking";

describe("uncertainty beside a value", () => {
  it("uses the value's decimals and puts the unit after the ±", () => {
    expect(uncertaintyText(0.3, "deg")).toBe("±0.3°");
    expect(uncertaintyText(0.26, "deg")).toBe("±0.3°");
    expect(uncertaintyText(0.018, "m/s")).toBe("±0.02 m/s");
    expect(uncertaintyText(41.6, "rpm")).toBe("±42 rpm");
    expect(uncertaintyText(0.034, "ratio")).toBe("±0.03");
  });
  it("never claims an exact number: below the last shown digit it reads ±<step", () => {
    expect(uncertaintyText(0.02, "deg")).toBe("±<0.1°");
    expect(uncertaintyText(0.004, "m/s")).toBe("±<0.01 m/s");
    expect(uncertaintyText(0, "rpm")).toBe("±<1 rpm");
  });
  it("says nothing when the server gave no uncertainty", () => {
    expect(uncertaintyText(null, "deg")).toBe("");
    expect(uncertaintyText(undefined, "deg")).toBe("");
    expect(uncertaintyText(Number.NaN, "deg")).toBe("");
  });
  it("names the method only when it is one of the three", () => {
    expect(methodWord("tracked")).toBe("tracked");
    expect(methodWord("mixed")).toBe("mixed");
    expect(methodWord("marked")).toBe("marked");
    expect(methodWord("derived")).toBe("");
    expect(methodWord(undefined)).toBe("");
  });
});

describe("windows are written as ranges, never with ±", () => {
  it("a symmetric angle window: true minus, explicit plus, degree sign on both ends", () => {
    expect(windowText({ min: -1, max: 1 }, "deg", true)).toBe("\u22121° to +1°");
    expect(windowText({ min: -1, max: 1 }, "deg", true)).not.toContain("±");
  });
  it("an asymmetric window keeps the decimals it needs; zero has no sign", () => {
    expect(windowText({ min: 0, max: 4 }, "deg", true)).toBe("0° to +4°");
    expect(windowText({ min: -0.5, max: 2.25 }, "deg", true)).toBe("\u22120.5° to +2.3°");
  });
  it("a spaced unit goes once, at the end; unsigned values get no plus", () => {
    expect(windowText({ min: 1.5, max: 2.2 }, "m/s", false)).toBe("1.5 to 2.2 m/s");
    expect(windowText({ min: 0.8, max: 1 }, "ratio", false)).toBe("0.8 to 1");
  });
});

describe("standing with the uncertainty", () => {
  const w = { min: -1, max: 1 }; // half the window: 1°
  it("is undecided when the uncertainty is wider than half the window", () => {
    expect(standing(0.2, w, 1.2)).toBe("undecided");
    expect(standing(5, w, 1.01)).toBe("undecided");
  });
  it("decides when the uncertainty is at most half the window", () => {
    expect(standing(0.2, w, 1)).toBe("in window");
    expect(standing(1.5, w, 0.3)).toBe("near");
    expect(standing(2.5, w, 0.3)).toBe("outside");
  });
  it("without an uncertainty it decides as before", () => {
    expect(standing(0.2, w, null)).toBe("in window");
    expect(standing(0.2, w)).toBe("in window");
  });
  it("a narrow 0.5° window: ±0.3° is already undecided", () => {
    expect(standing(0, { min: -0.25, max: 0.25 }, 0.3)).toBe("undecided");
  });
});

describe("the gauge's whisker", () => {
  it("widens the scale so the whisker stays on it", () => {
    // Window −1…1 with slack 1 reaches 2; value 2 ± 1 reaches 3, times 1.1 = 3.3.
    const at = gaugeScale(2, { min: -1, max: 1 }, 1);
    expect(at(0)).toBe(50);
    expect(at(3.3)).toBeCloseTo(100, 9);
    expect(at(-3.3)).toBeCloseTo(0, 9);
    expect(at(1.65)).toBeCloseTo(75, 9);
  });
});

const mark = (over: Partial<ReviewMark>): ReviewMark => ({ id: "m1", frame: 3, kind: "line", role: "face", points: [[0, 0], [10, 0]], version: 1, ...over });

describe("proposals", () => {
  it("a tracked mark is a proposal until the clip's tracking is accepted", () => {
    expect(isProposal(mark({ source: "tracked" }), null)).toBe(true);
    expect(isProposal(mark({ source: "tracked" }), "2026-12-02T15:00:00.000Z")).toBe(false);
  });
  it("hand marks, and marks from before tracking, are never proposals", () => {
    expect(isProposal(mark({ source: "hand" }), null)).toBe(false);
    expect(isProposal(mark({}), null)).toBe(false);
  });
  it("moving a proposal's points shows it as a hand mark at once; a role change alone does not", () => {
    const moved = movedByHand(mark({ source: "tracked", precisionPx: 0.2 }), { points: [[1, 1], [10, 0]] });
    expect(moved).toMatchObject({ source: "hand", precisionPx: null, points: [[1, 1], [10, 0]] });
    expect(movedByHand(mark({ source: "tracked" }), { role: "target" }).source).toBe("tracked");
  });
  it("T accepts all proposals, and the help overlay lists it", () => {
    expect(commandForKey({ key: "t", shiftKey: false, ctrlKey: false, metaKey: false, altKey: false })).toEqual({ type: "acceptProposals" });
    expect(KEY_HELP.find((k) => k.keys === "T")?.does).toMatch(/Accept the tracked marks/);
  });
});

describe("the tracker's summary line", () => {
  it("ball found, impact from the ball", () => {
    expect(trackingLine(true, { ballFound: true, impactSource: "ball", impactFrame: 212 })).toBe("Ball found · impact from the ball at frame 212");
  });
  it("no ball: impact from motion, or none", () => {
    expect(trackingLine(true, { ballFound: false, impactSource: "motion", impactFrame: 30 })).toBe("No ball found · impact from motion at frame 30");
    expect(trackingLine(true, { ballFound: false, impactSource: null, impactFrame: null })).toBe("No ball found · no impact found");
  });
  it("accepted, not yet tracked, and off", () => {
    expect(trackingLine(true, { ballFound: true, impactSource: "ball", impactFrame: 20, acceptedAt: "2026-12-02T15:00:00Z" })).toBe("Ball found · impact from the ball at frame 20 · accepted");
    expect(trackingLine(true, null)).toBe("Not tracked yet.");
    expect(trackingLine(false, { ballFound: true })).toBe("Tracking is off: only hand marks are measured.");
  });
  it("something to accept only when on, tracked and not yet accepted", () => {
    expect(canAccept(true, { ballFound: true })).toBe(true);
    expect(canAccept(true, { ballFound: true, acceptedAt: "2026-12-02T15:00:00Z" })).toBe(false);
    expect(canAccept(true, null)).toBe(false);
    expect(canAccept(false, { ballFound: true })).toBe(false);
  });
});

describe("the ground plane's sides while drawing", () => {
  const sizes = { widthMm: 500, heightMm: 300 };
  it("names corner 1 → 2 the width and 2 → 3 the height, at the sides' midpoints", () => {
    expect(planeSideLabels([[100, 100], [300, 100]], sizes)).toEqual([{ at: [200, 100], text: "width 500 mm" }]);
    expect(planeSideLabels([[100, 100], [300, 100], [300, 260]], sizes)).toEqual([
      { at: [200, 100], text: "width 500 mm" },
      { at: [300, 180], text: "height 300 mm" },
    ]);
  });
  it("one corner names nothing", () => {
    expect(planeSideLabels([[100, 100]], sizes)).toEqual([]);
  });
});

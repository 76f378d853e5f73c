// The spec carries each mean with its ± (standard error of the mean) and a putt's own ±, and its
// window as a range; the PDF embeds its font, so Debian's pdftotext reads back the true minus, ° and ±
// in their columns. Values written out by hand.
import { describe, expect, it } from "vitest";
import type { BuildComparison } from "@/lib/compare/compare";
import { freezeSpec, type SpecBuild } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";
import { specPdf } from "@/lib/server/pdf/spec-pdf";
import { pdftotext } from "../../support/pdf";

const build: SpecBuild = {
  label: "Blade 34", headModel: "Blade B1", neckStyle: "plumber", lengthIn: 34, lieDeg: 70, loftDeg: 3, offsetIn: null, toeHang: "slight",
  headMassG: 350, gripName: "Pistol 60", gripMassG: 60, shaftMassG: 110, balancePointIn: null, alignmentAid: "line", notes: "",
};
// Face at impact over 8 putts: mean −0.35°, sd 0.8°, each putt ±0.3°; standard error 0.8 / √8 = 0.283 → "±0.3°".
const comparison: BuildComparison = {
  buildId: "b1", label: "Blade 34", isBaseline: true, clipCount: 8, make: [], putts: [],
  stats: [{
    key: "face_angle_impact", label: "Face angle at impact", unit: "deg", window: { min: -1, max: 1 },
    summary: { n: 8, mean: -0.35, sd: 0.8, median: -0.3, min: -1.6, max: 0.9, range: 2.5, shareInWindow: 0.75 },
    noise: 0.3, spread: 0.8, meanUncertainty: 0.8 / Math.sqrt(8),
  }],
};
const input = {
  studioName: "Studio", golfer: { name: "Ada Green", handedness: "right" as const }, fitting: { id: "f1", scheduledAt: new Date("2026-01-02T09:00:00Z"), notes: "" },
  build, comparison, notes: "", buildShop: {}, issuedBy: "Fitter", issuedAt: new Date("2026-01-02T10:00:00Z"),
};
const measuredRow = (spec: ReturnType<typeof freezeSpec>) => specLines(spec).sections.find((s) => s.title.startsWith("Measured with"))!.rows[0]!;

describe("the spec's measurements with their precision", () => {
  it("mean ± its standard error, the spread, a putt's own ±, and the window as a range", () => {
    expect(measuredRow(freezeSpec(input))).toEqual([
      "Face angle at impact",
      "mean \u22120.3° ±0.3°, spread 0.8°, each putt ±0.3°, 8 putts, 75% in window (\u22121° to +1°)",
    ]);
  });
  it("a spec issued before uncertainties prints the mean alone", () => {
    const spec = freezeSpec(input);
    const old = { ...spec, keyMeasurements: spec.keyMeasurements.map((m) => ({ ...m, meanUncertainty: undefined, noise: undefined })) };
    expect(measuredRow(old)[1]).toBe("mean \u22120.3°, spread 0.8°, 8 putts, 75% in window (\u22121° to +1°)");
  });
  it("an uncertainty below the last shown digit never reads ±0.0", () => {
    const tiny = { ...comparison, stats: [{ ...comparison.stats[0]!, meanUncertainty: 0.02, noise: 0.04 }] };
    expect(measuredRow(freezeSpec({ ...input, comparison: tiny }))[1]).toContain("mean \u22120.3° ±<0.1°, spread 0.8°, each putt ±<0.1°");
  });
});

describe("the spec PDF as pdftotext reads it (Debian poppler-utils)", () => {
  it("the true minus, ° and ± print as themselves, label and value on one line in two columns", async () => {
    const text = await pdftotext(await specPdf(freezeSpec(input)));
    expect(text).toContain("\u22120.3° ±0.3°");
    expect(text).toContain("(\u22121° to +1°)");
    expect(text).toMatch(/Face angle at impact {2,}mean \u22120\.3°/);
    expect(text).toMatch(/Toe hang {2,}slight/);
    expect(text).toContain("Studio");
    expect(text).not.toMatch(/["\u201c\u201d]/);
  });
  it("a long value wraps inside its column instead of running off the page", async () => {
    const long = "Grip flat side square to the face, label up, two wraps of tape under the top hand, " .repeat(3);
    const text = await pdftotext(await specPdf(freezeSpec({ ...input, notes: long })));
    const lines = text.split("\n").filter((l) => /tape|wraps|label up/.test(l));
    expect(lines.length).toBeGreaterThan(2);
    // Every wrapped line starts in the value column, right of the labels.
    const column = lines[0]!.search(/\S/) === 0 ? lines[0]!.indexOf("Grip") : lines[0]!.search(/\S/);
    for (const l of lines.slice(1)) expect(l.search(/\S/)).toBe(column);
  });
});

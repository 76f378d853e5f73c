// The spec carries each mean with its ± (standard error of the mean) and a putt's own ±, and its
// window as a range; the PDF sets only characters its built-in font has. Values written out by hand.
import { describe, expect, it } from "vitest";
import type { BuildComparison } from "@/lib/compare/compare";
import { freezeSpec, type SpecBuild } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";
import { pdfText, specPdf } from "@/lib/server/pdf/spec-pdf";

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

describe("the spec PDF's text", () => {
  it("a true minus becomes a hyphen-minus; ± and ° stay (both are in Helvetica's WinAnsi set)", () => {
    expect(pdfText("\u22121° to +1° ±0.3°")).toBe("-1° to +1° ±0.3°");
  });
  it("the PDF holds the ± line in WinAnsi bytes: ± is 0xB1, ° is 0xB0, minus is 0x2D", async () => {
    const pdf = (await specPdf(freezeSpec(input), { compress: false })).toString("latin1");
    // pdfkit writes text as hex strings: "-0.3° ±0.3°" → 2d 30 2e 33 b0 20 b1 30 2e 33 b0.
    expect(pdf.toLowerCase()).toContain("2d302e33b020b1302e33b0");
    expect(pdf.toLowerCase()).not.toContain("2212302e33");
  });
});

import { windowText } from "@/lib/review/readout";
import { percent, signedDeg } from "./format";
import { metricDefinition } from "./metric-labels";
import type { SpecData } from "./spec-data";

export type SpecSection = { title: string; rows: [string, string][] };

const num = (v: number | null, unit: string, digits = 2) => (v === null ? "—" : `${Number(v.toFixed(digits))}${unit}`);
const text = (v: string) => (v.trim() === "" ? "—" : v);
const valueOf = (v: number, unit: string) => (unit === "deg" ? signedDeg(v) : `${v.toFixed(2)} ${unit}`);
const spreadOf = (v: number, unit: string) => (unit === "deg" ? `${v.toFixed(1)}°` : `${v.toFixed(2)} ${unit}`);
/** ± one standard error at the value's decimals; below the last digit "±<0.1°" (never a claimed ±0.0). */
const plusMinusOf = (u: number | null | undefined, unit: string) => {
  if (u == null || !Number.isFinite(u)) return "";
  const digits = unit === "deg" ? 1 : 2;
  const shown = Number(u.toFixed(digits)) > 0 ? u.toFixed(digits) : `<${(10 ** -digits).toFixed(digits)}`;
  return ` ±${shown}${unit === "deg" ? "°" : ` ${unit}`}`;
};
const windowOf = (m: SpecData["keyMeasurements"][number]) =>
  m.window ? ` (${windowText(m.window, m.unit, metricDefinition(m.key).signWords !== null)})` : "";

const leanText = (deg: number) => (deg === 0 ? "0°" : `${Number(Math.abs(deg).toFixed(1))}° ${deg > 0 ? "forward" : "back"}`);

/** The build's equipment-rule fields, only those recorded (older specs have none). */
function ruleRows(b: SpecData["build"]): [string, string][] {
  const rows: [string, string][] = [];
  if (b.designShaftLeanDeg != null) rows.push(["Designed shaft lean", leanText(b.designShaftLeanDeg)]);
  if (b.gripMaxWidthIn != null) rows.push(["Grip width (largest cross-section)", num(b.gripMaxWidthIn, " in")]);
  if (b.gripCount === 2) {
    const shape = b.gripsCircular == null ? "shape not recorded" : b.gripsCircular ? "both round" : "not round";
    rows.push(["Grips", `two, ${b.gripGapIn == null ? "gap not recorded" : `${num(b.gripGapIn, " in")} apart`}, ${shape}`]);
  }
  return rows;
}

/** The spec as labelled lines, shared by the printable page, the PDF and the e-mail. */
export function specLines(spec: SpecData) {
  const s = spec.buildShop;
  const sections: SpecSection[] = [
    {
      title: "Build shop",
      rows: [
        ["Head", text(s.head)], ["Neck", text(s.neck)], ["Length", num(s.lengthIn, " in")], ["Lie", num(s.lieDeg, "°", 1)],
        ["Loft", num(s.loftDeg, "°", 1)], ["Offset", num(spec.build.offsetIn, " in")], ["Toe hang", text(spec.build.toeHang)],
        ...ruleRows(spec.build), ["Grip", text(s.grip)], ["Grip mass", num(spec.build.gripMassG, " g", 1)], ["Grip orientation", text(s.gripOrientation)],
        ["Head mass", num(s.headMassG, " g", 1)], ["Shaft mass", num(spec.build.shaftMassG, " g", 1)], ["Balance point", num(spec.build.balancePointIn, " in from the grip end")],
        ["Swing weight", text(s.swingWeight)], ["Alignment aid", text(spec.build.alignmentAid)], ["Finish notes", text(s.finishNotes)],
      ],
    },
  ];
  if (spec.keyMeasurements.length > 0) {
    sections.push({
      title: `Measured with this build (${spec.build.label})`,
      rows: spec.keyMeasurements.map((m) => [
        m.label,
        `mean ${valueOf(m.mean, m.unit)}${plusMinusOf(m.meanUncertainty, m.unit)}${m.sd === null ? "" : `, spread ${spreadOf(m.sd, m.unit)}`}` +
          `${m.noise == null ? "" : `, each putt${plusMinusOf(m.noise, m.unit)}`}, ${m.n} putts` +
          `${m.shareInWindow === null ? "" : `, ${percent(m.shareInWindow)} in window${windowOf(m)}`}`,
      ]),
    });
  }
  const chances = spec.makeChances.filter((c) => c.probability !== null);
  if (chances.length > 0) sections.push({ title: "Estimated share holed (from start direction)", rows: chances.map((c) => [`${c.distanceFt} ft`, percent(c.probability!)]) });
  if (spec.warnings.length > 0) sections.push({ title: "Equipment rules", rows: spec.warnings.map((w) => [w.rule, w.message]) });
  if (spec.notes.trim()) sections.push({ title: "Notes", rows: [["Fitter's notes", spec.notes]] });
  return {
    subtitle: `${spec.studioName} · fitting of ${new Date(spec.fitting.date).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })} · issued ${new Date(spec.issuedAt).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" })} by ${spec.issuedBy} · ${spec.golfer.handedness}-handed`,
    sections,
    footer: "This spec records the putter chosen at the fitting; it measures equipment and strokes and gives no medical advice.",
  };
}

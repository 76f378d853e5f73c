import { describe, expect, it } from "vitest";
import { csvText, measurementsCsv, measurementsCsvWide, MEASUREMENT_CSV_HEADER } from "@/lib/compare/csv";
import { freezeSpec, type SpecBuild } from "@/lib/compare/spec-data";
import { specLines } from "@/lib/compare/spec-lines";

describe("measurements CSV (RFC 4180)", () => {
  const row = { fittingId: "f1", buildPosition: 1, buildLabel: 'Blade, "heavy"', clipId: "c1", view: "overhead", clipCreatedAt: new Date("2026-01-01T10:00:00Z"), key: "face_angle_impact", value: -0.75, unit: "deg", method: "derived" };
  it("one line per measurement, quoted where needed, CRLF line ends, empty for a value not computed", () => {
    const text = measurementsCsv([row, { ...row, key: "path", value: null }]);
    expect(text.split("\r\n")).toEqual([
      "fitting_id,build_position,build_label,clip_id,view,clip_recorded_at,key,value,uncertainty,unit,method",
      'f1,1,"Blade, ""heavy""",c1,overhead,2026-01-01T10:00:00.000Z,face_angle_impact,-0.8,,deg,derived',
      "f1,1,\"Blade, \"\"heavy\"\"\",c1,overhead,2026-01-01T10:00:00.000Z,path,,,deg,derived",
      "",
    ]);
    expect(MEASUREMENT_CSV_HEADER.join(",")).toBe("fitting_id,build_position,build_label,clip_id,view,clip_recorded_at,key,value,uncertainty,unit,method");
  });
  it("the uncertainty (one standard error) sits right after the value, both at the screen's precision (0.1°)", () => {
    const line = measurementsCsv([{ ...row, value: 1.4, uncertainty: 0.3125, method: "tracked" }]).split("\r\n")[1];
    expect(line).toBe('f1,1,"Blade, ""heavy""",c1,overhead,2026-01-01T10:00:00.000Z,face_angle_impact,1.4,0.3,deg,tracked');
    // −0.04° rounds to 0.0 (never "-0.0"); an uncertainty of 0.02° is written 0.1, never a claimed 0.0.
    const tiny = measurementsCsv([{ ...row, value: -0.04, uncertainty: 0.02 }]).split("\r\n")[1];
    expect(tiny).toContain("face_angle_impact,0.0,0.1,deg");
  });
  it("the wide layout: one row per putt, a value and an uncertainty column per measurement", () => {
    const text = measurementsCsvWide([
      { ...row, value: -0.75, uncertainty: 0.31 },
      { ...row, key: "ball_speed", unit: "m/s", value: 1.8349, uncertainty: 0.012 },
      { ...row, clipId: "c2", value: 0.2 },
    ]);
    expect(text.split("\r\n")).toEqual([
      "fitting_id,build_position,build_label,clip_id,view,clip_recorded_at,face_angle_impact_deg,face_angle_impact_deg_se,ball_speed_m_s,ball_speed_m_s_se",
      'f1,1,"Blade, ""heavy""",c1,overhead,2026-01-01T10:00:00.000Z,-0.8,0.3,1.83,0.01',
      'f1,1,"Blade, ""heavy""",c2,overhead,2026-01-01T10:00:00.000Z,0.2,,,',
      "",
    ]);
  });
  it("a text cell that would run as a spreadsheet formula is defused (OWASP CSV injection)", () => {
    expect(csvText("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvText("plain")).toBe("plain");
  });
});

describe("freezing a spec", () => {
  const build: SpecBuild = {
    label: "Mallet 34", headModel: "Mallet M2", neckStyle: "plumber", lengthIn: 34, lieDeg: 70, loftDeg: 3, offsetIn: null, toeHang: "slight",
    headMassG: 350, gripName: "Pistol 60", gripMassG: 60, shaftMassG: 110, balancePointIn: null, alignmentAid: "line", notes: "",
  };
  const input = {
    studioName: "Studio", golfer: { name: "Ada Green", handedness: "right" as const }, fitting: { id: "f1", scheduledAt: new Date("2026-01-02T09:00:00Z"), notes: "" },
    build, comparison: null, notes: "Keep the grip label up", buildShop: { gripOrientation: "label up", loftDeg: 2.5 }, issuedBy: "Fitter", issuedAt: new Date("2026-01-02T10:00:00Z"),
  };
  it("takes build-shop fields from the build unless given", () => {
    const spec = freezeSpec(input);
    expect(spec.buildShop).toMatchObject({ head: "Mallet M2", neck: "plumber", lengthIn: 34, lieDeg: 70, loftDeg: 2.5, grip: "Pistol 60", gripOrientation: "label up", headMassG: 350 });
    expect(spec.swingWeight?.method).toBe("estimate");
  });
  it("is a copy: changing the build afterwards changes nothing in the spec", () => {
    const spec = freezeSpec(input);
    build.lengthIn = 35;
    input.golfer.name = "Someone else";
    expect(spec.build.lengthIn).toBe(34);
    expect(spec.golfer.name).toBe("Ada Green");
  });
  it("carries the equipment-rule warnings of the issued numbers (Equipment Rules, Part 2: loft at most 10°)", () => {
    expect(freezeSpec({ ...input, buildShop: { loftDeg: 10.5 } }).warnings.map((w) => w.field)).toEqual(["loftDeg"]);
    expect(freezeSpec({ ...input, buildShop: { loftDeg: 10 } }).warnings).toEqual([]);
  });
  it("carries the build's shaft-lean and grip warnings (Equipment Rules, Part 2, 1d(ii) and 3c) and prints those fields", () => {
    const twoGrips = { ...build, designShaftLeanDeg: -10.5, gripMaxWidthIn: 1.5, gripCount: 2, gripsCircular: true, gripGapIn: 1.4 };
    const spec = freezeSpec({ ...input, build: twoGrips, buildShop: {} });
    expect(spec.warnings.map((w) => w.field)).toEqual(["designShaftLeanDeg", "gripGapIn"]);
    const shop = specLines(spec).sections.find((x) => x.title === "Build shop")!.rows;
    expect(shop).toEqual(expect.arrayContaining([["Designed shaft lean", "10.5° back"], ["Grip width (largest cross-section)", "1.5 in"], ["Grips", "two, 1.4 in apart, both round"]]));
  });
  it("a spec issued before the grip fields existed prints no rows for them", () => {
    const shop = specLines(freezeSpec(input)).sections.find((x) => x.title === "Build shop")!.rows.map(([label]) => label);
    expect(shop).toEqual(["Head", "Neck", "Length", "Lie", "Loft", "Offset", "Toe hang", "Grip", "Grip mass", "Grip orientation", "Head mass", "Shaft mass", "Balance point", "Swing weight", "Alignment aid", "Finish notes"]);
  });
});

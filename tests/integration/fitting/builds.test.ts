// Builds through the API: units and steps, equipment-rule warnings at the limits (R&A/USGA
// Equipment Rules 2019, Part 2), duplicating with one change, and swing weight.
import { beforeAll, describe, expect, it } from "vitest";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";

let w: World;
let fitter: { cookie: string };
const post = (body: object) => call(fitter, "POST", `/api/fittings/${w.own.fitting.id}/builds`, { label: "Test", ...body });
const fields = (r: { body: { warnings: { field: string; rule: string }[] } }) => r.body.warnings.map((x) => x.field);

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
});

describe("equipment-rule warnings at the limits (Equipment Rules 2019, Part 2)", () => {
  it("loft: 10.0° passes, 10.5° warns citing the rule", async () => {
    expect(fields(await post({ loftDeg: 10 }))).toEqual([]);
    const over = await post({ loftDeg: 10.5 });
    expect(over.status).toBe(201);
    expect(over.body.warnings).toEqual([expect.objectContaining({ field: "loftDeg", rule: expect.stringContaining("putter loft at most 10°") })]);
  });
  it("lie: 80.0° passes, 80.5° warns (shaft at least 10° from vertical)", async () => {
    expect(fields(await post({ lieDeg: 80 }))).toEqual([]);
    expect(fields(await post({ lieDeg: 80.5 }))).toEqual(["lieDeg"]);
  });
  it("length: 18 in passes, 17.75 in warns (club length at least 18 in)", async () => {
    expect(fields(await post({ lengthIn: 18 }))).toEqual([]);
    expect(fields(await post({ lengthIn: 17.75 }))).toEqual(["lengthIn"]);
  });
  it("the fitting lists its builds with their warnings", async () => {
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}`);
    expect(res.body.builds.filter((b: { warnings: unknown[] }) => b.warnings.length > 0)).toHaveLength(3);
  });
});

describe("shaft-lean and grip warnings at the limits (Equipment Rules 2019, Part 2, 1d(ii), 3b(iii), 3c)", () => {
  it("designed shaft lean: 20.0° forward passes, 20.5° warns; 10.0° back passes, 10.5° warns (1d(ii))", async () => {
    expect(fields(await post({ designShaftLeanDeg: 20 }))).toEqual([]);
    const forward = await post({ designShaftLeanDeg: 20.5 });
    expect(forward.status).toBe(201);
    expect(forward.body.designShaftLeanDeg).toBe(20.5);
    expect(forward.body.warnings).toEqual([expect.objectContaining({ field: "designShaftLeanDeg", rule: expect.stringContaining("1d(ii)") })]);
    expect(fields(await post({ designShaftLeanDeg: -10 }))).toEqual([]);
    expect(fields(await post({ designShaftLeanDeg: -10.5 }))).toEqual(["designShaftLeanDeg"]);
  });
  it("grip width: 1.75 in passes, 1.76 in warns (3b(iii))", async () => {
    expect(fields(await post({ gripMaxWidthIn: 1.75 }))).toEqual([]);
    expect(fields(await post({ gripMaxWidthIn: 1.76 }))).toEqual(["gripMaxWidthIn"]);
  });
  it("two grips: round and 1.5 in apart pass, 1.4 in apart warns, not round warns (3c)", async () => {
    const ok = await post({ gripCount: 2, gripsCircular: true, gripGapIn: 1.5 });
    expect(ok.body).toMatchObject({ gripCount: 2, gripsCircular: true, gripGapIn: 1.5, warnings: [] });
    expect(fields(await post({ gripCount: 2, gripsCircular: true, gripGapIn: 1.4 }))).toEqual(["gripGapIn"]);
    expect(fields(await post({ gripCount: 2, gripsCircular: false, gripGapIn: 2 }))).toEqual(["gripsCircular"]);
  });
  it("a new build has one grip; a gap without two grips and a third grip are refused with the field named", async () => {
    expect((await post({})).body).toMatchObject({ gripCount: 1, gripsCircular: null, gripGapIn: null, gripMaxWidthIn: null, designShaftLeanDeg: null });
    const gap = await post({ gripGapIn: 2 });
    expect(gap.status).toBe(400);
    expect(gap.body.error.issues).toEqual([expect.objectContaining({ path: "gripGapIn", message: expect.stringContaining("two grips") })]);
    const three = await post({ gripCount: 3 });
    expect(three.status).toBe(400);
    expect(three.body.error.issues.map((i: { path: string }) => i.path)).toEqual(["gripCount"]);
  });
  it("a change to the lean recomputes the warnings in the answer", async () => {
    const b = await post({ designShaftLeanDeg: 0 });
    const patched = await call(fitter, "PATCH", `/api/builds/${b.body.id}`, { designShaftLeanDeg: -12 });
    expect(patched.status).toBe(200);
    expect(patched.body.warnings.map((x: { field: string }) => x.field)).toEqual(["designShaftLeanDeg"]);
  });
});

describe("units and steps", () => {
  it("length in steps of 0.25 in, lie and loft in steps of 0.5°", async () => {
    const bad = await post({ lengthIn: 34.1, loftDeg: 3.2 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["lengthIn", "loftDeg"]);
    expect((await post({ lengthIn: 34.25, lieDeg: 70.5, loftDeg: 3.5, headMassG: 350 })).status).toBe(201);
  });
});

describe("duplicate a build changing one thing", () => {
  it("copies every field, applies the change, goes last and is not a baseline", async () => {
    const source = await post({ label: "Blade", headModel: "Blade B1", lengthIn: 34, lieDeg: 70, loftDeg: 3, headMassG: 350, gripMassG: 60, shaftMassG: 110, isBaseline: true });
    const copy = await call(fitter, "POST", `/api/builds/${source.body.id}/duplicate`, { label: "Blade 35", change: { lengthIn: 35 } });
    expect(copy.status).toBe(201);
    expect(copy.body).toMatchObject({ label: "Blade 35", headModel: "Blade B1", lengthIn: 35, lieDeg: 70, loftDeg: 3, headMassG: 350, isBaseline: false, fittingId: w.own.fitting.id });
    expect(copy.body.position).toBeGreaterThan(source.body.position);
    expect(copy.body.id).not.toBe(source.body.id);
    // swing weight (14 in fulcrum): one more inch adds moment; both are estimates from the components
    expect(copy.body.swingWeight.method).toBe("estimate");
    expect(copy.body.swingWeight.points).toBeGreaterThan(source.body.swingWeight.points);
  });
  it("refuses a change that breaks the steps", async () => {
    const res = await call(fitter, "POST", `/api/builds/${w.own.build.id}/duplicate`, { change: { lieDeg: 70.2 } });
    expect(res.status).toBe(400);
  });
});

// Studio settings: admin only; validated; the comparison uses the saved windows.
import { beforeAll, describe, expect, it } from "vitest";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { addMeasuredClips } from "./helpers";

let w: World;
let admin: { cookie: string };
let fitter: { cookie: string };
const valid = { units: "m", frictionMu: 0.25, windows: { face_angle_impact: { min: -0.5, max: 0.5 } }, cameraFps: { overhead: 500, "face-on": 240, "down-the-line": 1000 } };

beforeAll(async () => {
  w = await makeWorld();
  admin = { cookie: (await signIn(w.admin.email, PASSWORD)).cookie! };
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
});

describe("studio settings", () => {
  it("the admin reads and replaces them", async () => {
    expect((await call(admin, "PUT", "/api/studio/settings", valid)).status).toBe(200);
    expect((await call(admin, "GET", "/api/studio/settings")).body).toEqual(valid);
  });
  it("a fitter may not", async () => {
    expect((await call(fitter, "GET", "/api/studio/settings")).status).toBe(403);
    expect((await call(fitter, "PUT", "/api/studio/settings", valid)).status).toBe(403);
  });
  it("refuses a window upside down, a μ of 0 and a capture rate below 24 fps, naming the fields", async () => {
    const res = await call(admin, "PUT", "/api/studio/settings", { ...valid, frictionMu: 0, windows: { path: { min: 2, max: -2 } }, cameraFps: { ...valid.cameraFps, overhead: 10 } });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["cameraFps.overhead", "frictionMu", "windows.path.max"]);
  });
  it("the comparison counts putts inside the saved window", async () => {
    await addMeasuredClips(w, w.own.build, [0.4, 0.6, -0.5].map((v) => ({ face_angle_impact: v })));
    const res = await call(fitter, "GET", `/api/fittings/${w.own.fitting.id}/comparison`);
    expect(res.body.units).toBe("m");
    expect(res.body.builds[0].stats[0].summary.shareInWindow).toBeCloseTo(2 / 3, 12);
  });
});

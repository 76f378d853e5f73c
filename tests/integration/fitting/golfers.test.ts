// Golfers: intake with consent (a guardian's for a minor), and the list's server-side search, sort and pages.
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { call, signIn } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";

let w: World;
let fitter: { cookie: string };

beforeAll(async () => {
  w = await makeWorld();
  fitter = { cookie: (await signIn(w.fitter.email, PASSWORD)).cookie! };
});

describe("intake", () => {
  const intake = { puttingStyle: "claw", usualMiss: "left", ball: "urethane", greenSpeedFt: 10.5, heightCm: 178, currentPutter: { headStyle: "blade", lengthIn: 35, lieDeg: 70, loftDeg: 3, grip: "pistol" }, notes: "prefers a heavy feel" };
  it("stores the intake and the golfer's own consent to video", async () => {
    const res = await call(fitter, "POST", "/api/golfers", { name: "Iris Vale", email: "Iris@Example.test", handedness: "left", intake, consent: { given: true, by: "golfer" } });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: "Iris Vale", email: "iris@example.test", handedness: "left", intake, videoConsentBy: "golfer" });
    expect(res.body.videoConsentAt).not.toBeNull();
  });
  it("a minor needs a named guardian's consent; the errors name the fields", async () => {
    const bad = await call(fitter, "POST", "/api/golfers", { name: "Teo Vale", isMinor: true, consent: { given: true, by: "golfer" } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["consent.by"]);
    const noName = await call(fitter, "POST", "/api/golfers", { name: "Teo Vale", isMinor: true, consent: { given: true, by: "guardian" } });
    expect(noName.body.error.issues.map((i: { path: string }) => i.path)).toEqual(["consent.guardianName"]);
    const ok = await call(fitter, "POST", "/api/golfers", { name: "Teo Vale", isMinor: true, consent: { given: true, by: "guardian", guardianName: "Ana Vale" } });
    expect(ok.status).toBe(201);
    expect(ok.body.videoConsentBy).toBe("guardian: Ana Vale");
  });
  it("out-of-range intake numbers are refused with their field", async () => {
    const res = await call(fitter, "POST", "/api/golfers", { name: "X", intake: { greenSpeedFt: 30, currentPutter: { loftDeg: 11 } } });
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(["intake.currentPutter.loftDeg", "intake.greenSpeedFt"]);
  });
});

describe("GET /api/golfers: search, sort, pages (server side)", () => {
  let studio: World;
  let admin: { cookie: string };
  beforeAll(async () => {
    studio = await makeWorld();
    admin = { cookie: (await signIn(studio.admin.email, PASSWORD)).cookie! };
    const names = ["Zed Able", "Amy Stone", "Bea Stone", "Cal Reed", "Dee Marsh"];
    const rows = await db.insert(schema.golfers).values(names.map((name, i) => ({ studioId: studio.studioA.id, name, updatedAt: new Date(Date.UTC(2026, 0, 1 + i)) }))).returning();
    await db.insert(schema.fittings).values([
      { studioId: studio.studioA.id, golferId: rows[3]!.id, scheduledAt: new Date(Date.UTC(2026, 5, 1)) },
      { studioId: studio.studioA.id, golferId: rows[1]!.id, scheduledAt: new Date(Date.UTC(2026, 4, 1)) },
    ]);
  });
  const names = (r: { body: { golfers: { name: string }[] } }) => r.body.golfers.map((g) => g.name);

  it("sorts by name and pages with a total", async () => {
    const page1 = await call(admin, "GET", "/api/golfers?sort=name&dir=asc&limit=3&offset=0");
    expect(page1.body.total).toBe(7); // five here plus the world's two golfers
    expect(names(page1)).toEqual(["Amy Stone", "Bea Stone", "Cal Reed"]);
    const pages = await Promise.all([0, 3, 6].map((o) => call(admin, "GET", `/api/golfers?sort=name&dir=asc&limit=3&offset=${o}`)));
    const all = pages.flatMap(names);
    expect(all).toHaveLength(7);
    expect(new Set(all).size).toBe(7);
    const desc = await call(admin, "GET", "/api/golfers?sort=name&dir=desc&limit=7");
    expect(names(desc)).toEqual([...all].reverse());
  });
  it("searches by the start of a word in the name", async () => {
    expect(names(await call(admin, "GET", "/api/golfers?q=stone"))).toEqual(["Amy Stone", "Bea Stone"]);
    expect(names(await call(admin, "GET", "/api/golfers?q=ze"))).toEqual(["Zed Able"]);
    expect((await call(admin, "GET", "/api/golfers?q=%25")).body.total).toBe(0); // a wildcard is taken literally
  });
  it("sorts by last fitting (golfers never fitted last) and by update time", async () => {
    const byFitting = await call(admin, "GET", "/api/golfers?sort=lastFitting&dir=asc&limit=7");
    expect(names(byFitting).slice(0, 2)).toEqual(["Amy Stone", "Cal Reed"]);
    expect(byFitting.body.golfers[1].lastFittingAt).toBe("2026-06-01T00:00:00.000Z");
    expect(byFitting.body.golfers.slice(4).map((g: { lastFittingAt: string | null }) => g.lastFittingAt)).toEqual([null, null, null]);
    expect(names(await call(admin, "GET", "/api/golfers?q=stone&sort=updated&dir=desc"))).toEqual(["Bea Stone", "Amy Stone"]);
  });
  it("refuses an unknown sort", async () => {
    expect((await call(admin, "GET", "/api/golfers?sort=email")).status).toBe(400);
  });
});

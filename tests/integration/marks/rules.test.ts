// What the marks API refuses and why: bad geometry, clips not ready, stale versions, roles.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { call, signIn, type Auth } from "../../support/http";
import { makeWorld, PASSWORD, tokenFor, type World } from "../../support/world";
import { insertClip } from "../../support/clip-rows";

let w: World;
let fitter: Auth, coach: Auth, golfer: Auth, otherAdmin: Auth;
let clipId = "";
const marksPath = () => `/api/clips/${clipId}/marks`;
// 5 px per frame with a 50 px ball scale at 240 fps (the test clip's capture rate), in m/s; the
// ball is 42.67 mm across (R&A/USGA Equipment Rules 2019, Appendix III).
const FIVE_PX_PER_FRAME_SPEED = ((5 * 42.67) / 50) * 240 / 1000;
const ball = (frame: number, x = 640, y = 300) => ({ frame, kind: "point", role: "ball", points: [[x, y]] });

beforeAll(async () => {
  w = await makeWorld();
  fitter = { token: (await tokenFor(w.fitter.id)).value };
  coach = { cookie: (await signIn(w.coach.email, PASSWORD)).cookie! };
  golfer = { cookie: (await signIn(w.own.account.email, PASSWORD)).cookie! };
  otherAdmin = { token: (await tokenFor(w.otherAdmin.id)).value };
  clipId = (await insertClip(w.own)).id;
});

describe("a bad mark gets 400 validation_failed with a clear message", () => {
  const cases: [string, unknown, RegExp][] = [
    ["a point outside the frame", ball(10, 1400, 300), /outside the 1280×720 frame/],
    ["a negative coordinate", ball(10, -3, 300), /outside the 1280×720 frame/],
    ["a NaN (sent as JSON null)", { frame: 10, kind: "point", role: "ball", points: [[NaN, 300]] }, /not a finite number/],
    ["a frame beyond the clip", ball(480), /Frame 480 is outside the clip, which has frames 0 to 479/],
    ["a zero-length line", { frame: 10, kind: "line", role: "face", points: [[500, 300], [500, 300]] }, /zero length/],
    ["a role that does not fit the view", { frame: 10, kind: "line", role: "sole", points: [[500, 300], [600, 300]] }, /sole line does not belong on a overhead clip/],
    ["a line with one point", { frame: 10, kind: "line", role: "face", points: [[500, 300]] }, /points/],
  ];
  for (const [what, body, message] of cases) {
    it(`refuses ${what}`, async () => {
      const res = await call(fitter, "POST", marksPath(), body);
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("validation_failed");
      expect(res.body.error.message).toMatch(message);
      expect(res.body.error.issues.length).toBeGreaterThan(0);
    });
  }

  it("refuses a change that would make a stored mark bad, and keeps the mark as it was", async () => {
    const made = await call(fitter, "POST", marksPath(), ball(20));
    const res = await call(fitter, "PATCH", `${marksPath()}/${made.body.mark.id}`, { version: 1, points: [[2000, 10]] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/outside the 1280×720 frame/);
    const list = await call(fitter, "GET", marksPath());
    expect(list.body.marks.find((m: { id: string }) => m.id === made.body.mark.id)).toMatchObject({ version: 1, points: [[640, 300]] });
  });
});

describe("clip state", () => {
  for (const [state, reason] of [["processing", /still being processed/], ["failed", /failed to process \(the file has no video stream\)/]] as const) {
    it(`refuses a mark on a ${state} clip with 422 and the reason`, async () => {
      const clip = await insertClip(w.own, { state, failureReason: state === "failed" ? "the file has no video stream" : null });
      const res = await call(fitter, "POST", `/api/clips/${clip.id}/marks`, ball(10));
      expect(res.status).toBe(422);
      expect(res.body.error.code).toBe("unprocessable");
      expect(res.body.error.message).toMatch(reason);
    });
  }
});

describe("versions", () => {
  it("starts at 1, counts every change, and refuses a stale PATCH or DELETE with 409", async () => {
    const made = await call(fitter, "POST", marksPath(), ball(30));
    const path = `${marksPath()}/${made.body.mark.id}`;
    expect(made.body.mark.version).toBe(1);
    const first = await call(fitter, "PATCH", path, { version: 1, points: [[650, 300]] });
    expect(first.status).toBe(200);
    expect(first.body.mark).toMatchObject({ version: 2, points: [[650, 300]], frame: 30 });
    const stale = await call(fitter, "PATCH", path, { version: 1, points: [[660, 300]] });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "conflict" });
    expect(stale.body.error.message).toMatch(/changed by someone else \(version 2, you sent 1\)/);
    expect((await call(fitter, "DELETE", `${path}?version=1`)).status).toBe(409);
    expect((await call(fitter, "PATCH", path, { points: [[660, 300]] })).status).toBe(400);
    expect((await call(fitter, "DELETE", `${path}?version=2`)).status).toBe(200);
    expect((await call(fitter, "DELETE", `${path}?version=2`)).status).toBe(404);
  });

  it("takes the DELETE version from a JSON body too", async () => {
    const made = await call(fitter, "POST", marksPath(), ball(31));
    expect((await call(fitter, "DELETE", `${marksPath()}/${made.body.mark.id}`, { version: 1 })).status).toBe(200);
  });
});

describe("who may draw", () => {
  it("lets the golfer read but not draw", async () => {
    expect((await call(golfer, "GET", marksPath())).status).toBe(200);
    const res = await call(golfer, "POST", marksPath(), ball(40));
    expect(res.status).toBe(403);
  });

  it("hides another studio's clip (404)", async () => {
    expect((await call(otherAdmin, "POST", marksPath(), ball(40))).status).toBe(404);
    expect((await call(otherAdmin, "GET", `/api/clips/${clipId}/measurements`)).status).toBe(404);
  });

  it("lets a coach add and change its own marks but not the fitter's", async () => {
    const fitters = await call(fitter, "POST", marksPath(), ball(50));
    const own = await call(coach, "POST", marksPath(), ball(51));
    expect(own.status).toBe(201);
    expect(own.body.mark.authorUserId).toBe(w.coach.id);
    expect((await call(coach, "PATCH", `${marksPath()}/${own.body.mark.id}`, { version: 1, frame: 52 })).status).toBe(200);
    const refused = await call(coach, "PATCH", `${marksPath()}/${fitters.body.mark.id}`, { version: 1, frame: 53 });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/only the marks it drew/);
    expect((await call(coach, "DELETE", `${marksPath()}/${fitters.body.mark.id}?version=1`)).status).toBe(403);
    expect((await call(coach, "DELETE", `${marksPath()}/${own.body.mark.id}?version=2`)).status).toBe(200);
    expect((await call(fitter, "DELETE", `${marksPath()}/${fitters.body.mark.id}?version=1`)).status).toBe(200);
  });

  it("keeps clip settings and moments to the studio's staff", async () => {
    expect((await call(coach, "PATCH", `/api/clips/${clipId}`, { captureFps: 480 })).status).toBe(403);
    expect((await call(coach, "PUT", `/api/clips/${clipId}/moments`, { impact: 290 })).status).toBe(403);
  });
});

describe("moments", () => {
  it("refuses a frame outside the clip and moments out of order, with the reason", async () => {
    const outside = await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { finish: 480 });
    expect(outside.status).toBe(400);
    expect(outside.body.error.message).toMatch(/finish frame 480 is outside the clip/);
    const order = await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { address: 320 });
    expect(order.status).toBe(400);
    expect(order.body.error.message).toMatch(/impact \(frame 300\) comes before address \(frame 320\)/);
  });

  it("confirms the suggested impact, clears a moment with null, and keeps unnamed ones", async () => {
    const res = await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { address: 20, impact: 299, finish: null });
    expect(res.status).toBe(200);
    expect(res.body.clip.moments).toEqual({ address: 20, takeaway: null, top: null, impact: 299, finish: null });
    const cleared = await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { address: null });
    expect(cleared.body.clip.moments).toMatchObject({ address: null, impact: 299 });
  });
});

describe("concurrent changes", () => {
  it("stores measurements that match every mark after many simultaneous saves", async () => {
    const clip = await insertClip(w.own);
    const path = `/api/clips/${clip.id}/marks`;
    await call(fitter, "POST", path, { frame: 0, kind: "scale", role: "ball", points: [[600, 400], [650, 400]] });
    const frames = Array.from({ length: 20 }, (_, i) => 301 + i);
    const made = await Promise.all(frames.map((f) => call(fitter, "POST", path, ball(f, 640 + (f - 300) * 5, 400))));
    expect(made.map((r) => r.status)).toEqual(frames.map(() => 201));
    const [stored] = await db.select().from(schema.measurements).where(eq(schema.measurements.clipId, clip.id)).then((rows) => rows.filter((r) => r.key === "ball_speed"));
    const ballIds = made.map((r) => r.body.mark.id as string);
    expect(stored!.markIds).toEqual(expect.arrayContaining(ballIds));
    expect(stored!.value!).toBeCloseTo(FIVE_PX_PER_FRAME_SPEED, 9);
  });

  it("serves a measurement computed from the current marks when the stored one is from an older revision", async () => {
    const clip = await insertClip(w.own);
    const path = `/api/clips/${clip.id}/marks`;
    await call(fitter, "POST", path, { frame: 0, kind: "scale", role: "ball", points: [[600, 400], [650, 400]] });
    await call(fitter, "POST", path, ball(301, 645, 400));
    await call(fitter, "POST", path, ball(302, 650, 400));
    // As if a save had stopped between its change (which bumps the revision) and its recomputation.
    const rows = () => db.select().from(schema.measurements).where(eq(schema.measurements.clipId, clip.id));
    await db.update(schema.measurements).set({ value: 99 }).where(eq(schema.measurements.clipId, clip.id));
    await db.update(schema.clips).set({ measureRevision: (await rows())[0]!.measureRevision + 1 }).where(eq(schema.clips.id, clip.id));
    const res = await call(fitter, "GET", `/api/clips/${clip.id}/measurements`);
    const speed = res.body.measurements.find((m: { key: string }) => m.key === "ball_speed");
    expect(speed.value).toBeCloseTo(FIVE_PX_PER_FRAME_SPEED, 9);
    // The next save stores the current values again.
    await call(fitter, "POST", path, ball(303, 655, 400));
    const stored = (await rows()).find((r) => r.key === "ball_speed")!;
    expect(stored.value).toBeCloseTo(FIVE_PX_PER_FRAME_SPEED, 9);
  });

  it("answers saves that race the clip's deletion with 200, 404 or 409, never an error", async () => {
    const clip = await insertClip(w.own);
    const path = `/api/clips/${clip.id}/marks`;
    const drawn = await Promise.all(Array.from({ length: 10 }, (_, i) => call(fitter, "POST", path, ball(301 + i, 640 + i, 300))));
    const saves = drawn.map((r) => call(fitter, "PATCH", `${path}/${r.body.mark.id}`, { version: 1, points: [[700, 300]] }));
    await db.delete(schema.clips).where(eq(schema.clips.id, clip.id));
    const statuses = (await Promise.all(saves)).map((r) => r.status);
    expect(statuses.every((s) => [200, 404, 409].includes(s)), statuses.join(",")).toBe(true);
    expect(await db.select().from(schema.marks).where(eq(schema.marks.clipId, clip.id))).toEqual([]);
  });
});

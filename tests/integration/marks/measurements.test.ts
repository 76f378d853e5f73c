/**
 * Marks drawn through the API on a clip whose truth is known (the synthetic overhead stroke
 * of tests/fixtures/generate-clips.ts), checked against that truth. The expected angles are
 * set by construction from explicit angles and plain trigonometry (docs/measurements.md, overhead
 * view), so the API must give them back to 0.1°; ball speed = px per frame × mm per px
 * (ball diameter 42.67 mm, R&A/USGA Equipment Rules, Appendix III) × capture fps, to 1%.
 */
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { clipTruth, STANDARD_CLIPS, type ClipOptions, type Point } from "@/tests/fixtures/generate-clips";
import { call, type Auth } from "../../support/http";
import { makeWorld, tokenFor, type World } from "../../support/world";
import { insertClip } from "../../support/clip-rows";

const PATH_DEG = 2;
const options: ClipOptions = { ...STANDARD_CLIPS["overhead-240-720p.mp4"]!, pathDeg: PATH_DEG };
const truth = clipTruth(options);
const impact = options.impactFrame; // 300
const ADDRESS = 40; // still at address (the backswing starts at frame 84 for this stroke)
const frameTruth = (f: number) => truth.frames[f]!;
const mid = (a: Point, b: Point): [number, number] => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
const faceLine = (f: number) => ({ frame: f, kind: "line", role: "face", points: [frameTruth(f).faceHeel, frameTruth(f).faceToe] });
const ballAtRest = frameTruth(impact).ballCentre;

// Truth from the construction: the face turns linearly from the top (frame 228) to impact.
const TOP = 228;
const ratePerSecond = ((options.faceAngleImpactDeg - options.faceAngleAddressDeg) / (impact - TOP)) * options.fps;
const mmPerPx = 42.67 / (2 * truth.ballRadiusPx);
const ballSpeed = (fps: number) => (options.ballSpeedPxPerFrame * mmPerPx * fps) / 1000;

let w: World;
let fitter: Auth;
let clipId = "";
type Entry = { key: string; value: number | null; unit: string; frames?: number[]; markIds?: string[]; method?: string; needs?: string[]; window?: { min: number; max: number } };
const byKey = (list: Entry[]): Record<string, Entry> => Object.fromEntries(list.map((m) => [m.key, m]));

async function measurements() {
  const res = await call(fitter, "GET", `/api/clips/${clipId}/measurements`);
  expect(res.status).toBe(200);
  return byKey(res.body.measurements);
}

beforeAll(async () => {
  w = await makeWorld();
  const windows = { face_angle_impact: { min: -1, max: 1 } };
  await db.update(schema.studios).set({ settings: { ...w.studioA.settings, windows } }).where(eq(schema.studios.id, w.studioA.id));
  fitter = { token: (await tokenFor(w.fitter.id)).value };
  clipId = (await insertClip(w.own, { addressFrame: ADDRESS, impactFrame: impact })).id;
});

describe("measurements from marks on a clip with known truth", () => {
  it("lists every overhead key as missing, with what it needs, before any mark", async () => {
    const m = await measurements();
    expect(Object.keys(m)).toEqual(["aim", "face_angle_impact", "path", "face_to_path", "face_rotation_rate", "twist", "start_direction", "ball_speed"]);
    expect(m.aim).toMatchObject({ value: null, unit: "deg" });
    expect(m.aim!.needs!.join(" ")).toMatch(/target line/);
  });

  it("gives aim, face angle, path, face to path, rotation rate, twist, start direction and ball speed", async () => {
    const marks = [
      { frame: 0, kind: "line", role: "target", points: [ballAtRest, [ballAtRest[0], 60]] },
      faceLine(ADDRESS),
      faceLine(260),
      faceLine(280),
      faceLine(impact),
      faceLine(impact + 1),
      ...[296, 297, 298, 299, 300].map((f) => ({ frame: f, kind: "point", role: "clubhead", points: [mid(frameTruth(f).faceHeel, frameTruth(f).faceToe)] })),
      ...[302, 304, 306, 308].map((f) => ({ frame: f, kind: "point", role: "ball", points: [frameTruth(f).ballCentre] })),
      { frame: impact, kind: "scale", role: "ball", points: [[ballAtRest[0] - truth.ballRadiusPx, ballAtRest[1]], [ballAtRest[0] + truth.ballRadiusPx, ballAtRest[1]]] },
    ];
    let last: Record<string, { value: number | null }> = {};
    for (const mark of marks) {
      const res = await call(fitter, "POST", `/api/clips/${clipId}/marks`, mark);
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      expect(res.body.mark).toMatchObject({ frame: mark.frame, kind: mark.kind, role: mark.role, version: 1, authorUserId: w.fitter.id });
      last = byKey(res.body.measurements);
    }
    const m = await measurements();
    expect(Math.abs(m.aim!.value! - options.faceAngleAddressDeg)).toBeLessThan(0.1);
    expect(Math.abs(m.face_angle_impact!.value! - options.faceAngleImpactDeg)).toBeLessThan(0.1); // −0.8° closed
    expect(Math.abs(m.path!.value! - PATH_DEG)).toBeLessThan(0.1);
    expect(Math.abs(m.face_to_path!.value! - (options.faceAngleImpactDeg - PATH_DEG))).toBeLessThan(0.1);
    expect(Math.abs(m.face_rotation_rate!.value! - ratePerSecond)).toBeLessThan(0.1);
    expect(Math.abs(m.twist!.value!)).toBeLessThan(0.1); // the face keeps turning at the same rate: no twist from the strike
    expect(Math.abs(m.start_direction!.value! - options.startDirectionDeg)).toBeLessThan(0.1);
    expect(Math.abs(m.ball_speed!.value! / ballSpeed(240) - 1)).toBeLessThan(0.01);
    expect(m.ball_speed).toMatchObject({ unit: "m/s", method: "marked" });
    expect(m.face_angle_impact).toMatchObject({ unit: "deg", method: "marked", window: { min: -1, max: 1 } });
    expect(m.face_angle_impact!.frames).toContain(impact);
    // The POST answers with the same values the GET reads back.
    expect(last.ball_speed!.value).toBe(m.ball_speed!.value);
  });

  it("stores one row per key with the marks it came from and who computed it", async () => {
    const rows = await db.select().from(schema.measurements).where(eq(schema.measurements.clipId, clipId));
    expect(rows).toHaveLength(8);
    const aim = rows.find((r) => r.key === "aim")!;
    expect(aim.markIds).toHaveLength(2);
    expect(aim.computedBy).toBe(w.fitter.id);
    expect(aim.method).toBe("marked");
  });

  it("recomputes on a capture fps change: ball speed scales with the capture rate, angles stay", async () => {
    const res = await call(fitter, "PATCH", `/api/clips/${clipId}`, { captureFps: 480 });
    expect(res.status).toBe(200);
    expect(res.body.clip.captureFps).toBe(480);
    const m = await measurements();
    expect(Math.abs(m.ball_speed!.value! / ballSpeed(480) - 1)).toBeLessThan(0.01);
    expect(Math.abs(m.face_angle_impact!.value! - options.faceAngleImpactDeg)).toBeLessThan(0.1);
    expect((await call(fitter, "PATCH", `/api/clips/${clipId}`, { captureFps: 240 })).status).toBe(200);
  });

  it("recomputes on a moments change: moving impact away from the face line leaves face angle needing one", async () => {
    const moved = await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { impact: 299 });
    expect(moved.status).toBe(200);
    expect(moved.body.clip.moments).toMatchObject({ address: ADDRESS, impact: 299 });
    const m = await measurements();
    expect(m.face_angle_impact).toMatchObject({ value: null });
    expect(m.face_angle_impact!.needs!.join(" ")).toMatch(/frame 299/);
    expect((await call(fitter, "PUT", `/api/clips/${clipId}/moments`, { impact })).status).toBe(200);
    expect(Math.abs((await measurements()).face_angle_impact!.value! - options.faceAngleImpactDeg)).toBeLessThan(0.1);
  });

  it("mirrors the signs for a mirrored image (docs/measurements.md: r reverses)", async () => {
    expect((await call(fitter, "PATCH", `/api/clips/${clipId}`, { mirrored: true })).status).toBe(200);
    const m = await measurements();
    expect(Math.abs(m.aim!.value! + options.faceAngleAddressDeg)).toBeLessThan(0.1);
    expect((await call(fitter, "PATCH", `/api/clips/${clipId}`, { mirrored: false })).status).toBe(200);
  });

  it("drops a measurement when its mark is deleted, and restores it when drawn again", async () => {
    const list = await call(fitter, "GET", `/api/clips/${clipId}/marks`);
    const target = list.body.marks.find((mk: { role: string }) => mk.role === "target");
    const del = await call(fitter, "DELETE", `/api/clips/${clipId}/marks/${target.id}?version=${target.version}`);
    expect(del.status).toBe(200);
    expect(byKey(del.body.measurements).aim!.value).toBeNull();
    expect((await measurements()).start_direction!.value).toBeNull();
  });
});

describe("the clip for the review screen", () => {
  it("answers with frames, rates, moments and the golfer's handedness", async () => {
    const res = await call(fitter, "GET", `/api/clips/${clipId}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      id: clipId, view: "overhead", state: "ready", width: 1280, height: 720, frameCount: 480, captureFps: 240, mirrored: false,
      suggestedImpactFrame: 299, moments: { address: ADDRESS, takeaway: null, top: null, impact, finish: null },
      handedness: "right", golferId: w.own.golfer.id, fittingId: w.own.fitting.id, buildId: w.own.build.id,
    });
    expect(res.body.motionSignal).toHaveLength(4);
  });
});

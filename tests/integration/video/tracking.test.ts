// The tracking pass end to end: a generated overhead clip (known truth) is uploaded, processed by
// the worker beside the JPEG export, and ends ready with the tracker's proposals stored as tracked
// marks; a re-run replaces them and leaves hand marks alone.
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { refreshMeasurements } from "@/lib/server/dal/measurements";
import { queueTracking } from "@/lib/server/queue";
import type { TrackingSummary } from "@/lib/tracking/types";
import { clipTruth, generateClip, type ClipOptions } from "../../fixtures/generate-clips";
import { uploadClip, waitForClip } from "../../support/clips";
import { call, type Auth } from "../../support/http";
import { makeWorld, tokenFor, type World } from "../../support/world";

const options: ClipOptions = {
  width: 640, height: 360, fps: 240, frameCount: 240, impactFrame: 150,
  faceAngleAddressDeg: 1.5, faceAngleImpactDeg: -0.8, ballSpeedPxPerFrame: 5, startDirectionDeg: -0.6, pathDeg: 1.2,
};
const truth = clipTruth(options);

let w: World;
let fitter: Auth;
let dir: string;
let clipId: string;

async function trackingOf(id: string): Promise<TrackingSummary | null> {
  const [row] = await db.select({ tracking: schema.clips.tracking }).from(schema.clips).where(eq(schema.clips.id, id));
  return (row?.tracking as TrackingSummary | null) ?? null;
}

/** Proposals are stored just after the clip turns ready; poll for them (or a newer run). */
async function waitForTracking(id: string, newerThan: TrackingSummary | null = null, timeoutMs = 60_000): Promise<TrackingSummary> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const summary = await trackingOf(id);
    if (summary && (!newerThan || JSON.stringify(summary) !== JSON.stringify(newerThan))) return summary;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no tracking for clip ${id} after ${timeoutMs} ms`);
}

const trackedMarks = (id: string) => db.select().from(schema.marks).where(and(eq(schema.marks.clipId, id), eq(schema.marks.source, "tracked")));

beforeAll(async () => {
  w = await makeWorld();
  fitter = { token: (await tokenFor(w.fitter.id)).value };
  dir = await mkdtemp(path.join(tmpdir(), "fitframe-tracking-"));
  const file = path.join(dir, "putt.mp4");
  await generateClip(file, options);
  ({ clipId } = await uploadClip(fitter, file, { fittingId: w.own.fitting.id, buildId: w.own.build.id, captureFps: options.fps }));
  const { clip } = await waitForClip(fitter, w.own.fitting.id, clipId);
  expect(clip.state).toBe("ready");
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe("a generated overhead putt ends ready with the tracker's proposals", () => {
  let summary: TrackingSummary;
  beforeAll(async () => {
    summary = await waitForTracking(clipId);
  });

  it("suggests the impact frame from the ball, exactly (the fixture's last still frame)", async () => {
    expect(summary.impactSource).toBe("ball");
    expect(summary.impactFrame).toBe(options.impactFrame);
    const [row] = await db.select({ suggested: schema.clips.suggestedImpactFrame }).from(schema.clips).where(eq(schema.clips.id, clipId));
    expect(row!.suggested).toBe(options.impactFrame);
  });

  it("finds the ball at rest to 0.1 px and its diameter to 1 %", () => {
    const rest = truth.frames[0]!.ballCentre;
    expect(summary.ballFound).toBe(true);
    expect(Math.hypot(summary.ball!.x - rest[0], summary.ball!.y - rest[1])).toBeLessThan(0.1);
    expect(Math.abs(summary.ball!.diameterPx / (2 * truth.ballRadiusPx) - 1)).toBeLessThan(0.01);
  });

  it("stores the proposals as tracked marks with their precision, no author", async () => {
    const marks = await trackedMarks(clipId);
    const count = (role: string, kind = "point") => marks.filter((m) => m.role === role && m.kind === kind).length;
    expect(count("ball", "scale")).toBe(1);
    expect(count("ball")).toBe(summary.ballTrackFrames);
    expect(summary.ballTrackFrames).toBeGreaterThanOrEqual(30);
    expect(count("clubhead")).toBe(8);
    expect(count("face", "line")).toBe(2);
    for (const m of marks) {
      expect(m.precisionPx).toBeGreaterThan(0);
      expect(m.precisionPx).toBeLessThan(1);
      expect(m.authorUserId).toBeNull();
    }
    for (const m of marks.filter((m) => m.role === "ball" && m.kind === "point")) {
      const t = truth.frames[m.frame]!.ballCentre;
      expect(Math.hypot(m.points[0]![0] - t[0], m.points[0]![1] - t[1])).toBeLessThan(0.15);
    }
  });

  // The goal for both face angles is 0.3°. At impact, where the face touches the ball, the
  // tracked face still leans by up to 0.7° on 640×360 clips (known miss, docs/benchmarks.md): held
  // to 0.75° here so that a regression shows.
  it("gives, after accept-all and a hand-drawn target line only, aim within 0.3°, face at impact within 0.75°, start direction within 0.2°, ball speed within 1 %", async () => {
    const accepted = await call(fitter, "POST", `/api/clips/${clipId}/proposals/accept`, {});
    expect(accepted.status).toBe(200);
    const [moments] = await db.select({ address: schema.clips.addressFrame, impact: schema.clips.impactFrame }).from(schema.clips).where(eq(schema.clips.id, clipId));
    expect(moments).toEqual({ address: summary.addressFrame, impact: options.impactFrame });
    await db.insert(schema.marks).values({
      studioId: w.studioA.id, clipId, frame: 0, kind: "line", role: "target", points: [[320, 340], [320, 20]], source: "hand", authorUserId: w.fitter.id,
    });
    const measured = await refreshMeasurements(clipId, null);
    const value = (key: string) => measured.find((m) => m.key === key)?.value ?? null;
    expect(Math.abs(value("aim")! - options.faceAngleAddressDeg)).toBeLessThan(0.3);
    expect(Math.abs(value("face_angle_impact")! - options.faceAngleImpactDeg)).toBeLessThan(0.75);
    expect(Math.abs(value("start_direction")! - options.startDirectionDeg)).toBeLessThan(0.2);
    // Truth by hand: 5 px/frame × 240 frames/s × (42.67 mm / 2r px).
    const speed = measured.find((m) => m.key === "ball_speed")!;
    const mmPerS = 5 * 240 * (42.67 / (2 * truth.ballRadiusPx));
    const expected = speed.unit === "m/s" ? mmPerS / 1000 : speed.unit === "mm/s" ? mmPerS : NaN;
    expect(Math.abs(speed.value! / expected - 1)).toBeLessThan(0.01);
    // Path from the tracked clubhead alone: the goal is 0.5°; the last 4 points lie 2 px
    // apart here, so 1.5° is held (known miss on small clips, docs/benchmarks.md), and the
    // stated uncertainty must not be smaller than the error it makes.
    const pathRow = measured.find((m) => m.key === "path");
    if (!pathRow || pathRow.value === null) throw new Error(`no path: ${JSON.stringify(pathRow)}`);
    expect(pathRow.method).toBe("mixed"); // tracked clubhead, hand-drawn target line
    expect(Math.abs(pathRow.value - 1.2)).toBeLessThan(1.5);
    expect(Math.abs(pathRow.value - 1.2)).toBeLessThan(3 * (pathRow.uncertainty ?? 0));
  });
});

describe("a re-run", () => {
  it("replaces the proposals and keeps hand marks", async () => {
    const before = await trackingOf(clipId);
    const hand = await db.select().from(schema.marks).where(and(eq(schema.marks.clipId, clipId), eq(schema.marks.source, "hand")));
    const trackedBefore = (await trackedMarks(clipId)).length;
    expect(await queueTracking(clipId)).not.toBeNull();
    const after = await waitForTracking(clipId, before);
    expect(after.impactFrame).toBe(options.impactFrame);
    expect((await trackedMarks(clipId)).length).toBe(trackedBefore);
    const handAfter = await db.select().from(schema.marks).where(and(eq(schema.marks.clipId, clipId), eq(schema.marks.source, "hand")));
    expect(handAfter.map((m) => m.id)).toEqual(hand.map((m) => m.id));
  });
});

/**
 * The generated clips' truth agrees with docs/measurements.md's overhead definitions and with the
 * pictures that come out of the encoder.
 */
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { clipTruth, generateClip, type ClipOptions, type Point } from "@/tests/fixtures/generate-clips";
import { readGreyFrames } from "@/workers/video/ffmpeg";

/** docs/measurements.md overhead: t = target direction, r = (−t_y, t_x), angle(d) = atan2(d·r, d·t). */
function angleDeg(d: Point, t: Point): number {
  const r: Point = [-t[1], t[0]];
  return (Math.atan2(d[0] * r[0] + d[1] * r[1], d[0] * t[0] + d[1] * t[1]) * 180) / Math.PI;
}

/** Face normal ⟂ the face line, pointing toward the target (n·t > 0). */
function faceNormal(heel: Point, toe: Point, t: Point): Point {
  const n: Point = [toe[1] - heel[1], -(toe[0] - heel[0])];
  return n[0] * t[0] + n[1] * t[1] > 0 ? n : [-n[0], -n[1]];
}

const target: Point = [0, -1]; // the target line points up the image
const options: ClipOptions = {
  width: 320, height: 180, fps: 240, frameCount: 200, impactFrame: 120,
  faceAngleAddressDeg: 2.5, faceAngleImpactDeg: -1.5, ballSpeedPxPerFrame: 4, startDirectionDeg: 3,
};

describe("clip truth", () => {
  const truth = clipTruth(options);
  const k = options.impactFrame;

  it("has the face angles asked for at address and impact (docs/measurements.md sign: + open)", () => {
    const address = truth.frames[0]!, impact = truth.frames[k]!;
    expect(angleDeg(faceNormal(address.faceHeel, address.faceToe, target), target)).toBeCloseTo(2.5, 9);
    expect(angleDeg(faceNormal(impact.faceHeel, impact.faceToe, target), target)).toBeCloseTo(-1.5, 9);
  });

  it("keeps the ball still to impact, then moves it at the start direction and speed", () => {
    expect(truth.frames[k]!.ballCentre).toEqual(truth.frames[0]!.ballCentre);
    const [a, b] = [truth.frames[k]!.ballCentre, truth.frames[k + 10]!.ballCentre];
    const d: Point = [b[0] - a[0], b[1] - a[1]];
    expect(angleDeg(d, target)).toBeCloseTo(3, 9);
    expect(Math.hypot(d[0], d[1]) / 10).toBeCloseTo(4, 9);
  });

  it("puts the face against the back of the ball at impact, moving fastest there", () => {
    const f = truth.frames[k]!;
    const mid: Point = [(f.faceHeel[0] + f.faceToe[0]) / 2, (f.faceHeel[1] + f.faceToe[1]) / 2];
    expect(Math.hypot(mid[0] - f.ballCentre[0], mid[1] - f.ballCentre[1])).toBeCloseTo(truth.ballRadiusPx, 9);
    const speed = (i: number) => Math.hypot(truth.frames[i]!.faceToe[0] - truth.frames[i - 1]!.faceToe[0], truth.frames[i]!.faceToe[1] - truth.frames[i - 1]!.faceToe[1]);
    expect(speed(k)).toBeGreaterThan(speed(k - 10));
    expect(speed(k + 1)).toBeLessThan(speed(k)); // the ball takes some of the head's speed
  });
});

describe("encoded clip", () => {
  let dir = "";
  const frames = new Map<number, Uint8Array>();
  const truth = clipTruth(options);
  const k = options.impactFrame;

  beforeAll(async () => {
    dir = await mkdtemp(path.join(tmpdir(), "fitframe-gen-"));
    const file = path.join(dir, "clip.mp4");
    await generateClip(file, options);
    await readGreyFrames(file, {
      width: options.width,
      height: options.height,
      signal: new AbortController().signal,
      onFrame: (frame, i) => {
        if (i === k || i === k + 10) frames.set(i, Uint8Array.from(frame));
      },
    });
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  const grey = (frame: number, p: Point) => frames.get(frame)![Math.floor(p[1]) * options.width + Math.floor(p[0])]!;

  it("shows the white ball where the truth puts it, before and after impact", () => {
    const rest = truth.frames[k]!.ballCentre, later = truth.frames[k + 10]!.ballCentre;
    expect(grey(k, rest)).toBeGreaterThan(200);
    expect(grey(k + 10, later)).toBeGreaterThan(200);
    expect(grey(k + 10, rest)).toBeLessThan(150); // the ball has left its spot
  });

  it("shows the dark head just behind the face line", () => {
    const f = truth.frames[k]!;
    const n = faceNormal(f.faceHeel, f.faceToe, target);
    const len = Math.hypot(n[0], n[1]);
    const behind: Point = [(f.faceHeel[0] + f.faceToe[0]) / 2 - (3 * n[0]) / len, (f.faceHeel[1] + f.faceToe[1]) / 2 - (3 * n[1]) / len];
    expect(grey(k, behind)).toBeLessThan(70);
  });
});

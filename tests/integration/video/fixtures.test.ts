/**
 * The generated face-on and down-the-line clips and the camera faults, checked against Debian's
 * ffmpeg tools as the reference:
 * - frame count and size from Debian's ffprobe (docs/references.md, "Video"):
 *     ffprobe -v error -count_frames -select_streams v:0 -show_entries stream=nb_read_frames,width,height,r_frame_rate
 * - pixels from Debian's ffmpeg decoding to 8-bit grey (`-pix_fmt gray`, BT.601 luma), so the
 *   truth's points are checked on the picture a tracker will see.
 */
import { execFile } from "node:child_process";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { generateClip, type AnyClipOptions, type AnyClipTruth, type Point } from "@/tests/fixtures/generate-clips";

const run = promisify(execFile);

/** Reference stream facts: Debian ffprobe, decoding every frame. */
async function ffprobeStream(file: string): Promise<{ frames: number; width: number; height: number; rate: string }> {
  const { stdout } = await run("ffprobe", ["-v", "error", "-count_frames", "-select_streams", "v:0", "-show_entries", "stream=nb_read_frames,width,height,r_frame_rate", "-of", "json", file]);
  const s = (JSON.parse(stdout) as { streams: { nb_read_frames: string; width: number; height: number; r_frame_rate: string }[] }).streams[0]!;
  return { frames: Number(s.nb_read_frames), width: s.width, height: s.height, rate: s.r_frame_rate };
}

/** Every frame as 8-bit grey, decoded by Debian's ffmpeg. */
async function greyFrames(file: string, width: number, height: number): Promise<Uint8Array[]> {
  const { stdout } = await run("ffmpeg", ["-v", "error", "-i", file, "-f", "rawvideo", "-pix_fmt", "gray", "-"], { encoding: "buffer", maxBuffer: 1 << 30 });
  const size = width * height;
  return Array.from({ length: stdout.length / size }, (_, i) => new Uint8Array(stdout.buffer, stdout.byteOffset + i * size, size));
}

/** Mean grey of the 3×3 pixels around a point (x right, y down, pixel centres at +0.5). */
const greyAt = (frame: Uint8Array, width: number, p: Point) => {
  let sum = 0;
  for (let dy = -1; dy <= 1; dy++) for (let dx = -1; dx <= 1; dx++) sum += frame[(Math.floor(p[1]) + dy) * width + Math.floor(p[0]) + dx]!;
  return sum / 9;
};

const small = { width: 640, height: 360, frameCount: 140, impactFrame: 100, ballSpeedPxPerFrame: 4 } as const;
const faceOn = { ...small, view: "face-on", fps: 240, shaftLeanAddressDeg: 3, shaftLeanImpactDeg: 1, attackAngleDeg: 2, launchAngleDeg: 1.5 } as const;
const downTheLine = { ...small, view: "down-the-line", fps: 240, soleTiltAddressDeg: 0, soleTiltImpactDeg: 2 } as const;
const overhead = { ...small, fps: 240, faceAngleAddressDeg: 1, faceAngleImpactDeg: -1, startDirectionDeg: 0.5 } as const;

const cases: { name: string; options: AnyClipOptions }[] = [
  { name: "face-on, clean", options: faceOn },
  { name: "face-on, rolled 3° at 300 fps with a second ball", options: { ...faceOn, fps: 300, faults: { cameraRollDeg: 3, secondBall: true } } },
  { name: "down-the-line, clean", options: downTheLine },
  { name: "down-the-line, noise, blur, compression", options: { ...downTheLine, faults: { noiseSigma: 4, motionBlurSubframes: 4, strongCompression: true } } },
  { name: "overhead, shadow, flicker, rolled", options: { ...overhead, faults: { movingShadow: true, flicker: true, cameraRollDeg: -3 } } },
];

let dir = "";
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "fitframe-fixtures-"));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe.each(cases)("$name", ({ name, options }) => {
  let file = "";
  let truth: AnyClipTruth;
  let frames: Uint8Array[] = [];
  const k = options.impactFrame;

  beforeAll(async () => {
    file = path.join(dir, `${name.replace(/\W+/g, "-")}.mp4`);
    truth = await generateClip(file, options);
    frames = await greyFrames(file, options.width, options.height);
  });

  it("has the frame count, size and capture rate asked for (Debian's ffprobe)", async () => {
    const stream = await ffprobeStream(file);
    expect(stream).toEqual({ frames: options.frameCount, width: options.width, height: options.height, rate: `${options.fps}/1` });
  });

  it("shows the white ball at the truth's centre at rest and after impact, and not where it was", () => {
    const rest = truth.frames[k]!.ballCentre, later = truth.frames[k + 12]!.ballCentre;
    expect(greyAt(frames[k]!, options.width, rest)).toBeGreaterThan(190);
    expect(greyAt(frames[k + 12]!, options.width, later)).toBeGreaterThan(190);
    expect(greyAt(frames[k + 12]!, options.width, rest)).toBeLessThan(150);
  });

  it("draws the second ball only when asked", () => {
    if (truth.secondBall) expect(greyAt(frames[5]!, options.width, truth.secondBall)).toBeGreaterThan(190);
    else expect(options.faults?.secondBall).toBeFalsy();
  });

  if (options.view === "face-on") {
    it("shows the dark shaft on its truth line, the marker dot on the ball, and the ground line where the truth puts it", () => {
      const t = truth.frames[k]!;
      if (!("shaftLower" in t) || !t.marker) throw new Error("face-on truth expected");
      const mid: Point = [(t.shaftLower[0] + t.shaftUpper[0]) / 2, (t.shaftLower[1] + t.shaftUpper[1]) / 2];
      expect(greyAt(frames[k]!, options.width, mid)).toBeLessThan(90); // backdrop ≈ 127
      const m = truth.frames[k + 6]!;
      if (!("marker" in m) || !m.marker) throw new Error("marker expected");
      expect(greyAt(frames[k + 6]!, options.width, m.marker)).toBeLessThan(110);
      // 5 px above the ground line: grey backdrop (≈ 127); 5 px below: the green (≈ 92).
      const [a, b] = truth.referenceLine;
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      const up: Point = [(b[1] - a[1]) / len, -(b[0] - a[0]) / len];
      for (const s of [0.05, 0.95]) {
        const p: Point = [a[0] + (b[0] - a[0]) * s, a[1] + (b[1] - a[1]) * s];
        expect(greyAt(frames[3]!, options.width, [p[0] + 5 * up[0], p[1] + 5 * up[1]])).toBeGreaterThan(112);
        expect(greyAt(frames[3]!, options.width, [p[0] - 5 * up[0], p[1] - 5 * up[1]])).toBeLessThan(105);
      }
    });
  }

  if (options.view === "down-the-line") {
    it("shows the dark head just above its sole line at impact", () => {
      const t = truth.frames[k]!;
      if (!("soleHeel" in t)) throw new Error("down-the-line truth expected");
      const above: Point = [t.clubhead[0], t.clubhead[1] - 0.4 * truth.ballRadiusPx];
      expect(greyAt(frames[k]!, options.width, above)).toBeLessThan(70); // green ≈ 92
    });
  }

  if (options.faults?.flicker) {
    it("flickers the light by about ±5 % (100 Hz sampled at the capture rate)", () => {
      // A patch of turf far from the stroke and the shadow's path.
      const mean = (f: Uint8Array) => {
        let sum = 0;
        for (let y = 10; y < 40; y++) for (let x = 20; x < 60; x++) sum += f[y * options.width + x]!;
        return sum / 1200;
      };
      const means = frames.slice(0, 40).map(mean);
      const ratio = Math.max(...means) / Math.min(...means);
      expect(ratio).toBeGreaterThan(1.06); // (1 + 0.05 · sin 75°) / (1 − 0.05 · sin 75°) ≈ 1.10 at 240 fps
      expect(ratio).toBeLessThan(1.13);
    });
  }
});

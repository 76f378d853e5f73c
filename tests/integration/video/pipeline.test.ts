/**
 * The clip pipeline on generated overhead clips with known truth, checked against
 * Debian's ffprobe as the reference tool (docs/references.md, "Video"):
 *   ffprobe -v error -count_frames -select_streams v:0 -show_entries stream=nb_read_frames
 */
import { execFile } from "node:child_process";
import { mkdtemp, readdir, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { generateBadFile, generateClip, type BadFileKind, type ClipOptions } from "@/tests/fixtures/generate-clips";
import { probe, VideoJobAbortedError } from "@/workers/video/ffmpeg";
import { proxyTiming, stripLayout } from "@/workers/video/layout";
import { processClipFile, type ProcessedClip } from "@/workers/video/pipeline";
import { ClipRefusedError, type RefusalCode } from "@/workers/video/refusals";

const run = promisify(execFile);

/** Reference frame count: Debian ffprobe, decoding every frame. */
async function ffprobeFrameCount(file: string): Promise<number> {
  const { stdout } = await run("ffprobe", ["-v", "error", "-count_frames", "-select_streams", "v:0", "-show_entries", "stream=nb_read_frames", "-of", "csv=p=0", file]);
  return Number(stdout.trim());
}

/** Reference stream facts: Debian ffprobe. */
async function ffprobeStream(file: string): Promise<{ width: number; height: number; duration: number }> {
  const { stdout } = await run("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "stream=width,height:format=duration", "-of", "json", file]);
  const data = JSON.parse(stdout) as { streams: { width: number; height: number }[]; format: { duration: string } };
  return { width: data.streams[0]!.width, height: data.streams[0]!.height, duration: Number(data.format.duration) };
}

let dir = "";
beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "fitframe-video-"));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

const small = { width: 320, height: 180 };
const clips: { name: string; slowMotionFactor: number; options: ClipOptions }[] = [
  { name: "240-a.mp4", slowMotionFactor: 8, options: { ...small, fps: 240, frameCount: 300, impactFrame: 190, faceAngleAddressDeg: 0, faceAngleImpactDeg: 2, ballSpeedPxPerFrame: 3, startDirectionDeg: 1 } },
  { name: "240-b.mov", slowMotionFactor: 8, options: { ...small, fps: 240, frameCount: 300, impactFrame: 150, container: "mov", faceAngleAddressDeg: -1.5, faceAngleImpactDeg: 1, ballSpeedPxPerFrame: 6, startDirectionDeg: -2 } },
  { name: "240-slowmo-30.mp4", slowMotionFactor: 8, options: { ...small, fps: 240, fileFps: 30, frameCount: 240, impactFrame: 120, faceAngleAddressDeg: 1, faceAngleImpactDeg: -2, ballSpeedPxPerFrame: 2.5, startDirectionDeg: 0 } },
  // 480 fps played at 240 fps: the proxy keeps every 4th frame (60 fps).
  { name: "480-a.mp4", slowMotionFactor: 2, options: { ...small, fps: 480, frameCount: 480, impactFrame: 331, faceAngleAddressDeg: 2, faceAngleImpactDeg: -1, ballSpeedPxPerFrame: 1.5, startDirectionDeg: 0.5 } },
  { name: "480-b.mov", slowMotionFactor: 16, options: { ...small, fps: 480, frameCount: 480, impactFrame: 260, container: "mov", faceAngleAddressDeg: 0.5, faceAngleImpactDeg: 3.5, ballSpeedPxPerFrame: 4, startDirectionDeg: 3 } },
  { name: "480-c.mp4", slowMotionFactor: 10, options: { ...small, fps: 480, frameCount: 500, impactFrame: 420, faceAngleAddressDeg: -3, faceAngleImpactDeg: -4, ballSpeedPxPerFrame: 8, startDirectionDeg: -3.5 } },
];

describe.each(clips)("clip $name", ({ name, slowMotionFactor, options }) => {
  let file = "";
  let result: ProcessedClip;
  const windowBytes = new Map<number, Buffer>();
  const progress: number[] = [];

  beforeAll(async () => {
    file = path.join(dir, name);
    await generateClip(file, options);
    const outDir = path.join(dir, `${name}-out`);
    const reads: Promise<void>[] = [];
    result = await processClipFile(file, outDir, {
      captureFps: options.fps,
      slowMotionFactor,
      signal: new AbortController().signal,
      onProgress: (percent) => progress.push(percent),
      onWindowReady: (frames) => {
        for (const f of frames) reads.push(readFile(path.join(outDir, "frames", `${String(f).padStart(6, "0")}.jpg`)).then((b) => void windowBytes.set(f, b)));
      },
    });
    await Promise.all(reads);
  });

  it("counts the frames Debian ffprobe counts (-count_frames nb_read_frames)", async () => {
    const reference = await ffprobeFrameCount(file);
    expect(reference).toBe(options.frameCount);
    expect(result.frameCount).toBe(reference);
  });

  it("writes one JPEG per frame, 0-based, at source size", async () => {
    const names = (await readdir(result.framesDir)).sort();
    expect(names.length).toBe(await ffprobeFrameCount(file));
    expect(names[0]).toBe("000000.jpg");
    expect(names.at(-1)).toBe(`${String(options.frameCount - 1).padStart(6, "0")}.jpg`);
    const jpeg = await ffprobeStream(path.join(result.framesDir, names[0]!));
    expect([jpeg.width, jpeg.height]).toEqual([options.width, options.height]);
  });

  it("suggests impact within ±1 frame of the last frame before the ball moves", () => {
    expect(result.suggestedImpact).not.toBeNull();
    expect(Math.abs(result.suggestedImpact!.frame - options.impactFrame)).toBeLessThanOrEqual(1);
    expect(result.motionSignal).toHaveLength(result.frameCount);
  });

  it("sends the ±20 frames around impact first, identical to the full pass's frames", async () => {
    const centre = result.suggestedImpact!.frame;
    expect(result.windowFrames[0]).toBe(centre - 20);
    expect(result.windowFrames.at(-1)).toBe(centre + 20);
    expect(windowBytes.size).toBe(41);
    for (const [frame, bytes] of windowBytes) {
      const final = await readFile(path.join(result.framesDir, `${String(frame).padStart(6, "0")}.jpg`));
      expect(bytes.equals(final), `frame ${frame}`).toBe(true);
    }
  });

  it("times the proxy at capture fps ÷ slow-motion factor (ffprobe duration)", async () => {
    const playbackFps = options.fps / slowMotionFactor;
    const proxy = await ffprobeStream(result.proxy.file);
    expect(Math.max(proxy.width, proxy.height)).toBeLessThanOrEqual(720);
    expect(result.proxy.fps).toBeLessThanOrEqual(60);
    expect(Math.abs(proxy.duration - result.frameCount / playbackFps)).toBeLessThanOrEqual(1 / result.proxy.fps);
  });

  it("reports progress that only rises and ends at 100", () => {
    expect(progress.at(-1)).toBe(100);
    expect(progress.every((p, i) => i === 0 || p > progress[i - 1]!)).toBe(true);
  });

  it("writes the contact strip and the poster as single images", async () => {
    const strip = await ffprobeStream(result.stripFile);
    const poster = await ffprobeStream(result.posterFile);
    const { tiles } = stripLayout(result.frameCount);
    expect([strip.width, strip.height]).toEqual([tiles * 160, 90]);
    expect(Math.max(poster.width, poster.height)).toBeLessThanOrEqual(720);
  });
});

describe("frame size", () => {
  it("caps the long side of the frame JPEGs at 1920 px, keeping the aspect", async () => {
    const file = path.join(dir, "wide.mp4");
    await generateClip(file, { width: 2400, height: 200, fps: 240, frameCount: 40, impactFrame: 20, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 10, startDirectionDeg: 0 });
    const result = await processClipFile(file, path.join(dir, "wide-out"), { captureFps: 240, slowMotionFactor: 8, signal: new AbortController().signal });
    expect([result.sourceWidth, result.sourceHeight]).toEqual([2400, 200]);
    const jpeg = await ffprobeStream(path.join(result.framesDir, "000000.jpg"));
    expect([jpeg.width, jpeg.height]).toEqual([1920, 160]);
    expect((await readdir(result.framesDir)).length).toBe(await ffprobeFrameCount(file));
  });
});

describe("a phone clip stored on its side", () => {
  it("is probed with its rotation and turned upright in every output", async () => {
    const file = path.join(dir, "rotated.mp4");
    await generateClip(file, { ...small, rotationDeg: 90, fps: 240, frameCount: 120, impactFrame: 70, faceAngleAddressDeg: 0, faceAngleImpactDeg: 1, ballSpeedPxPerFrame: 4, startDirectionDeg: 0 });
    const info = await probe(file);
    expect(info).toMatchObject({ width: 320, height: 180, rotation: 90 });
    const result = await processClipFile(file, path.join(dir, "rotated-out"), { captureFps: 240, slowMotionFactor: 8, signal: new AbortController().signal });
    expect([result.sourceWidth, result.sourceHeight]).toEqual([180, 320]);
    const jpeg = await ffprobeStream(path.join(result.framesDir, "000000.jpg"));
    expect([jpeg.width, jpeg.height]).toEqual([180, 320]);
    expect(Math.abs(result.suggestedImpact!.frame - 70)).toBeLessThanOrEqual(1);
  });
});

describe("probe", () => {
  it("reports what Debian ffprobe reports, and the file's own frame rate on a slow-motion file", async () => {
    const file = path.join(dir, "probe-slowmo.mp4");
    await generateClip(file, { ...small, fps: 240, fileFps: 30, frameCount: 120, impactFrame: 60, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 3, startDirectionDeg: 0 });
    const info = await probe(file);
    expect(info.frameCount).toBe(await ffprobeFrameCount(file));
    expect(info).toMatchObject({ codec: "h264", width: 320, height: 180, rotation: 0, containerFps: 30, hasVideo: true, isStillImage: false });
    expect(info.durationS).toBeCloseTo(4, 1);
  });
});

describe("proxy timing", () => {
  it("keeps every frame up to 60 fps and thins by a whole step above", () => {
    expect(proxyTiming(240, 8)).toEqual({ playbackFps: 30, keepEvery: 1, fps: 30 });
    expect(proxyTiming(240, 4)).toEqual({ playbackFps: 60, keepEvery: 1, fps: 60 });
    expect(proxyTiming(480, 2)).toEqual({ playbackFps: 240, keepEvery: 4, fps: 60 });
    expect(proxyTiming(1000, 4)).toEqual({ playbackFps: 250, keepEvery: 5, fps: 50 });
  });
});

describe("contact strip layout", () => {
  it("spreads at most 24 thumbnails evenly and leaves no empty tile", () => {
    expect(stripLayout(480)).toEqual({ every: 20, tiles: 24 });
    expect(stripLayout(300)).toEqual({ every: 13, tiles: 24 });
    expect(stripLayout(40)).toEqual({ every: 2, tiles: 20 });
    expect(stripLayout(5)).toEqual({ every: 1, tiles: 5 });
  });
});

describe("unusable files are refused in plain words", () => {
  const badFiles: { kind: BadFileKind; code: RefusalCode; words: RegExp }[] = [
    { kind: "text", code: "not-a-video", words: /not a video/ },
    { kind: "empty", code: "empty-file", words: /empty/ },
    { kind: "truncated", code: "truncated", words: /incomplete.*cut short/ },
    { kind: "audio-only", code: "no-video-stream", words: /sound but no picture/ },
    { kind: "still-image", code: "still-image", words: /still picture/ },
  ];

  async function refusal(file: string): Promise<ClipRefusedError> {
    const error = await processClipFile(file, path.join(dir, `${path.basename(file)}-out`), { captureFps: 240, slowMotionFactor: 8, signal: new AbortController().signal }).then(
      () => null,
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(ClipRefusedError);
    return error as ClipRefusedError;
  }

  it.each(badFiles)("$kind", async ({ kind, code, words }) => {
    const good = path.join(dir, "for-truncation.mp4");
    if (kind === "truncated") await generateClip(good, { ...small, fps: 240, frameCount: 240, impactFrame: 120, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 3, startDirectionDeg: 0 });
    const file = path.join(dir, `bad-${kind}.mp4`);
    await generateBadFile(file, kind, good);
    const error = await refusal(file);
    expect(error.code).toBe(code);
    expect(error.reason).toMatch(words);
  });

  it("over 4096 px on the long side", async () => {
    const file = path.join(dir, "too-wide.mp4");
    await generateClip(file, { width: 4112, height: 64, fps: 30, frameCount: 20, impactFrame: 12, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 3, startDirectionDeg: 0 });
    const error = await refusal(file);
    expect(error.code).toBe("too-large");
    expect(error.reason).toMatch(/4112 × 64 pixels; the limit is 4096/);
  });

  it("over 60 s", async () => {
    const file = path.join(dir, "too-long.mp4");
    await generateClip(file, { width: 64, height: 36, fps: 1, frameCount: 62, impactFrame: 30, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 1, startDirectionDeg: 0 });
    const error = await refusal(file);
    expect(error.code).toBe("too-long");
    expect(error.reason).toMatch(/lasts 62 seconds; the limit is 60/);
  });

  it("over 20,000 frames", async () => {
    const file = path.join(dir, "too-many.mp4");
    await generateClip(file, { width: 64, height: 36, fps: 480, frameCount: 20_001, impactFrame: 10_000, faceAngleAddressDeg: 0, faceAngleImpactDeg: 0, ballSpeedPxPerFrame: 1, startDirectionDeg: 0 });
    const error = await refusal(file);
    expect(error.code).toBe("too-many-frames");
    expect(error.reason).toMatch(/20,001 frames; the limit is 20,000/);
  });
});

/** Process ids of this process's ffmpeg children, from /proc. */
async function ffmpegChildren(): Promise<number[]> {
  const pids: number[] = [];
  for (const entry of await readdir("/proc")) {
    if (!/^\d+$/.test(entry)) continue;
    const stat = await readFile(`/proc/${entry}/stat`, "utf8").catch(() => "");
    const comm = /\(([^)]*)\)/.exec(stat)?.[1];
    const ppid = Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]);
    if (comm === "ffmpeg" && ppid === process.pid) pids.push(Number(entry));
  }
  return pids;
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

describe("abandoning a job", () => {
  it("kills every ffmpeg it started", async () => {
    const file = path.join(dir, "abort.mp4");
    await generateClip(file, { width: 640, height: 360, fps: 240, frameCount: 480, impactFrame: 300, faceAngleAddressDeg: 0, faceAngleImpactDeg: 1, ballSpeedPxPerFrame: 6, startDirectionDeg: 0 });
    const controller = new AbortController();
    let seen: number[] = [];
    const job = processClipFile(file, path.join(dir, "abort-out"), {
      captureFps: 240,
      slowMotionFactor: 8,
      signal: controller.signal,
      onProgress: (percent) => {
        if (percent >= 3 && seen.length === 0) {
          void ffmpegChildren().then((pids) => {
            seen = pids;
            controller.abort();
          });
        }
      },
    });
    const error = await job.then(() => null, (e: unknown) => e);
    expect(seen.length).toBeGreaterThan(0);
    expect(error).toBeInstanceOf(VideoJobAbortedError);
    for (const pid of seen) expect(alive(pid), `ffmpeg ${pid}`).toBe(false);
    expect(await ffmpegChildren()).toEqual([]);
    expect((await readdir(path.join(dir, "abort-out"))).filter((n) => n.startsWith("."))).toEqual([]);
  });
});

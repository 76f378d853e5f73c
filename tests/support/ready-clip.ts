// A READY clip with real frames, independent of the video pipeline: Debian's ffmpeg renders a
// short test pattern to JPEGs, the frames go to the S3 fake under the keys the app reads, and
// the clip row is written straight into the test database.
import { execFile } from "node:child_process";
import { mkdtemp, readFile, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { db, schema } from "@/db";
import { clipKeys, putObject } from "@/lib/server/storage";

const run = promisify(execFile);

export type ReadyClipOptions = {
  studioId: string;
  fittingId: string;
  buildId: string;
  createdBy: string;
  view?: "overhead" | "face-on" | "down-the-line";
  width?: number;
  height?: number;
  frameCount?: number;
  captureFps?: number;
};

/** Renders `frameCount` distinct frames (ffmpeg's testsrc2 pattern with a moving counter). */
async function renderFrames(dir: string, width: number, height: number, frameCount: number): Promise<string[]> {
  await run("ffmpeg", [
    "-hide_banner", "-loglevel", "error", "-f", "lavfi", "-i", `testsrc2=s=${width}x${height}:r=60`,
    "-frames:v", String(frameCount), "-q:v", "4", "-start_number", "0", path.join(dir, "%06d.jpg"),
  ]);
  return (await readdir(dir)).filter((f) => f.endsWith(".jpg")).sort();
}

export async function makeReadyClip(o: ReadyClipOptions) {
  const { width = 640, height = 360, frameCount = 30, captureFps = 240, view = "overhead" } = o;
  const dir = await mkdtemp(path.join(process.env.TMPDIR ?? tmpdir(), "ready-clip-"));
  try {
    const files = await renderFrames(dir, width, height, frameCount);
    if (files.length !== frameCount) throw new Error(`ffmpeg wrote ${files.length} frames, expected ${frameCount}`);
    // A simple motion bump peaking two thirds in, so the strip has something to draw.
    const peak = Math.round(frameCount * 0.66);
    const motionSignal = Array.from({ length: frameCount }, (_, i) => Math.exp(-(((i - peak) / 4) ** 2)));
    const [clip] = await db
      .insert(schema.clips)
      .values({
        studioId: o.studioId, fittingId: o.fittingId, buildId: o.buildId, createdBy: o.createdBy, view, state: "ready",
        originalName: "pattern.mp4", contentType: "video/mp4", sizeBytes: 1, objectKey: "unused",
        captureFps, width, height, frameCount, containerFps: 60, durationS: frameCount / 60, progress: 100,
        motionSignal, suggestedImpactFrame: peak,
      })
      .returning();
    const keys = clipKeys(o.studioId, clip!.id);
    await Promise.all(files.map(async (f, n) => putObject(keys.frame(n), await readFile(path.join(dir, f)), "image/jpeg")));
    return clip!;
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

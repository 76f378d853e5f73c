/**
 * Benchmark of the clip pipeline against one plain ffmpeg JPEG export of the same clip.
 * Generates a 2 s 1280×720 240 fps overhead clip (480 frames) in a temp dir, runs both
 * alternately, prints wall times, child CPU times and the window-ready time, and removes
 * the temp dir. Usage: npx tsx scripts/bench-worker.ts [--runs N]
 *
 * The pipeline runs with the tracking pass beside it, as the worker's job does.
 * Budgets: pipeline with tracking ≤ 1.5 × plain export; frames around the suggested impact
 * ready ≤ 3 s after start; whole clip ≤ 15 s; proposals ≤ 5 s after the start of the job.
 */
import { mkdir, mkdtemp, readFile, rm } from "node:fs/promises";
import { loadavg, tmpdir } from "node:os";
import path from "node:path";
import { generateClip, STANDARD_CLIPS } from "@/tests/fixtures/generate-clips";
import { plainJpegExport, warmUp } from "@/workers/video/ffmpeg";
import { trackClipFile } from "@/workers/tracking/track-clip";
import { processClipFile } from "@/workers/video/pipeline";

const CLOCK_TICKS_PER_S = 100; // Linux USER_HZ

/** CPU seconds used by children that have exited and been reaped (/proc/self/stat). */
async function childCpuS(): Promise<number> {
  const stat = await readFile("/proc/self/stat", "utf8");
  const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
  // Fields 16 and 17 of stat (cutime, cstime) are at 13 and 14 after the command name.
  return (Number(fields[13]) + Number(fields[14])) / CLOCK_TICKS_PER_S;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

async function main(): Promise<void> {
  const runsArg = process.argv.indexOf("--runs");
  const runs = runsArg > 0 ? Number(process.argv[runsArg + 1]) : 3;
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-bench-"));
  try {
    const clip = path.join(dir, "clip.mp4");
    const options = STANDARD_CLIPS["overhead-240-720p.mp4"]!;
    await generateClip(clip, options);
    await warmUp();
    const plain: { wall: number; cpu: number }[] = [];
    const pipeline: { wall: number; cpu: number; window: number; frames: number; impact: number | null; tracked: number; tracking: number; trackedImpact: number | null }[] = [];
    for (let run = 0; run < runs; run++) {
      const plainDir = path.join(dir, `plain-${run}`);
      await mkdir(plainDir);
      let cpu0 = await childCpuS();
      let t0 = performance.now();
      await plainJpegExport(clip, plainDir, new AbortController().signal);
      plain.push({ wall: (performance.now() - t0) / 1000, cpu: (await childCpuS()) - cpu0 });
      await rm(plainDir, { recursive: true });

      const outDir = path.join(dir, `pipeline-${run}`);
      let window = NaN;
      cpu0 = await childCpuS();
      t0 = performance.now();
      const tracking = trackClipFile(
        clip,
        { view: "overhead", captureFps: options.fps, width: options.width, height: options.height, frameCount: options.frameCount, motionImpactFrame: null },
        new AbortController().signal,
        { niceness: 10 },
      ).then((r) => ({ r, at: (performance.now() - t0) / 1000 }));
      const result = await processClipFile(clip, outDir, {
        captureFps: options.fps,
        slowMotionFactor: 8,
        signal: new AbortController().signal,
        onWindowReady: () => (window = (performance.now() - t0) / 1000),
      });
      const tracked = await tracking;
      const wall = (performance.now() - t0) / 1000;
      pipeline.push({
        wall, cpu: (await childCpuS()) - cpu0, window, frames: result.frameCount, impact: result.suggestedImpact?.frame ?? null,
        tracked: tracked.at, tracking: tracked.r.summary.seconds, trackedImpact: tracked.r.summary.impactFrame,
      });
      await rm(outDir, { recursive: true });
      const p = plain.at(-1)!, q = pipeline.at(-1)!;
      console.log(
        `run ${run + 1}: plain ${p.wall.toFixed(2)} s (cpu ${p.cpu.toFixed(2)} s) | pipeline ${q.wall.toFixed(2)} s (cpu ${q.cpu.toFixed(2)} s), ` +
          `window ${q.window.toFixed(2)} s, proposals ${q.tracked.toFixed(2)} s (tracker ${q.tracking.toFixed(2)} s), ratio ${(q.wall / p.wall).toFixed(2)}, load ${loadavg()[0]!.toFixed(2)}`,
      );
    }
    const plainWall = median(plain.map((r) => r.wall));
    const pipeWall = median(pipeline.map((r) => r.wall));
    const frames = pipeline[0]!.frames;
    console.log(`clip: ${options.width}×${options.height}, ${options.fps} fps, ${frames} frames, impact truth ${options.impactFrame}, suggested ${pipeline.map((r) => r.impact).join(", ")}`);
    console.log(`tracked impact ${pipeline.map((r) => r.trackedImpact).join(", ")}; proposals ready (median) ${median(pipeline.map((r) => r.tracked)).toFixed(2)} s after start, tracker ${median(pipeline.map((r) => r.tracking)).toFixed(2)} s`);
    console.log(`pipeline with tracking wall (median of ${runs}): ${pipeWall.toFixed(2)} s  [budget 15 s]`);
    console.log(`plain ffmpeg JPEG export wall (median): ${plainWall.toFixed(2)} s`);
    console.log(`ratio pipeline with tracking / plain: ${(pipeWall / plainWall).toFixed(2)}  [budget 1.50]`);
    const fastest = (rows: { wall: number }[]) => Math.min(...rows.map((r) => r.wall));
    console.log(`fastest runs: pipeline ${fastest(pipeline).toFixed(2)} s, plain ${fastest(plain).toFixed(2)} s, ratio ${(fastest(pipeline) / fastest(plain)).toFixed(2)}`);
    console.log(`ratio of medians of child CPU: ${(median(pipeline.map((r) => r.cpu)) / median(plain.map((r) => r.cpu))).toFixed(2)}`);
    console.log(`frames per second through the pipeline: ${(frames / pipeWall).toFixed(0)}`);
    console.log(`window ready (median): ${median(pipeline.map((r) => r.window)).toFixed(2)} s  [budget 3 s]`);
    console.log(`cores: 2 expected; load average now ${loadavg().map((l) => l.toFixed(2)).join(" ")} (other work on the machine skews wall times)`);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});

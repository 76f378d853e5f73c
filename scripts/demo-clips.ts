// Demo clips for the demo golfer: synthetic overhead strokes (tests/fixtures' generator,
// invented angles), stored and queued like real uploads, with a few marks already drawn
// from the strokes' known geometry so the fitting opens with numbers to compare.
import { mkdtemp, readFile, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { asc, eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { refreshMeasurements } from "@/lib/server/dal/measurements";
import { enqueueClipProcessing } from "@/lib/server/queue";
import { clipKeys, putObject } from "@/lib/server/storage";
import { generateClip, type ClipOptions, type ClipTruth } from "@/tests/fixtures/generate-clips";

type Point = [number, number];
const base = { width: 640, height: 360, fps: 240, frameCount: 320, impactFrame: 220 } as const;
// Invented strokes: the own putter opens and starts putts right; the mallet is steadier.
const strokes: Record<string, Omit<ClipOptions, keyof typeof base>[]> = {
  baseline: [
    { faceAngleAddressDeg: 1.2, faceAngleImpactDeg: 1.6, pathDeg: 0.8, ballSpeedPxPerFrame: 3, startDirectionDeg: 1.4 },
    { faceAngleAddressDeg: 0.9, faceAngleImpactDeg: 2.1, pathDeg: 1.5, ballSpeedPxPerFrame: 3.2, startDirectionDeg: 1.9 },
  ],
  other: [
    { faceAngleAddressDeg: 0.2, faceAngleImpactDeg: 0.3, pathDeg: 0.4, ballSpeedPxPerFrame: 3.1, startDirectionDeg: 0.3 },
    { faceAngleAddressDeg: -0.1, faceAngleImpactDeg: -0.4, pathDeg: -0.2, ballSpeedPxPerFrame: 2.9, startDirectionDeg: -0.3 },
  ],
};

export function marksFromTruth(truth: ClipTruth): { frame: number; kind: "line" | "point" | "scale"; role: "target" | "face" | "clubhead" | "ball"; points: Point[]; lengthMm?: number }[] {
  const k = truth.options.impactFrame;
  const address = 10;
  const at = (f: number) => truth.frames[f]!;
  const [bx, by] = at(address).ballCentre;
  const r = truth.ballRadiusPx;
  const centre = (f: number): Point => [(at(f).faceHeel[0] + at(f).faceToe[0]) / 2, (at(f).faceHeel[1] + at(f).faceToe[1]) / 2];
  return [
    { frame: address, kind: "line", role: "target", points: [[bx, by], [bx, by - Math.min(140, by * 0.8)]] },
    { frame: address, kind: "scale", role: "ball", points: [[bx - r, by], [bx + r, by]], lengthMm: 42.67 },
    { frame: address, kind: "line", role: "face", points: [[...at(address).faceHeel], [...at(address).faceToe]] },
    { frame: k, kind: "line", role: "face", points: [[...at(k).faceHeel], [...at(k).faceToe]] },
    ...[k - 3, k - 2, k - 1, k].map((f) => ({ frame: f, kind: "point" as const, role: "clubhead" as const, points: [centre(f)] })),
    ...[k + 3, k + 6, k + 9, k + 12].map((f) => ({ frame: f, kind: "point" as const, role: "ball" as const, points: [[...at(f).ballCentre] as Point] })),
  ];
}

export async function seedDemoClips(studioId: string, fittingId: string, fitterUserId: string) {
  const buildRows = await db.select().from(schema.builds).where(eq(schema.builds.fittingId, fittingId)).orderBy(asc(schema.builds.position));
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-demo-"));
  try {
    for (const [i, build] of buildRows.entries()) {
      for (const [j, stroke] of (strokes[i === 0 ? "baseline" : "other"] ?? []).entries()) {
        const file = path.join(dir, `putt-${i}-${j}.mp4`);
        const truth = await generateClip(file, { ...base, ...stroke });
        const id = crypto.randomUUID();
        const keys = clipKeys(studioId, id);
        await putObject(keys.source, await readFile(file), "video/mp4");
        await db.insert(schema.clips).values({
          id, studioId, fittingId, buildId: build.id, view: "overhead", state: "queued", originalName: `putt ${j + 1}.mp4`,
          contentType: "video/mp4", sizeBytes: (await stat(file)).size, objectKey: keys.source, captureFps: base.fps,
          slowMotionFactor: 8, width: base.width, height: base.height, frameCount: base.frameCount,
          addressFrame: 10, impactFrame: base.impactFrame, createdBy: fitterUserId,
        });
        await db.insert(schema.marks).values(marksFromTruth(truth).map((m) => ({ ...m, studioId, clipId: id, authorUserId: fitterUserId })));
        await refreshMeasurements(id, fitterUserId);
        await enqueueClipProcessing({ clipId: id });
      }
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

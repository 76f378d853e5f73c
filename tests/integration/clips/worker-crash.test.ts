// A worker killed mid-job (SIGKILL) loses nothing: after the job's expiry another worker
// runs it again and the clip ends with exactly one set of frames and one row.
import { spawn, type ChildProcess } from "node:child_process";
import { readFile } from "node:fs/promises";
import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, expect, it } from "vitest";
import { db, schema } from "@/db";
import { clipPrefix, listKeys } from "@/lib/server/storage";
import { generateClip } from "../../fixtures/generate-clips";
import { uploadClip, waitForClip } from "../../support/clips";
import { makeWorld, tokenFor } from "../../support/world";

let serviceWorker: number;
const started: ChildProcess[] = [];

function startWorker(): ChildProcess {
  const child = spawn(process.execPath, ["--conditions=react-server", "--import", "tsx", "workers/index.ts"], { cwd: process.cwd(), env: process.env, stdio: "ignore" });
  started.push(child);
  return child;
}

beforeAll(async () => {
  // Pause the test run's own worker so the workers of this test take the job.
  serviceWorker = Number(await readFile(path.join(process.env.FITFRAME_DATA_DIR!, "worker.pid"), "utf8"));
  process.kill(serviceWorker, "SIGSTOP");
});

afterAll(() => {
  for (const child of started) if (child.exitCode === null) child.kill("SIGTERM");
  process.kill(serviceWorker, "SIGCONT");
});

it("finishes the clip after its worker is killed mid-job", { timeout: 150_000 }, async () => {
  const w = await makeWorld();
  const auth = { token: (await tokenFor(w.fitter.id)).value };
  const file = path.join(await mkdtemp(path.join(tmpdir(), "fitframe-crash-")), "stroke.mp4");
  await generateClip(file, {
    width: 1280, height: 720, fps: 240, frameCount: 480, impactFrame: 300,
    faceAngleAddressDeg: 1, faceAngleImpactDeg: -1, ballSpeedPxPerFrame: 4, startDirectionDeg: -0.5,
  });
  const first = startWorker();
  const { clipId } = await uploadClip(auth, file, { fittingId: w.own.fitting.id, buildId: w.own.build.id, captureFps: 240 });

  // Kill the first worker once it has started on the clip.
  for (let i = 0; i < 1500; i++) {
    const [row] = await db.select().from(schema.clips).where(eq(schema.clips.id, clipId));
    if (row!.state === "processing") break;
    await new Promise((r) => setTimeout(r, 20));
  }
  first.kill("SIGKILL");
  const [during] = await db.select().from(schema.clips).where(eq(schema.clips.id, clipId));
  expect(during!.state).toBe("processing");

  startWorker();
  const { clip } = await waitForClip(auth, w.own.fitting.id, clipId, 120_000);
  expect(clip.state).toBe("ready");
  const rows = await db.select().from(schema.clips).where(eq(schema.clips.fittingId, w.own.fitting.id));
  expect(rows.length).toBe(1);
  const frameKeys = (await listKeys(clipPrefix(w.studioA.id, clipId))).filter((k) => k.includes("/frames/"));
  expect(frameKeys.length).toBe(480);
  expect(new Set(frameKeys).size).toBe(480);
});

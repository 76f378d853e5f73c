// The capture computer's watch folder: `npm run upload -- --watch DIR --fitting ID` against the
// running stack. Files go into the build recording when they appear, with the view from their
// camera sub-folder, only once they have stopped growing, and never twice (content hash).
import { createHash } from "node:crypto";
import { copyFile, mkdir, mkdtemp, open, readFile, stat, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { setTimeout as sleep } from "node:timers/promises";
import { eq } from "drizzle-orm";
import { afterEach, expect, it } from "vitest";
import { db, schema } from "@/db";
import { generateClip } from "../../fixtures/generate-clips";
import { startDropProxy } from "../../support/drop-proxy";
import { BASE, call } from "../../support/http";
import { sentLine, startWatcher, stopWatchers } from "../../support/watcher";
import { makeWorld, tokenFor } from "../../support/world";

afterEach(stopWatchers);

const small = { width: 320, height: 180, fps: 240, frameCount: 60, impactFrame: 35, ballSpeedPxPerFrame: 2 } as const;

/** The fitting's clips once none is still on its way (ready or failed), or as they are at the deadline. */
async function settledClips<T extends { state: string }>(auth: { token: string }, fittingId: string, timeoutMs = 30_000): Promise<T[]> {
  for (const until = Date.now() + timeoutMs; ; await sleep(500)) {
    const rows: T[] = (await call(auth, "GET", `/api/clips?fittingId=${fittingId}`)).body.clips;
    if (Date.now() > until || (rows.length > 0 && rows.every((r) => r.state === "ready" || r.state === "failed"))) return rows;
  }
}

/** Writes a file in six pieces 300 ms apart, as a camera does while it records. */
async function writeSlowly(from: string, to: string) {
  const bytes = await readFile(from);
  const handle = await open(to, "w");
  const piece = Math.ceil(bytes.length / 6);
  for (let at = 0; at < bytes.length; at += piece) {
    await handle.write(bytes.subarray(at, at + piece));
    await handle.sync();
    await sleep(300);
  }
  await handle.close();
}

it("uploads each finished file into the recording build once, also across a restart", { timeout: 90_000 }, async () => {
  const w = await makeWorld();
  const token = await tokenFor(w.fitter.id);
  const auth = { token: token.value };
  const [build2] = await db.insert(schema.builds).values({ studioId: w.studioA.id, fittingId: w.own.fitting.id, position: 2, label: "Heavier head" }).returning();

  const staging = await mkdtemp(path.join(tmpdir(), "fitframe-watch-src-"));
  const clipA = path.join(staging, "a.mp4");
  const clipB = path.join(staging, "b.mp4");
  const clipC = path.join(staging, "c.mp4");
  await Promise.all([
    generateClip(clipA, { ...small, faceAngleAddressDeg: 0, faceAngleImpactDeg: 1, startDirectionDeg: 0, seed: 1 }),
    generateClip(clipB, { ...small, view: "face-on", shaftLeanAddressDeg: 3, shaftLeanImpactDeg: 1.5, attackAngleDeg: 2, launchAngleDeg: 1.5, seed: 2 }),
    generateClip(clipC, { ...small, view: "down-the-line", soleTiltAddressDeg: 0, soleTiltImpactDeg: 1.5, seed: 3 }),
  ]);

  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-watch-"));
  for (const view of ["overhead", "face-on", "down-the-line"]) await mkdir(path.join(dir, view));
  expect((await call(auth, "PUT", `/api/fittings/${w.own.fitting.id}/recording`, { buildId: w.own.build.id })).status).toBe(200);

  const first = await startWatcher(dir, w.own.fitting.id, token.value);
  await copyFile(clipA, path.join(dir, "overhead", "putt-1.mp4"));
  await writeSlowly(clipB, path.join(dir, "face-on", "putt-2.mp4"));
  const lineA = await sentLine(first, path.join("overhead", "putt-1.mp4"));
  const lineB = await sentLine(first, path.join("face-on", "putt-2.mp4"));
  expect(lineA).toMatch(/\tsent$/);
  expect(lineB).toMatch(/\tsent$/);

  // The fitter switches to the second build: the next putt goes there.
  const switched = await call(auth, "PUT", `/api/fittings/${w.own.fitting.id}/recording`, { buildId: build2!.id });
  expect(switched.body.recordingBuildId).toBe(build2!.id);
  expect((await call(auth, "GET", `/api/fittings/${w.own.fitting.id}`)).body.recordingBuildId).toBe(build2!.id);
  await copyFile(clipC, path.join(dir, "down-the-line", "putt-3.mp4"));
  expect(await sentLine(first, path.join("down-the-line", "putt-3.mp4"))).toMatch(/\tsent$/);

  // Killed outright; a copy of the first putt lands while it is down, another after the restart.
  first.child.kill("SIGKILL");
  await copyFile(clipA, path.join(dir, "overhead", "putt-1-copy.mp4"));
  const second = await startWatcher(dir, w.own.fitting.id, token.value);
  await copyFile(clipB, path.join(dir, "putt-2_face-on_again.mp4"));
  const caughtUp = await sentLine(second, path.join("overhead", "putt-1-copy.mp4"));
  const named = await sentLine(second, "putt-2_face-on_again.mp4");
  const clipIdOf = (line: string) => line.split("\t")[1];
  expect(caughtUp).toContain("already there (putt-1.mp4)");
  expect(clipIdOf(caughtUp)).toBe(clipIdOf(lineA));
  expect(named).toContain("already there (putt-2.mp4)");
  expect(clipIdOf(named)).toBe(clipIdOf(lineB));
  // Files sent before the restart are not sent again.
  await sleep(1000);
  expect(second.lines.filter((l) => /^(overhead|face-on|down-the-line)\/putt-\d\.mp4\t/.test(l))).toEqual([]);

  // Three clips, in the builds that were recording when they appeared, each with its camera's view.
  type Row = { id: string; buildId: string; view: string; state: string; originalName: string; frameCount: number | null };
  const rows = await settledClips<Row>(auth, w.own.fitting.id, 45_000);
  const summary = rows.map((r) => [r.originalName, r.buildId, r.view, r.state]).sort((a, b) => a[0]!.localeCompare(b[0]!));
  expect(summary).toEqual([
    ["putt-1.mp4", w.own.build.id, "overhead", "ready"],
    ["putt-2.mp4", w.own.build.id, "face-on", "ready"],
    ["putt-3.mp4", build2!.id, "down-the-line", "ready"],
  ]);
  // The slowly written file went up whole: all its bytes, all 60 frames (ffprobe in the worker).
  const [stored] = await db.select().from(schema.clips).where(eq(schema.clips.id, rows.find((r) => r.originalName === "putt-2.mp4")!.id));
  expect(stored!.sizeBytes).toBe((await stat(clipB)).size);
  expect(stored!.frameCount).toBe(60);
  // The same folder watched for the next golfer's fitting: the earlier golfer's putts stay out of it.
  second.child.kill("SIGKILL");
  expect((await call(auth, "PUT", `/api/fittings/${w.sibling.fitting.id}/recording`, { buildId: w.sibling.build.id })).status).toBe(200);
  const nextFitting = await startWatcher(dir, w.sibling.fitting.id, token.value);
  await sleep(1500);
  expect(nextFitting.lines).toEqual([`watching ${dir} for fitting ${w.sibling.fitting.id}`]);
  expect((await call(auth, "GET", `/api/clips?fittingId=${w.sibling.fitting.id}`)).body.clips).toEqual([]);
  nextFitting.child.kill("SIGKILL");
  // The state file remembers every file it sent.
  const state = JSON.parse(await readFile(path.join(dir, ".fitframe-sent.json"), "utf8"));
  expect(Object.keys(state).sort()).toEqual([path.join("down-the-line", "putt-3.mp4"), path.join("face-on", "putt-2.mp4"), path.join("overhead", "putt-1-copy.mp4"), path.join("overhead", "putt-1.mp4"), "putt-2_face-on_again.mp4"]);
});

it("finishes a file whose upload broke off, into the clip it was registered as", { timeout: 60_000 }, async () => {
  const w = await makeWorld();
  const token = await tokenFor(w.fitter.id);
  const auth = { token: token.value };
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-watch-"));
  await mkdir(path.join(dir, "overhead"));
  const file = path.join(dir, "overhead", "putt.mp4");
  await generateClip(file, { ...small, faceAngleAddressDeg: 0, faceAngleImpactDeg: -1, startDirectionDeg: 0, seed: 4 });
  const bytes = await readFile(file);
  const sha256 = createHash("sha256").update(bytes).digest("hex");
  expect((await call(auth, "PUT", `/api/fittings/${w.own.fitting.id}/recording`, { buildId: w.own.build.id })).status).toBe(200);

  // A sender registered the file and was cut off before its bytes reached the store.
  const body = { fittingId: w.own.fitting.id, buildId: w.own.build.id, view: "overhead", fileName: "putt.mp4", contentType: "video/mp4", sizeBytes: bytes.length, consentConfirmed: true, contentSha256: sha256 };
  const registered = await call(auth, "POST", "/api/clips", body);
  expect(registered.status).toBe(201);
  const again = await call(auth, "POST", "/api/clips", { ...body, fileName: "renamed.mp4" });
  expect(again.status).toBe(200);
  expect(again.body).toMatchObject({ duplicate: true, clip: { id: registered.body.clip.id, state: "awaiting_upload" }, upload: { method: "PUT" } });

  const watcher = await startWatcher(dir, w.own.fitting.id, token.value);
  const line = await sentLine(watcher, path.join("overhead", "putt.mp4"));
  expect(line).toContain(`\t${registered.body.clip.id}\t`);
  expect(line).toContain("finished an upload that had broken off");
  const rows = await settledClips<{ id: string; state: string }>(auth, w.own.fitting.id);
  expect(rows.map((r) => [r.id, r.state])).toEqual([[registered.body.clip.id, "ready"]]);
  // Once processed, the same content is answered with no upload at all.
  expect((await call(auth, "POST", "/api/clips", body)).body).toMatchObject({ duplicate: true, upload: null });
});

it("sends a large file in parts and, after a restart, only the parts the store does not have", { timeout: 60_000 }, async () => {
  const w = await makeWorld();
  const token = await tokenFor(w.fitter.id);
  const auth = { token: token.value };
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-watch-"));
  await mkdir(path.join(dir, "overhead"));
  const relative = path.join("overhead", "big.mp4");
  const file = path.join(dir, relative);
  await generateClip(file, { ...small, faceAngleAddressDeg: 2, faceAngleImpactDeg: 0, startDirectionDeg: 0, seed: 5 });
  const bytes = await readFile(file);
  const partBytes = Math.ceil(bytes.length / 4); // four parts (S3's 5 MiB minimum is not the fake store's)
  expect((await call(auth, "PUT", `/api/fittings/${w.own.fitting.id}/recording`, { buildId: w.own.build.id })).status).toBe(200);

  // A watcher got as far as part 1 before it was killed: the clip, the upload and that part exist.
  const registered = await call(auth, "POST", "/api/clips", {
    fittingId: w.own.fitting.id, buildId: w.own.build.id, view: "overhead", fileName: "big.mp4", contentType: "video/mp4",
    sizeBytes: bytes.length, consentConfirmed: true, contentSha256: createHash("sha256").update(bytes).digest("hex"),
  });
  const clipId = registered.body.clip.id as string;
  const started = await call(auth, "POST", `/api/clips/${clipId}/parts`, { partNumbers: [1] });
  expect(started.status).toBe(200);
  const put = await fetch(started.body.parts[0].url, { method: "PUT", body: bytes.subarray(0, partBytes) });
  expect(put.status).toBe(200);
  await writeFile(path.join(dir, ".fitframe-sent.json"), JSON.stringify({
    [relative]: { fittingId: w.own.fitting.id, buildId: w.own.build.id, parts: { clipId, uploadId: started.body.uploadId, etags: { 1: put.headers.get("etag") } } },
  }));

  const watcher = await startWatcher(dir, w.own.fitting.id, token.value, ["--part-mib", String(partBytes / 1024 / 1024)]);
  const line = await sentLine(watcher, relative);
  expect(line).toContain(`\t${clipId}\t`);
  expect(watcher.lines.filter((l) => l.startsWith(`${relative}\tpart `))).toEqual([2, 3, 4].map((n) => `${relative}\tpart ${n}/4`));

  // The parts made the whole file: the store holds every byte and the worker reads all 60 frames.
  const [clip] = await settledClips<{ state: string; frameCount: number | null }>(auth, w.own.fitting.id);
  expect(clip).toMatchObject({ state: "ready", frameCount: 60 });
  const [stored] = await db.select().from(schema.clips).where(eq(schema.clips.id, clipId));
  expect(stored!.sizeBytes).toBe(bytes.length);
});

it("resumes a part whose connection dropped half-way: every part reaches the store once", { timeout: 90_000 }, async () => {
  const w = await makeWorld();
  const token = await tokenFor(w.fitter.id);
  const auth = { token: token.value };
  const dir = await mkdtemp(path.join(tmpdir(), "fitframe-watch-"));
  await mkdir(path.join(dir, "overhead"));
  const staged = path.join(await mkdtemp(path.join(tmpdir(), "fitframe-watch-src-")), "drop.mp4");
  await generateClip(staged, { ...small, faceAngleAddressDeg: 1, faceAngleImpactDeg: 0.5, startDirectionDeg: 0, seed: 6 });
  const size = (await stat(staged)).size;
  const partBytes = Math.ceil(size / 4);
  expect((await call(auth, "PUT", `/api/fittings/${w.own.fitting.id}/recording`, { buildId: w.own.build.id })).status).toBe(200);

  // Between the watcher and the store, the first upload of part 2 is cut off after half its bytes.
  const proxy = await startDropProxy(BASE, process.env.S3_PUBLIC_ENDPOINT!, [2]);
  try {
    const watcher = await startWatcher(dir, w.own.fitting.id, token.value, ["--part-mib", String(partBytes / 1024 / 1024)], proxy.apiUrl);
    await copyFile(staged, path.join(dir, "overhead", "drop.mp4"));
    // The retry goes on into the clip the file was registered as.
    expect(await sentLine(watcher, path.join("overhead", "drop.mp4"))).toMatch(/\tsent \(finished an upload that had broken off\)$/);
    expect(proxy.dropped).toEqual([2]);
    expect(watcher.lines.filter((l) => l.includes("\tpart ")).length).toBe(4);
    // Each of the four parts was taken by the store exactly once; the dropped try never reached it.
    expect([...proxy.storedParts.entries()].sort(([a], [b]) => a - b)).toEqual([[1, 1], [2, 1], [3, 1], [4, 1]]);
  } finally {
    await proxy.close();
  }
  const [clip] = await settledClips<{ state: string; frameCount: number | null }>(auth, w.own.fitting.id);
  expect(clip).toMatchObject({ state: "ready", frameCount: 60 });
});

// The clip job through the real stack: upload a generated 2 s, 1280×720, 240 fps clip
// (480 frames, impact at frame 300), then time from the completion call until the impact
// frame can be fetched and until the whole clip is ready; beside it, one plain ffmpeg JPEG
// export of the same file for the ratio.
import { mkdir, mkdtemp, readFile, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { generateClip, STANDARD_CLIPS } from "@/tests/fixtures/generate-clips";
import { plainJpegExport } from "@/workers/video/ffmpeg";
import { baseUrl, benchStudio } from "./support";

const options = STANDARD_CLIPS["overhead-240-720p.mp4"]!;
const dir = await mkdtemp(path.join(tmpdir(), "fitframe-bench-job-"));
const file = path.join(dir, "clip.mp4");
await generateClip(file, options);
const { token, fitting, build } = await benchStudio();
const auth = { authorization: `Bearer ${token}` };

async function api(method: string, route: string, body?: unknown) {
  const res = await fetch(`${baseUrl()}${route}`, { method, redirect: "manual", headers: { ...auth, ...(body ? { "content-type": "application/json" } : {}) }, body: body ? JSON.stringify(body) : undefined });
  return res;
}

const created = await (await api("POST", "/api/clips", { fittingId: fitting.id, buildId: build.id, view: "overhead", fileName: "clip.mp4", contentType: "video/mp4", sizeBytes: (await stat(file)).size, captureFps: 240 })).json();
await fetch(created.upload.url, { method: "PUT", headers: created.upload.headers, body: await readFile(file) });
const t0 = performance.now();
await api("POST", `/api/clips/${created.clip.id}/complete`);

let windowS = NaN;
let readyS = NaN;
while (Number.isNaN(readyS) && performance.now() - t0 < 120_000) {
  if (Number.isNaN(windowS)) {
    const link = await api("GET", `/api/clips/${created.clip.id}/frames/${options.impactFrame}`);
    const location = link.headers.get("location");
    if (location && (await fetch(location, { method: "HEAD" })).ok) windowS = (performance.now() - t0) / 1000;
  }
  const { clips } = await (await api("GET", `/api/clips?fittingId=${fitting.id}`)).json();
  const clip = clips.find((c: { id: string }) => c.id === created.clip.id);
  if (clip.state === "ready") readyS = (performance.now() - t0) / 1000;
  if (clip.state === "failed") throw new Error(clip.failureReason);
  await new Promise((r) => setTimeout(r, 25));
}

const plainDir = path.join(dir, "plain");
await mkdir(plainDir);
const p0 = performance.now();
await plainJpegExport(file, plainDir, new AbortController().signal);
const plainS = (performance.now() - p0) / 1000;
await rm(dir, { recursive: true, force: true });

console.log("clip job through the stack (480 frames, 1280×720, 240 fps)");
console.log(`  impact frame fetchable after completion: ${windowS.toFixed(2)} s  [goal ≤ 3 s]`);
console.log(`  clip ready after completion:            ${readyS.toFixed(2)} s  [goal ≤ 15 s]`);
console.log(`  plain ffmpeg JPEG export of the file:    ${plainS.toFixed(2)} s`);
console.log(`  ratio job / plain export:                ${(readyS / plainS).toFixed(2)}  [goal ≤ 1.3]`);
console.log(`  frames per second through the job:      ${(options.frameCount / readyS).toFixed(0)}`);
process.exit(0);

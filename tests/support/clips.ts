// Uploading a file the way the capture computer does: register, PUT, complete, then wait.
import { execFile } from "node:child_process";
import { readFile, stat } from "node:fs/promises";
import path from "node:path";
import { promisify } from "node:util";
import { call, type Auth } from "./http";

const run = promisify(execFile);

export async function uploadClip(auth: Auth, file: string, target: { fittingId: string; buildId: string; view?: string; captureFps?: number; strokeId?: string }) {
  const { size } = await stat(file);
  const created = await call(auth, "POST", "/api/clips", {
    fittingId: target.fittingId, buildId: target.buildId, view: target.view ?? "overhead", fileName: path.basename(file),
    contentType: "video/mp4", sizeBytes: size, captureFps: target.captureFps, strokeId: target.strokeId, consentConfirmed: true,
  });
  if (created.status !== 201) throw new Error(`create clip: ${created.status} ${JSON.stringify(created.body)}`);
  const { clip, upload } = created.body as { clip: { id: string }; upload: { url: string; headers: Record<string, string> } };
  const put = await fetch(upload.url, { method: "PUT", headers: upload.headers, body: await readFile(file) });
  if (!put.ok) throw new Error(`upload: ${put.status}`);
  const done = await call(auth, "POST", `/api/clips/${clip.id}/complete`);
  return { clipId: clip.id, complete: done };
}

export type ClipRow = { id: string; state: string; progress: number; failureReason: string | null; frameCount: number | null };

/** Polls the fitting's clip list until the clip is ready or failed; returns every state seen. */
export async function waitForClip(auth: Auth, fittingId: string, clipId: string, timeoutMs = 90_000) {
  const seen: { state: string; progress: number }[] = [];
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await call(auth, "GET", `/api/clips?fittingId=${fittingId}`);
    const clip = (res.body.clips as ClipRow[]).find((c) => c.id === clipId)!;
    const last = seen.at(-1);
    if (!last || last.state !== clip.state || last.progress !== clip.progress) seen.push({ state: clip.state, progress: clip.progress });
    if (clip.state === "ready" || clip.state === "failed") return { clip, seen };
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`clip ${clipId} not finished after ${timeoutMs} ms: ${JSON.stringify(seen)}`);
}

/** Debian's ffprobe, the reference for frame counts and durations. */
export async function ffprobeFrameCount(file: string): Promise<number> {
  const { stdout } = await run("ffprobe", ["-v", "error", "-count_frames", "-select_streams", "v:0", "-show_entries", "stream=nb_read_frames", "-of", "csv=p=0", file]);
  return Number(stdout.trim());
}

export async function ffprobeDuration(file: string): Promise<number> {
  const { stdout } = await run("ffprobe", ["-v", "error", "-select_streams", "v:0", "-show_entries", "stream=duration", "-of", "csv=p=0", file]);
  return Number(stdout.trim());
}

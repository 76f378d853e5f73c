// Pushes clips from the capture computer without a browser:
//   FITFRAME_TOKEN=ff_… npm run upload -- --fitting ID --build ID --view overhead --fps 240 [--consent] [--wait] FILES…
// Each file is registered, sent straight to the store by its presigned URL, then completed.
import { readFile, stat } from "node:fs/promises";
import path from "node:path";
import { parseArgs } from "node:util";

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: {
    fitting: { type: "string" }, build: { type: "string" }, view: { type: "string", default: "overhead" },
    fps: { type: "string" }, consent: { type: "boolean", default: false }, wait: { type: "boolean", default: false },
    url: { type: "string", default: process.env.FITFRAME_URL ?? "http://127.0.0.1:3000" },
  },
});

const token = process.env.FITFRAME_TOKEN;
if (!token || !values.fitting || !values.build || positionals.length === 0) {
  console.error("usage: FITFRAME_TOKEN=… npm run upload -- --fitting ID --build ID --view overhead|face-on|down-the-line --fps 240 [--consent] [--wait] FILES…");
  process.exit(2);
}

const contentTypes: Record<string, string> = { ".mp4": "video/mp4", ".m4v": "video/mp4", ".mov": "video/quicktime", ".avi": "video/x-msvideo", ".mkv": "video/x-matroska" };

async function api(method: string, route: string, body?: unknown) {
  const res = await fetch(`${values.url}${route}`, {
    method,
    headers: { authorization: `Bearer ${token}`, ...(body ? { "content-type": "application/json" } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const data = await res.json().catch(() => null);
  if (!res.ok) throw new Error(data?.error?.message ?? `${method} ${route}: ${res.status}`);
  return data;
}

async function uploadOne(file: string): Promise<string> {
  const { size } = await stat(file);
  const { clip, upload } = await api("POST", "/api/clips", {
    fittingId: values.fitting, buildId: values.build, view: values.view, fileName: path.basename(file),
    contentType: contentTypes[path.extname(file).toLowerCase()] ?? "application/octet-stream", sizeBytes: size,
    captureFps: values.fps ? Number(values.fps) : undefined, consentConfirmed: values.consent,
  });
  const put = await fetch(upload.url, { method: "PUT", headers: upload.headers, body: await readFile(file) });
  if (!put.ok) throw new Error(`the store refused ${file}: ${put.status}`);
  await api("POST", `/api/clips/${clip.id}/complete`);
  console.log(`${path.basename(file)}\t${clip.id}\tqueued`);
  return clip.id;
}

async function waitAll(ids: string[]) {
  const pending = new Set(ids);
  while (pending.size > 0) {
    const { clips } = await api("GET", `/api/clips?fittingId=${values.fitting}`);
    for (const c of clips as { id: string; state: string; failureReason: string | null; originalName: string }[]) {
      if (pending.has(c.id) && (c.state === "ready" || c.state === "failed")) {
        pending.delete(c.id);
        console.log(`${c.originalName}\t${c.id}\t${c.state}${c.failureReason ? `: ${c.failureReason}` : ""}`);
      }
    }
    if (pending.size > 0) await new Promise((r) => setTimeout(r, 1000));
  }
}

let failed = 0;
const ids: string[] = [];
for (const file of positionals) {
  try {
    ids.push(await uploadOne(file));
  } catch (err) {
    failed++;
    console.error(`${file}: ${(err as Error).message}`);
  }
}
if (values.wait) await waitAll(ids);
process.exit(failed > 0 ? 1 : 0);

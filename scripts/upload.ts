// Pushes clips from the capture computer without a browser.
//   One-shot: FITFRAME_TOKEN=ff_… npm run upload -- --fitting ID --build ID --view overhead --fps 240 [--consent] [--wait] FILES…
//   Watch:    FITFRAME_TOKEN=ff_… npm run upload -- --watch DIR --fitting ID [--fps 240] [--consent] [--settle-ms 1500]
//   Both:     [--part-mib 16] — a file larger than one part goes up in parts (multipart upload)
// Each file is registered with its SHA-256 (a file the fitting already has is never sent twice),
// sent straight to the store by its presigned URL, then completed. Watch mode: scripts/lib/watch-folder.ts.
import path from "node:path";
import { parseArgs } from "node:util";
import { apiClient, memoryPartsStore, sendFile, type Api, type Clip } from "./lib/upload-client";
import { watchFolder } from "./lib/watch-folder";

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: {
    fitting: { type: "string" }, build: { type: "string" }, view: { type: "string", default: "overhead" },
    fps: { type: "string" }, consent: { type: "boolean", default: false }, wait: { type: "boolean", default: false },
    watch: { type: "string" }, "settle-ms": { type: "string", default: "1500" }, "part-mib": { type: "string", default: "16" },
    url: { type: "string", default: process.env.FITFRAME_URL ?? "http://127.0.0.1:3000" },
  },
});

const USAGE = [
  "usage: FITFRAME_TOKEN=… npm run upload -- --fitting ID --build ID --view overhead|face-on|down-the-line --fps 240 [--consent] [--wait] FILES…",
  "       FITFRAME_TOKEN=… npm run upload -- --watch DIR --fitting ID [--fps 240] [--consent] [--settle-ms 1500]",
  "       either: [--part-mib 16] (files larger than one part go up in parts)",
].join("\n");

const token = process.env.FITFRAME_TOKEN;
const oneShot = !values.watch && values.build && positionals.length > 0;
const settleMs = Number(values["settle-ms"]);
// Files larger than one part go up in parts (S3 wants parts of at least 5 MiB; smaller only suits the local fake).
const partBytes = Math.round(Number(values["part-mib"]) * 1024 * 1024);
if (!token || !values.fitting || (!values.watch && !oneShot) || !(settleMs > 0) || !(partBytes > 0)) {
  console.error(USAGE);
  process.exit(2);
}
const api = apiClient(values.url!, token);
const captureFps = values.fps ? Number(values.fps) : undefined;

async function waitAll(ids: string[]) {
  const pending = new Set(ids);
  while (pending.size > 0) {
    const { clips } = await api<{ clips: Clip[] }>("GET", `/api/clips?fittingId=${values.fitting}`);
    for (const c of clips) {
      if (pending.has(c.id) && (c.state === "ready" || c.state === "failed")) {
        pending.delete(c.id);
        console.log(`${c.originalName}\t${c.id}\t${c.state}${c.failureReason ? `: ${c.failureReason}` : ""}`);
      }
    }
    if (pending.size > 0) await new Promise((r) => setTimeout(r, 1000));
  }
}

async function uploadFiles(api: Api) {
  let failed = 0;
  const ids: string[] = [];
  for (const file of positionals) {
    try {
      const { clip, sent } = await sendFile(api, {
        fittingId: values.fitting!, buildId: values.build!, view: values.view!, file, captureFps, consentConfirmed: values.consent!,
        partBytes, parts: memoryPartsStore(),
      });
      ids.push(clip.id);
      console.log(`${path.basename(file)}\t${clip.id}\t${sent ? "queued" : `already there (${clip.originalName})`}`);
    } catch (err) {
      failed++;
      console.error(`${file}: ${(err as Error).message}`);
    }
  }
  if (values.wait) await waitAll(ids);
  process.exit(failed > 0 ? 1 : 0);
}

if (oneShot) {
  await uploadFiles(api);
} else {
  const watcher = await watchFolder({
    api, dir: path.resolve(values.watch!), fittingId: values.fitting!, captureFps, consentConfirmed: values.consent!, settleMs, partBytes,
    log: (line) => console.log(line),
  });
  for (const signal of ["SIGINT", "SIGTERM"] as const) {
    process.once(signal, () => void watcher.close().then(() => process.exit(0)));
  }
}

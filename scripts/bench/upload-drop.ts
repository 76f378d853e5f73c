// A 500 MB file over loopback in 16 MiB parts through the real stack, with one simulated drop: the
// connection of part 3 is cut half-way (tests/support/drop-proxy.ts sits between the sender and
// the store). Prints the wall time and how many times the store took each part (goal: once each).
import { open, mkdtemp, rm } from "node:fs/promises";
import { randomBytes } from "node:crypto";
import { tmpdir } from "node:os";
import path from "node:path";
import { pool } from "@/db";
import { apiClient, memoryPartsStore, sendFile } from "@/scripts/lib/upload-client";
import { startDropProxy } from "@/tests/support/drop-proxy";
import { baseUrl, benchStudio } from "./support";

const SIZE = 500_000_000;
const PART = 16 * 1024 * 1024;
const dir = await mkdtemp(path.join(tmpdir(), "fitframe-bench-drop-"));
const file = path.join(dir, "big.mp4");
const handle = await open(file, "w");
const block = randomBytes(1024 * 1024);
for (let at = 0; at < SIZE; at += block.length) await handle.write(block.subarray(0, Math.min(block.length, SIZE - at)));
await handle.close();

const { token, fitting, build } = await benchStudio();
const proxy = await startDropProxy(baseUrl(), process.env.S3_PUBLIC_ENDPOINT!, [3]);
const t0 = performance.now();
const result = await sendFile(apiClient(proxy.apiUrl, token), {
  fittingId: fitting.id, buildId: build.id, view: "overhead", file, consentConfirmed: true, partBytes: PART, parts: memoryPartsStore(),
}, (line) => console.log(`  ${line}`));
const seconds = (performance.now() - t0) / 1000;
await proxy.close();
const counts = [...proxy.storedParts.values()];
console.log(`500 MB in ${Math.ceil(SIZE / PART)} parts of 16 MiB with part 3 cut off half-way once: ${result.sent ? "sent" : "not sent"} in ${seconds.toFixed(1)} s (${(SIZE / 1e6 / seconds).toFixed(0)} MB/s, hashing included)`);
console.log(`parts the store took: ${proxy.storedParts.size}, each ${Math.min(...counts)}–${Math.max(...counts)} time(s); dropped tries: ${proxy.dropped.join(", ") || "none"} (goal: every part once)`);
await rm(dir, { recursive: true, force: true });
await pool.end();

// Comparison of a fitting with 6 builds × 10 clips (8 measurements each): the server's time to
// answer GET /api/fittings/{id}/comparison, measured as loopback latency with one connection.
// Goal: ≤ 200 ms.
//
//   BENCH_BASE_URL=http://127.0.0.1:3000 DATABASE_URL=postgres://… \
//     node --conditions=react-server --import tsx scripts/bench/comparison.ts
import { createHash, randomBytes } from "node:crypto";
import autocannon from "autocannon";
import { eq } from "drizzle-orm";
import { db, pool, schema } from "@/db";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000";
const BUILDS = 6;
const CLIPS = 10;
const KEYS = ["aim", "face_angle_impact", "path", "face_to_path", "face_rotation_rate", "twist", "start_direction", "ball_speed"];

const tag = randomBytes(4).toString("hex");
const settings = { units: "ft" as const, frictionMu: 0.2, windows: { face_angle_impact: { min: -1, max: 1 }, path: { min: -2, max: 2 } }, cameraFps: { overhead: 240, "face-on": 240, "down-the-line": 240 } };
const [studio] = await db.insert(schema.studios).values({ name: `Bench comparison ${tag}`, slug: `bench-compare-${tag}`, settings }).returning();
const studioId = studio!.id;
const [fitter] = await db.insert(schema.users).values({ studioId, role: "fitter", email: `bench-${tag}@compare.test`, name: "Bench fitter" }).returning();
const token = `ff_bench_${randomBytes(16).toString("hex")}`;
await db.insert(schema.apiTokens).values({ userId: fitter!.id, name: "bench", tokenHash: createHash("sha256").update(token).digest("hex") });
const [golfer] = await db.insert(schema.golfers).values({ studioId, name: "Bench golfer" }).returning();
const [fitting] = await db.insert(schema.fittings).values({ studioId, golferId: golfer!.id, scheduledAt: new Date() }).returning();
// Demo values only: a spread per build so the statistics have work to do.
for (let b = 0; b < BUILDS; b++) {
  const [build] = await db.insert(schema.builds).values({ studioId, fittingId: fitting!.id, position: b + 1, label: `Build ${b + 1}` }).returning();
  for (let c = 0; c < CLIPS; c++) {
    const [clip] = await db
      .insert(schema.clips)
      .values({ studioId, fittingId: fitting!.id, buildId: build!.id, view: "overhead", state: "ready", originalName: "p.mp4", contentType: "video/mp4", sizeBytes: 1, objectKey: `bench/${tag}/${b}/${c}`, captureFps: 240 })
      .returning();
    await db.insert(schema.measurements).values(KEYS.map((key, k) => ({ studioId, clipId: clip!.id, key, value: Math.sin(b * 31 + c * 7 + k) * (1 + b / 3), unit: key === "ball_speed" ? "m/s" : "deg" })));
  }
}

const path = `/api/fittings/${fitting!.id}/comparison`;
const check = await fetch(`${BASE}${path}`, { headers: { authorization: `Bearer ${token}` } });
const body = (await check.json()) as { builds: unknown[] };
if (check.status !== 200 || body.builds.length !== BUILDS) throw new Error(`unexpected answer ${check.status}`);
const result = await autocannon({ url: `${BASE}${path}`, connections: 1, amount: 200, headers: { authorization: `Bearer ${token}` } });
console.log(`GET ${path} (${BUILDS} builds × ${CLIPS} clips × ${KEYS.length} measurements), one connection, ${result.requests.sent} requests:`);
console.log(`p50 ${result.latency.p50} ms, p90 ${result.latency.p90} ms, p99 ${result.latency.p99} ms, max ${result.latency.max} ms, non-2xx ${result.non2xx} (goal ≤ 200 ms)`);
await db.delete(schema.studios).where(eq(schema.studios.id, studioId));
await pool.end();

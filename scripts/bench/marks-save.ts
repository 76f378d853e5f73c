/**
 * Benchmark: saving marks (each save recomputes and stores the clip's measurements in one
 * transaction under the clip's row lock). Goal: p99 ≤ 100 ms at 50 connections.
 *
 *   BENCH_BASE_URL=http://127.0.0.1:3000 BENCH_TOKEN=ff_… DATABASE_URL=postgres://… \
 *     node --conditions=react-server --import tsx scripts/bench/marks-save.ts
 *
 * Env: BENCH_BASE_URL, BENCH_TOKEN (a staff member's Bearer token; without it a bench studio
 * and fitter are made in the database, as `npm run bench` does); DATABASE_URL to create
 * ready clips in the token owner's studio (removed afterwards unless BENCH_KEEP=1), or
 * BENCH_CLIP_IDS=id,id… to use ready clips of yours. BENCH_MODE=patch (default: each
 * connection moves marks no other connection holds, so no version conflicts) or post (new
 * marks). BENCH_CLIPS (default 1: every save contends for one clip's lock, the worst case),
 * BENCH_CONNECTIONS (50), BENCH_DURATION (10 s), BENCH_MARKS (marks drawn per clip first, 40),
 * BENCH_WARMUP (10 s of the same load first, not counted: a fresh server needs load before V8 has optimised its hot code).
 *
 * It then loads GET /api/me (sign-in by token and nothing else) the same way: the floor any
 * signed-in API route stands on with this web server on this machine, for comparison.
 */
import { createHash } from "node:crypto";
import autocannon from "autocannon";
import pg from "pg";
import { benchStudio } from "./support";

const base = required("BENCH_BASE_URL").replace(/\/$/, "");
const token = process.env.BENCH_TOKEN ?? (await benchStudio()).token;
const mode = process.env.BENCH_MODE === "post" ? "post" : "patch";
const connections = Number(process.env.BENCH_CONNECTIONS ?? 50);
const duration = Number(process.env.BENCH_DURATION ?? 10);
const clipCount = Number(process.env.BENCH_CLIPS ?? 1);
const warmup = Number(process.env.BENCH_WARMUP ?? 10);
const marksPerClip = Math.max(Number(process.env.BENCH_MARKS ?? 40), Math.ceil((3 * connections) / clipCount));
const headers = { authorization: `Bearer ${token}`, "content-type": "application/json" };

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`Set ${name} (see the comment at the top of scripts/bench/marks-save.ts)`);
  return value;
}

async function api<T>(method: string, path: string, body?: unknown): Promise<T> {
  const res = await fetch(`${base}${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  const text = await res.text();
  if (!res.ok) throw new Error(`${method} ${path} → ${res.status} ${text}`);
  return JSON.parse(text) as T;
}

/** Ready overhead clips (1280×720, 480 frames at 240 fps) for a new golfer in the token owner's studio. */
async function createClips(pool: pg.Pool): Promise<{ clipIds: string[]; golferId: string }> {
  const hash = createHash("sha256").update(token).digest("hex");
  const { rows: [owner] } = await pool.query<{ studio_id: string }>(
    "select u.studio_id from api_tokens t join users u on u.id = t.user_id where t.token_hash = $1 and t.revoked_at is null", [hash]);
  if (!owner) throw new Error("BENCH_TOKEN is not a live token in DATABASE_URL's database");
  const studio = owner.studio_id;
  const one = async (sql: string, values: unknown[]) => (await pool.query<{ id: string }>(sql, values)).rows[0]!.id;
  const golferId = await one("insert into golfers (studio_id, name) values ($1, 'Bench Golfer') returning id", [studio]);
  const fittingId = await one("insert into fittings (studio_id, golfer_id, scheduled_at) values ($1, $2, now()) returning id", [studio, golferId]);
  const buildId = await one("insert into builds (studio_id, fitting_id, position, label, loft_deg) values ($1, $2, 1, 'Bench', 3) returning id", [studio, fittingId]);
  const clipIds: string[] = [];
  for (let i = 0; i < clipCount; i++) {
    clipIds.push(await one(
      `insert into clips (studio_id, fitting_id, build_id, view, state, original_name, content_type, size_bytes, object_key,
         capture_fps, width, height, frame_count, address_frame, impact_frame)
       values ($1, $2, $3, 'overhead', 'ready', 'bench.mp4', 'video/mp4', 1, 'bench/none', 240, 1280, 720, 480, 40, 300) returning id`,
      [studio, fittingId, buildId]));
  }
  return { clipIds, golferId };
}

type Held = { clipId: string; markId: string; version: number; x: number; y: number };

/** A realistic clip: target, face lines, a scale, and clubhead and ball tracks around impact. */
async function drawMarks(clipId: string): Promise<Held[]> {
  const post = (mark: unknown) => api<{ mark: { id: string; version: number } }>("POST", `/api/clips/${clipId}/marks`, mark);
  await post({ frame: 0, kind: "line", role: "target", points: [[640, 400], [640, 60]] });
  await post({ frame: 300, kind: "scale", role: "ball", points: [[615, 400], [665, 400]] });
  for (const frame of [40, 280, 300, 301]) await post({ frame, kind: "line", role: "face", points: [[600, 430], [680, 431]] });
  const held: Held[] = [];
  for (let i = 0; i < marksPerClip; i++) {
    // Ball points on frames 301…, clubhead points on frames …300, all inside the 1280×720 frame.
    const afterImpact = i % 2 === 0;
    const step = Math.floor(i / 2) % 170;
    const frame = afterImpact ? 301 + step : 300 - step;
    const [x, y] = afterImpact ? [640 + (i % 7), 400 - 2 * step] : [640 - (i % 5), 440 + step];
    const { mark } = await post({ frame, kind: "point", role: afterImpact ? "ball" : "clubhead", points: [[x, y]] });
    held.push({ clipId, markId: mark.id, version: mark.version, x, y });
  }
  return held;
}

function requestFor(free: Held[], clipIds: string[]): autocannon.Request {
  let n = 0;
  if (mode === "post") {
    return {
      method: "POST",
      setupRequest: (req) => {
        n += 1;
        const clipId = clipIds[n % clipIds.length]!;
        return { ...req, path: `/api/clips/${clipId}/marks`, body: JSON.stringify({ frame: 20 + (n % 200), kind: "point", role: "clubhead", points: [[200 + (n % 800), 300]] }) };
      },
    };
  }
  // Each in-flight request holds its mark; it goes back to the pool with its new version.
  return {
    method: "PATCH",
    setupRequest: (req, context) => {
      const m = free.shift();
      if (!m) throw new Error("no free mark: raise BENCH_MARKS");
      (context as { held?: Held }).held = m;
      n += 1;
      return { ...req, path: `/api/clips/${m.clipId}/marks/${m.markId}`, body: JSON.stringify({ version: m.version, points: [[m.x + (n % 2), m.y]] }) };
    },
    onResponse: (status, body, context) => {
      const m = (context as { held: Held }).held;
      if (status === 200) m.version = (JSON.parse(body) as { mark: { version: number } }).mark.version;
      free.push(m);
    },
  };
}

async function main() {
  const pool = process.env.BENCH_CLIP_IDS ? null : new pg.Pool({ connectionString: required("DATABASE_URL"), max: 2 });
  const made = pool ? await createClips(pool) : null;
  const clipIds = made?.clipIds ?? process.env.BENCH_CLIP_IDS!.split(",");
  try {
    const free = (await Promise.all(clipIds.map(drawMarks))).flat();
    console.log(`marks-save: ${mode.toUpperCase()} on ${clipIds.length} clip(s), ${free.length} marks, ${connections} connections, ${duration} s`);
    const requests = [requestFor(free, clipIds)];
    if (warmup > 0) await autocannon({ url: base, connections, duration: warmup, headers, requests });
    const result = await autocannon({ url: base, connections, duration, headers, requests });
    const errors = result.errors + result.timeouts + result.non2xx;
    console.log(`p50 ${result.latency.p50} ms`);
    console.log(`p99 ${result.latency.p99} ms (goal ≤ 100 ms: ${result.latency.p99 <= 100 ? "met" : "missed"})`);
    console.log(`requests/s ${result.requests.average.toFixed(1)} (total ${result.requests.total})`);
    console.log(`errors ${errors} (connection ${result.errors}, timeouts ${result.timeouts}, non-2xx ${result.non2xx})`);
    if (errors > 0) process.exitCode = 1;
    const floor = await autocannon({ url: `${base}/api/me`, connections, duration, headers });
    console.log(`for comparison, GET /api/me alike: p50 ${floor.latency.p50} ms, p99 ${floor.latency.p99} ms, requests/s ${floor.requests.average.toFixed(1)}`);
  } finally {
    if (pool && made && process.env.BENCH_KEEP !== "1") await pool.query("delete from golfers where id = $1", [made.golferId]);
    await pool?.end();
  }
}

await main();

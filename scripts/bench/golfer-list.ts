// Golfer list API under load: 10,000 golfers and 100,000 clips in one studio, then autocannon on
// GET /api/golfers (by name, a search, by last fitting). Goal: p99 ≤ 150 ms. Prints the EXPLAIN
// ANALYZE of the list and count queries (the same SQL the DAL sends, written out).
//
//   BENCH_BASE_URL=http://127.0.0.1:3000 DATABASE_URL=postgres://… \
//     node --conditions=react-server --import tsx scripts/bench/golfer-list.ts
// Seeding is idempotent: a studio with slug `bench-golfers` is reused when present.
import { createHash, randomBytes } from "node:crypto";
import autocannon from "autocannon";
import { eq, sql } from "drizzle-orm";
import { db, pool, schema } from "@/db";

const BASE = process.env.BENCH_BASE_URL ?? "http://127.0.0.1:3000";
const GOLFERS = 10_000;
const CLIPS_PER_GOLFER = 10;
const SLUG = "bench-golfers";

async function seed() {
  const [existing] = await db.select().from(schema.studios).where(eq(schema.studios.slug, SLUG));
  const settings = { units: "ft" as const, frictionMu: 0.2, windows: {}, cameraFps: { overhead: 240, "face-on": 240, "down-the-line": 240 } };
  const studio = existing ?? (await db.insert(schema.studios).values({ name: "Bench golfers", slug: SLUG, settings }).returning())[0]!;
  const [{ n }] = (await pool.query("select count(*)::int as n from golfers where studio_id = $1", [studio.id])).rows as [{ n: number }];
  if (n < GOLFERS) {
    const t0 = performance.now();
    // Invented names: a first name and a family name from short lists, plus the row number.
    await pool.query(
      `insert into golfers (studio_id, name, email, updated_at)
       select $1, (array['Ada','Ben','Cleo','Dan','Eve','Finn','Gia','Hal','Ivy','Jon'])[1 + i % 10] || ' ' ||
                  (array['Reed','Stone','Marsh','Vale','Quill','Hart','Lowe','Pike','Rook','Sage'])[1 + (i / 10) % 10] || ' ' || i,
              'bench' || i || '@golfers.test', now() - (i || ' minutes')::interval
       from generate_series(1, $2) as i`,
      [studio.id, GOLFERS - n],
    );
    await pool.query(
      `insert into fittings (studio_id, golfer_id, scheduled_at)
       select studio_id, id, now() - ((random() * 400)::int || ' days')::interval from golfers where studio_id = $1`,
      [studio.id],
    );
    await pool.query(`insert into builds (studio_id, fitting_id, position, label) select studio_id, id, 1, 'Baseline' from fittings where studio_id = $1`, [studio.id]);
    await pool.query(
      `insert into clips (studio_id, fitting_id, build_id, view, state, original_name, content_type, size_bytes, object_key, capture_fps)
       select b.studio_id, b.fitting_id, b.id, 'overhead', 'ready', 'putt.mp4', 'video/mp4', 1000000, 'bench/' || b.id || '/' || k, 240
       from builds b cross join generate_series(1, $2) as k where b.studio_id = $1`,
      [studio.id, CLIPS_PER_GOLFER],
    );
    await pool.query("analyze golfers; analyze fittings; analyze clips");
    console.log(`seeded ${GOLFERS} golfers, ${GOLFERS * CLIPS_PER_GOLFER} clips in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
  }
  const [admin] = await db
    .insert(schema.users)
    .values({ studioId: studio.id, role: "admin", email: `bench-${randomBytes(4).toString("hex")}@golfers.test`, name: "Bench admin" })
    .returning();
  const token = `ff_bench_${randomBytes(16).toString("hex")}`;
  await db.insert(schema.apiTokens).values({ userId: admin!.id, name: "bench", tokenHash: createHash("sha256").update(token).digest("hex") });
  return { studioId: studio.id, token };
}

async function load(path: string, token: string) {
  const result = await autocannon({ url: `${BASE}${path}`, connections: 10, duration: 10, headers: { authorization: `Bearer ${token}` } });
  const ok = result["2xx"];
  console.log(`GET ${path}: ${result.requests.average.toFixed(0)} req/s, p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, 2xx ${ok}, other ${result.non2xx}`);
  return result.latency.p99;
}

async function explain(label: string, text: string, params: unknown[]) {
  const { rows } = await pool.query(`explain (analyze, buffers, costs off) ${text}`, params);
  console.log(`\n-- EXPLAIN ANALYZE: ${label}\n${rows.map((r: Record<string, string>) => r["QUERY PLAN"]).join("\n")}`);
}

const { studioId, token } = await seed();
const LAST_FITTING = "(select max(f.scheduled_at) from fittings f where f.golfer_id = g.id)";
const COLUMNS = `g.id, g.name, g.email, g.handedness, g.is_minor, g.updated_at, g.video_consent_at, ${LAST_FITTING} as last_fitting_at`;
await explain("page 1 by name", `select ${COLUMNS} from golfers g where g.studio_id = $1 order by g.name asc, g.id asc limit 25 offset 0`, [studioId]);
await explain("count", `select count(*) from golfers g where g.studio_id = $1`, [studioId]);
await explain("search 'sto'", `select ${COLUMNS} from golfers g where g.studio_id = $1 and (g.name ilike $2 or g.name ilike $3 or g.email ilike $2) order by g.name asc, g.id asc limit 25`, [studioId, "sto%", "% sto%"]);
await explain(
  "by last fitting (grouped fittings joined in)",
  `select g.id, g.name, g.email, g.handedness, g.is_minor, g.updated_at, g.video_consent_at, lf.last_fitting_at from golfers g
   left join (select golfer_id, max(scheduled_at) as last_fitting_at from fittings where studio_id = $1 group by golfer_id) lf on lf.golfer_id = g.id
   where g.studio_id = $1 order by lf.last_fitting_at desc nulls last, g.id asc limit 25`,
  [studioId],
);
console.log("");
const p99s = [
  await load("/api/golfers?sort=name&dir=asc&limit=25&offset=0", token),
  await load("/api/golfers?sort=name&dir=asc&limit=25&offset=5000", token),
  await load("/api/golfers?q=sto&sort=name&limit=25", token),
  await load("/api/golfers?sort=lastFitting&dir=desc&limit=25", token),
];
console.log(`\nworst p99 ${Math.max(...p99s)} ms (goal ≤ 150 ms)`);
await db.delete(schema.users).where(sql`${schema.users.email} like 'bench-%@golfers.test' and ${schema.users.role} = 'admin'`);
await pool.end();

import "server-only";
// The web process only sends jobs; workers (workers/index.ts) run them.
import PgBoss from "pg-boss";
import { env } from "@/lib/config/env";
import { CLIP_PROCESS_QUEUE, clipProcessPolicy, type ClipProcessPayload } from "@/lib/jobs/clip-process";
import { CLIP_TRACK_QUEUE, clipTrackPolicy } from "@/lib/jobs/clip-track";

const globalForBoss = globalThis as unknown as { fitframeBoss?: Promise<PgBoss> };

function boss(): Promise<PgBoss> {
  globalForBoss.fitframeBoss ??= (async () => {
    const instance = new PgBoss({ connectionString: env().DATABASE_URL, schema: "pgboss", supervise: false, schedule: false, max: 2 });
    instance.on("error", (err) => console.error("pg-boss error:", err.message));
    await instance.start();
    await instance.createQueue(CLIP_PROCESS_QUEUE, { name: CLIP_PROCESS_QUEUE, ...clipProcessPolicy(env().CLIP_JOB_EXPIRE_S) });
    await instance.createQueue(CLIP_TRACK_QUEUE, { name: CLIP_TRACK_QUEUE, ...clipTrackPolicy(env().CLIP_JOB_EXPIRE_S) });
    return instance;
  })();
  return globalForBoss.fitframeBoss;
}

/** One job per clip: the singleton key refuses a second while the first is waiting or running. */
export async function enqueueClipProcessing(payload: ClipProcessPayload): Promise<string | null> {
  return (await boss()).send(CLIP_PROCESS_QUEUE, payload, { ...clipProcessPolicy(env().CLIP_JOB_EXPIRE_S), singletonKey: payload.clipId });
}

/** Re-runs a ready clip's tracking; the singleton key keeps one job per clip while one is waiting or running. */
export async function queueTracking(clipId: string): Promise<string | null> {
  return (await boss()).send(CLIP_TRACK_QUEUE, { clipId }, { ...clipTrackPolicy(env().CLIP_JOB_EXPIRE_S), singletonKey: clipId });
}

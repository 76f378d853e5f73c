// The worker process: takes jobs from pg-boss (PostgreSQL). Run as many as you like against
// one database; each job is taken by one worker at a time.
import PgBoss from "pg-boss";
import { env } from "@/lib/config/env";
import { registerJobs, running } from "./jobs";
import { warmUp } from "./video";

const boss = new PgBoss({
  connectionString: env().DATABASE_URL,
  schema: "pgboss",
  // How often expired jobs (a worker that died mid-job) are found and retried.
  maintenanceIntervalSeconds: env().PGBOSS_MAINTENANCE_S,
});
boss.on("error", (err) => console.error("pg-boss error:", err.message));

// fluent-ffmpeg asks ffmpeg for its formats once per process; do it before the first clip.
await warmUp();
await boss.start();
await registerJobs(boss, env().WORKER_CONCURRENCY);
console.log(`worker ready (pid ${process.pid})`);

let stopping = false;
async function shutdown() {
  if (stopping) return;
  stopping = true;
  // Kill running ffmpeg at once; the jobs go back to the queue and are retried later.
  for (const controller of running) controller.abort();
  await boss.stop({ graceful: true, timeout: 10_000 });
  process.exit(0);
}
process.on("SIGTERM", shutdown);
process.on("SIGINT", shutdown);

// The worker process: takes jobs from pg-boss (PostgreSQL). Run as many as you like against
// one database; each job is taken by one worker at a time.
import PgBoss from "pg-boss";
import { env } from "@/lib/config/env";
import { registerJobs } from "./jobs";

const boss = new PgBoss({ connectionString: env().DATABASE_URL, schema: "pgboss" });
boss.on("error", (err) => console.error("pg-boss error:", err.message));

await boss.start();
await registerJobs(boss);
console.log(`worker ready (pid ${process.pid})`);

let stopping = false;
async function shutdown() {
  if (stopping) return;
  stopping = true;
  // Unfinished jobs go back to the queue and are retried by this or another worker.
  await boss.stop({ graceful: true, timeout: 10_000 });
  process.exit(0);
}
process.on("SIGTERM", shutdown);
process.on("SIGINT", shutdown);

// The queues this worker serves. Each job is a name, a zod payload and a handler that is
// safe to run twice. The clip pipeline adds its queue here.
import type PgBoss from "pg-boss";

export async function registerJobs(boss: PgBoss): Promise<void> {
  void boss;
}

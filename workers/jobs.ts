// The queues this worker serves. Each job is a name, a zod payload and a handler that is
// safe to run twice.
import type PgBoss from "pg-boss";
import { env } from "@/lib/config/env";
import { CLIP_PROCESS_QUEUE, clipProcessPayload, clipProcessPolicy } from "@/lib/jobs/clip-process";
import { CLIP_TRACK_QUEUE, clipTrackPayload, clipTrackPolicy } from "@/lib/jobs/clip-track";
import { runClipJob } from "./clip-job";
import { runTrackJob } from "./clip-track-job";
import { sendAllDueReminders } from "@/lib/server/dal/bookings";
import { sweepAbandonedUploads } from "@/lib/server/dal/upload-sweep";
import { startCommentMail } from "./comment-mail";

const REMINDER_QUEUE = "booking-reminders";
const UPLOAD_SWEEP_QUEUE = "upload-sweep";

/** Running jobs' controllers: aborted on shutdown or expiry, which kills their ffmpeg. */
export const running = new Set<AbortController>();

export async function registerJobs(boss: PgBoss, concurrency: number): Promise<void> {
  await boss.createQueue(CLIP_PROCESS_QUEUE, { name: CLIP_PROCESS_QUEUE, ...clipProcessPolicy(env().CLIP_JOB_EXPIRE_S) });
  const handler: PgBoss.WorkWithMetadataHandler<unknown> = async ([job]) => {
    if (!job) return;
    const { clipId } = clipProcessPayload.parse(job.data);
    const controller = new AbortController();
    // pg-boss gives the job to another worker after expiry; stop ours before that.
    const expiry = setTimeout(() => controller.abort(), Math.max(5, job.expireInSeconds - 5) * 1000);
    running.add(controller);
    try {
      const result = await runClipJob(clipId, controller.signal, job.retryCount >= job.retryLimit);
      console.log(JSON.stringify({ event: "clip_job", clipId, ...result, try: job.retryCount + 1 }));
    } finally {
      clearTimeout(expiry);
      running.delete(controller);
    }
  };
  // Each work() call is one job at a time; concurrency = how many clips this process runs at once.
  for (let i = 0; i < concurrency; i++) {
    await boss.work(CLIP_PROCESS_QUEUE, { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: 0.5 }, handler);
  }
  // Tracking re-runs: one at a time per process (each takes a core for a few seconds).
  await boss.createQueue(CLIP_TRACK_QUEUE, { name: CLIP_TRACK_QUEUE, ...clipTrackPolicy(env().CLIP_JOB_EXPIRE_S) });
  await boss.work(CLIP_TRACK_QUEUE, { batchSize: 1, includeMetadata: true, pollingIntervalSeconds: 0.5 }, async ([job]) => {
    if (!job) return;
    const { clipId } = clipTrackPayload.parse(job.data);
    const controller = new AbortController();
    const expiry = setTimeout(() => controller.abort(), Math.max(5, job.expireInSeconds - 5) * 1000);
    running.add(controller);
    try {
      const result = await runTrackJob(clipId, controller.signal);
      console.log(JSON.stringify({ event: "clip_track_job", clipId, ...result, try: job.retryCount + 1 }));
    } finally {
      clearTimeout(expiry);
      running.delete(controller);
    }
  });
  // Batched comment e-mails: a polling loop over the outbox table (no queue needed).
  startCommentMail();
  // Visit reminders: every 15 minutes one worker (pg-boss picks it) mails the next day's visits.
  await boss.createQueue(REMINDER_QUEUE, { name: REMINDER_QUEUE });
  await boss.schedule(REMINDER_QUEUE, "*/15 * * * *");
  await boss.work(REMINDER_QUEUE, async () => {
    const { sent } = await sendAllDueReminders();
    if (sent > 0) console.log(JSON.stringify({ event: "booking_reminders", sent }));
  });
  // Abandoned uploads: hourly, one worker deletes clips whose file never arrived within a day.
  await boss.createQueue(UPLOAD_SWEEP_QUEUE, { name: UPLOAD_SWEEP_QUEUE });
  await boss.schedule(UPLOAD_SWEEP_QUEUE, "17 * * * *");
  await boss.work(UPLOAD_SWEEP_QUEUE, async () => {
    const swept = await sweepAbandonedUploads();
    if (swept.clips > 0) console.log(JSON.stringify({ event: "upload_sweep", ...swept }));
  });
}

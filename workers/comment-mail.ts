// Comment e-mails, batched: at most one e-mail per person per clip per window
// (COMMENT_MAIL_WINDOW_S). New comments wait in comment_mail_outbox; every poll the worker
// sends one e-mail per (person, clip) whose window has passed, with every comment waiting.
// Safe with several workers: each (person, clip) is handled under a row lock, skipped if taken.
import { and, asc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import { env } from "@/lib/config/env";
import { formatCaptureTime } from "@/lib/playback/timing";
import { sendMail } from "@/lib/server/mail";

const { commentMailOutbox: outbox, commentMailSent: sent, comments, users, clips, builds, golfers, fittings, coachGolfers } = schema;

type Due = { recipientUserId: string; clipId: string };

async function dueBatches(windowS: number): Promise<Due[]> {
  const rows = await db.execute<{ recipient_user_id: string; clip_id: string }>(sql`
    select distinct o.recipient_user_id, o.clip_id
    from ${outbox} o
    left join ${sent} s on s.recipient_user_id = o.recipient_user_id and s.clip_id = o.clip_id
    where o.sent_at is null and (s.last_sent_at is null or s.last_sent_at <= now() - make_interval(secs => ${windowS}))
    limit 100`);
  return rows.rows.map((r) => ({ recipientUserId: r.recipient_user_id, clipId: r.clip_id }));
}

function clipLink(role: string, clipId: string): string {
  const base = env().NEXTAUTH_URL;
  if (role === "golfer") return `${base}/me/clips/${clipId}`;
  if (role === "coach") return `${base}/studio/coach/clips/${clipId}`;
  return `${base}/studio/clips/${clipId}`;
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/** Access may have changed since the comment was written (a coach's share withdrawn): check again. */
async function mayStillSee(tx: Tx, userId: string, person: { role: string; studioId: string }, clip: { studioId: string; golferId: string; golferUserId: string | null }) {
  if (person.studioId !== clip.studioId) return false;
  if (person.role === "admin" || person.role === "fitter") return true;
  if (person.role === "golfer") return clip.golferUserId === userId;
  const [share] = await tx.select({ g: coachGolfers.golferId }).from(coachGolfers).where(and(eq(coachGolfers.coachUserId, userId), eq(coachGolfers.golferId, clip.golferId)));
  return Boolean(share);
}

/** Sends one batch under a lock; returns whether an e-mail went out. */
async function sendBatch({ recipientUserId, clipId }: Due, windowS: number): Promise<boolean> {
  return db.transaction(async (tx) => {
    await tx.insert(sent).values({ recipientUserId, clipId, lastSentAt: new Date(0) }).onConflictDoNothing();
    const locked = await tx.execute<{ last_sent_at: Date }>(sql`
      select last_sent_at from ${sent} where recipient_user_id = ${recipientUserId} and clip_id = ${clipId}
      and last_sent_at <= now() - make_interval(secs => ${windowS}) for update skip locked`);
    if (locked.rows.length === 0) return false; // another worker has it, or the window has not passed
    const pending = await tx
      .select({ commentId: outbox.commentId, frame: comments.frame, body: comments.body, parentId: comments.parentId, author: users.name, createdAt: comments.createdAt })
      .from(outbox)
      .innerJoin(comments, eq(comments.id, outbox.commentId))
      .leftJoin(users, eq(users.id, comments.authorUserId))
      .where(and(eq(outbox.recipientUserId, recipientUserId), eq(outbox.clipId, clipId), isNull(outbox.sentAt)))
      .orderBy(asc(comments.createdAt));
    if (pending.length === 0) return false;
    const [person] = await tx.select({ email: users.email, name: users.name, role: users.role, disabled: users.disabled, studioId: users.studioId }).from(users).where(eq(users.id, recipientUserId));
    const [clip] = await tx
      .select({ view: clips.view, captureFps: clips.captureFps, build: builds.label, golfer: golfers.name, golferId: golfers.id, golferUserId: golfers.userId, studioId: clips.studioId })
      .from(clips).innerJoin(builds, eq(builds.id, clips.buildId)).innerJoin(fittings, eq(fittings.id, clips.fittingId)).innerJoin(golfers, eq(golfers.id, fittings.golferId))
      .where(eq(clips.id, clipId));
    if (person && clip && !person.disabled && (await mayStillSee(tx, recipientUserId, person, clip))) {
      const lines = pending.map((c) => `${c.author ?? "Someone"} ${c.parentId ? "replied" : "commented"} at ${formatCaptureTime(c.frame, clip.captureFps)} (frame ${c.frame}):\n${c.body}`);
      const n = pending.length;
      // Plain text only: comment bodies are never put into HTML.
      await sendMail({
        to: person.email,
        subject: `${n} new comment${n === 1 ? "" : "s"} on ${clip.golfer}'s ${clip.view} clip (${clip.build})`,
        text: `Hello ${person.name},\n\n${lines.join("\n\n")}\n\nOpen the clip: ${clipLink(person.role, clipId)}\n`,
      });
    }
    // Sent, or dropped for someone who may no longer see the clip: either way not pending.
    const now = new Date();
    await tx.update(outbox).set({ sentAt: now }).where(and(eq(outbox.recipientUserId, recipientUserId), inArray(outbox.commentId, pending.map((p) => p.commentId))));
    await tx.update(sent).set({ lastSentAt: now }).where(and(eq(sent.recipientUserId, recipientUserId), eq(sent.clipId, clipId)));
    return true;
  });
}

/** Starts the polling loop; returns a function that stops it after the current round. */
export function startCommentMail(): () => Promise<void> {
  const { COMMENT_MAIL_WINDOW_S: windowS, COMMENT_MAIL_POLL_S: pollS } = env();
  let stopped = false;
  let busy = false;
  let round: Promise<void> = Promise.resolve();
  const tick = async () => {
    try {
      for (const due of await dueBatches(windowS)) {
        if (stopped) break;
        if (await sendBatch(due, windowS)) console.log(JSON.stringify({ event: "comment_mail", clipId: due.clipId }));
      }
    } catch (err) {
      // A failed send leaves the rows pending: the next round tries again.
      console.error("comment mail:", err instanceof Error ? err.message : err);
    }
  };
  const timer = setInterval(() => {
    if (busy) return; // a slow round is not stacked behind
    busy = true;
    round = tick().finally(() => (busy = false));
  }, pollS * 1000);
  return async () => {
    stopped = true;
    clearInterval(timer);
    await round;
  };
}

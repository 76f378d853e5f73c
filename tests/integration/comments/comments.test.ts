// Timed comments: who may write, plain text and length, threads, resolve, unread counts, and
// the batched e-mails read back from the mail catcher.
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db, schema } from "@/db";
import { call, signIn, type Auth } from "../../support/http";
import { makeWorld, PASSWORD, type World } from "../../support/world";
import { mailTo, waitForMail } from "../invitations/mail";
import { insertClip } from "./clip-row";

let w: World;
const auth: Record<"admin" | "fitter" | "coach" | "golfer" | "sibling" | "other", Auth> = { admin: null, fitter: null, coach: null, golfer: null, sibling: null, other: null };
let clipId: string;
const post = (who: Auth, body: unknown, id = clipId) => call(who, "POST", `/api/clips/${id}/comments`, body);
const WINDOW_S = Number(process.env.COMMENT_MAIL_WINDOW_S ?? 600);

beforeAll(async () => {
  w = await makeWorld();
  const emails = { admin: w.admin.email, fitter: w.fitter.email, coach: w.coach.email, golfer: w.own.account.email, sibling: w.sibling.account.email, other: w.otherAdmin.email };
  for (const [who, email] of Object.entries(emails)) auth[who as keyof typeof auth] = { cookie: (await signIn(email, PASSWORD)).cookie! };
  await db.update(schema.fittings).set({ fitterUserId: w.fitter.id }).where(eq(schema.fittings.id, w.own.fitting.id));
  clipId = (await insertClip(w, w.own)).id;
});

describe("who may comment", () => {
  it("staff, the shared coach and the golfer itself; another golfer or studio does not see the clip", async () => {
    for (const who of ["admin", "fitter", "coach", "golfer"] as const) expect((await post(auth[who], { frame: 10, body: `from ${who}` })).status, who).toBe(201);
    expect((await post(auth.sibling, { frame: 10, body: "peek" })).status).toBe(404);
    expect((await post(auth.other, { frame: 10, body: "peek" })).status).toBe(404);
  });
});

describe("plain text and length", () => {
  it("stores markup as given and returns it as text", async () => {
    const body = `<img src=x onerror="alert(1)"> & <b>bold</b>\n\tindented`;
    const res = await post(auth.coach, { frame: 20, body });
    expect(res.status).toBe(201);
    expect(res.body.comment.body).toBe(body);
    const list = await call(auth.golfer, "GET", `/api/clips/${clipId}/comments`);
    expect(list.body.threads.find((t: { id: string }) => t.id === res.body.comment.id).body).toBe(body);
  });
  it("refuses control characters other than newline and tab", async () => {
    expect((await post(auth.coach, { frame: 20, body: "bell\u0007" })).status).toBe(400);
    expect((await post(auth.coach, { frame: 20, body: "esc\u001b[31m" })).status).toBe(400);
  });
  it("takes 1 to 4000 characters", async () => {
    expect((await post(auth.coach, { frame: 1, body: "" })).status).toBe(400);
    expect((await post(auth.coach, { frame: 1, body: "   \n " })).status).toBe(400);
    expect((await post(auth.coach, { frame: 1, body: "x".repeat(4001) })).status).toBe(400);
    expect((await post(auth.coach, { frame: 1, body: "x".repeat(4000) })).status).toBe(201);
  });
  it("needs a frame inside the clip", async () => {
    expect((await post(auth.coach, { body: "no frame" })).status).toBe(400);
    expect((await post(auth.coach, { frame: 480, body: "past the end" })).status).toBe(422);
    expect((await post(auth.coach, { frame: -1, body: "before" })).status).toBe(400);
  });
});

describe("threads and resolving", () => {
  it("a reply sits under its thread at the thread's frame, shown as capture time too", async () => {
    const root = await post(auth.coach, { frame: 299, body: "Face closes here" });
    expect(root.body.comment.timeS).toBeCloseTo(299 / 240, 9);
    const reply = await post(auth.golfer, { parentId: root.body.comment.id, body: "I feel it" });
    const replyToReply = await post(auth.fitter, { parentId: reply.body.comment.id, body: "Try the heavier grip" });
    expect(reply.body.comment).toMatchObject({ parentId: root.body.comment.id, frame: 299 });
    expect(replyToReply.body.comment.parentId).toBe(root.body.comment.id);
    const list = await call(auth.coach, "GET", `/api/clips/${clipId}/comments`);
    const thread = list.body.threads.find((t: { id: string }) => t.id === root.body.comment.id);
    expect(thread.replies.map((r: { body: string }) => r.body)).toEqual(["I feel it", "Try the heavier grip"]);
    const frames = list.body.threads.map((t: { frame: number }) => t.frame);
    expect(frames).toEqual([...frames].sort((a, b) => a - b));
  });
  it("staff or the thread's author resolve; the golfer may not resolve the coach's thread", async () => {
    const root = await post(auth.coach, { frame: 100, body: "Check the aim" });
    const id = root.body.comment.id;
    expect((await call(auth.golfer, "PATCH", `/api/comments/${id}`, { resolved: true })).status).toBe(403);
    expect((await call(auth.sibling, "PATCH", `/api/comments/${id}`, { resolved: true })).status).toBe(404);
    const done = await call(auth.coach, "PATCH", `/api/comments/${id}`, { resolved: true });
    expect(done.status).toBe(200);
    expect(done.body.resolvedAt).toBeTruthy();
    expect((await call(auth.fitter, "PATCH", `/api/comments/${id}`, { resolved: false })).body.resolvedAt).toBeNull();
    const reply = await post(auth.golfer, { parentId: id, body: "ok" });
    expect((await call(auth.golfer, "PATCH", `/api/comments/${reply.body.comment.id}`, { resolved: true })).status).toBe(422);
  });
});

describe("unread counts", () => {
  it("counts others' comments since the last read, per person; writing counts as reading", async () => {
    const fresh = await insertClip(w, w.own);
    const unreadOf = async (who: Auth) => (await call(who, "GET", "/api/comments/unread")).body.clips.find((c: { clipId: string }) => c.clipId === fresh.id)?.unread ?? 0;
    await post(auth.golfer, { frame: 7, body: "mine" }, fresh.id);
    await post(auth.coach, { frame: 5, body: "one" }, fresh.id);
    await post(auth.coach, { frame: 6, body: "two" }, fresh.id);
    expect(await unreadOf(auth.golfer)).toBe(2);
    expect(await unreadOf(auth.coach)).toBe(0);
    expect(await unreadOf(auth.fitter)).toBe(3);
    await call(auth.golfer, "POST", `/api/clips/${fresh.id}/comments/read`);
    expect(await unreadOf(auth.golfer)).toBe(0);
    await post(auth.golfer, { frame: 8, body: "thanks" }, fresh.id);
    expect(await unreadOf(auth.coach)).toBe(1);
    expect(await unreadOf(auth.sibling)).toBe(0);
  });
});

describe("e-mail to the people involved, batched per person per clip", () => {
  it("one e-mail now, the next comments together once the window has passed, never to the author", async () => {
    const clip = await insertClip(w, w.own);
    const golferEmail = w.own.account.email;
    // Only this clip's e-mails count (earlier tests' clips send theirs too).
    const ofClip = <M extends { text: string }>(list: M[]) => list.filter((m) => m.text.includes(clip.id));
    await post(auth.coach, { frame: 299, body: "First note <at impact>" }, clip.id);
    const first = ofClip(await waitForMail(golferEmail, 1, 20_000, clip.id));
    expect(first).toHaveLength(1);
    expect(first[0]!.text).toContain("First note <at impact>");
    expect(first[0]!.text).toContain("1.246 s (frame 299)");
    expect(first[0]!.text).toContain(`/me/clips/${clip.id}`);
    expect(first[0]!.html).toBe("");
    expect(await waitForMail(w.fitter.email, 1, 20_000, clip.id)).toHaveLength(1);

    await post(auth.coach, { frame: 300, body: "Second note" }, clip.id);
    await post(auth.coach, { frame: 301, body: "Third note" }, clip.id);
    if (WINDOW_S >= 60) {
      // Two worker rounds pass; the window (10 minutes by default) holds the e-mail back.
      await new Promise((r) => setTimeout(r, 5000));
      expect(ofClip(await mailTo(golferEmail))).toHaveLength(1);
    }
    // Move the last e-mail's time back past the window instead of waiting ten minutes.
    await db.update(schema.commentMailSent).set({ lastSentAt: new Date(Date.now() - (WINDOW_S + 5) * 1000) })
      .where(and(eq(schema.commentMailSent.clipId, clip.id), eq(schema.commentMailSent.recipientUserId, w.own.account.id)));
    const batch = (await waitForMail(golferEmail, 2, 20_000, clip.id)).slice(1);
    expect(batch).toHaveLength(1);
    expect(batch[0]!.subject).toMatch(/^2 new comments/);
    expect(batch[0]!.text).toContain("Second note");
    expect(batch[0]!.text).toContain("Third note");
    expect(ofClip(await mailTo(w.coach.email))).toHaveLength(0);
  });

  it("tells the thread's people and not a coach whose access was withdrawn", async () => {
    const clip = await insertClip(w, w.own);
    const fitter2 = { cookie: (await signIn(w.fitter2.email, PASSWORD)).cookie! };
    await db.delete(schema.coachGolfers).where(and(eq(schema.coachGolfers.coachUserId, w.coach.id), eq(schema.coachGolfers.golferId, w.own.golfer.id)));
    try {
      const root = await post(fitter2, { frame: 50, body: "Question for the golfer" }, clip.id);
      const reply = await post(auth.golfer, { parentId: root.body.comment.id, body: "Answer" }, clip.id);
      expect(reply.status).toBe(201);
      const got = await waitForMail(w.fitter2.email, 1, 20_000, clip.id);
      expect(got[0]!.text).toContain("Answer");
      await new Promise((r) => setTimeout(r, 4000));
      expect((await mailTo(w.coach.email)).filter((m) => m.text.includes(clip.id))).toHaveLength(0);
    } finally {
      await db.insert(schema.coachGolfers).values({ coachUserId: w.coach.id, golferId: w.own.golfer.id }).onConflictDoNothing();
    }
  });

  it("drops a waiting e-mail when the coach's access is withdrawn before it is sent", async () => {
    const clip = await insertClip(w, w.own);
    const forCoach = async () => (await mailTo(w.coach.email)).filter((m) => m.text.includes(clip.id));
    await post(auth.golfer, { frame: 60, body: "Coach, look here" }, clip.id);
    await expect.poll(forCoach, { timeout: 20_000 }).toHaveLength(1);
    await post(auth.golfer, { frame: 61, body: "Private follow-up" }, clip.id);
    await db.delete(schema.coachGolfers).where(and(eq(schema.coachGolfers.coachUserId, w.coach.id), eq(schema.coachGolfers.golferId, w.own.golfer.id)));
    try {
      await db.update(schema.commentMailSent).set({ lastSentAt: new Date(Date.now() - (WINDOW_S + 5) * 1000) })
        .where(and(eq(schema.commentMailSent.clipId, clip.id), eq(schema.commentMailSent.recipientUserId, w.coach.id)));
      // The worker takes the waiting row and drops it instead of sending.
      await expect.poll(async () => (await db.select().from(schema.commentMailOutbox)
        .where(and(eq(schema.commentMailOutbox.clipId, clip.id), eq(schema.commentMailOutbox.recipientUserId, w.coach.id)))).map((r) => r.sentAt !== null), { timeout: 20_000 }).toEqual([true, true]);
      expect(await forCoach()).toHaveLength(1);
    } finally {
      await db.insert(schema.coachGolfers).values({ coachUserId: w.coach.id, golferId: w.own.golfer.id }).onConflictDoNothing();
    }
  });
});

import "server-only";
// Timed comments on a clip: threads (a root at a frame, replies under it), resolve, reads, and
// the e-mail outbox rows the worker batches (workers/comment-mail.ts).
import { and, asc, eq, inArray } from "drizzle-orm";
import { db, schema } from "@/db";
import { mayResolveComment } from "@/lib/access/policy";
import type { CommentCreate } from "@/lib/schemas/comments";
import type { SignedInActor } from "../access";
import { ApiError, forbidden, notFound } from "../http/errors";
import { loadClip, type LoadedClip } from "./clip-access";

const { comments, users, commentReads, commentMailOutbox, coachGolfers, golfers, fittings } = schema;

type Row = { id: string; parentId: string | null; frame: number; body: string; resolvedAt: Date | null; createdAt: Date; authorUserId: string | null; authorName: string | null; authorRole: string | null };

function present(r: Row, captureFps: number) {
  return {
    id: r.id, parentId: r.parentId, frame: r.frame, timeS: r.frame / captureFps, body: r.body, resolvedAt: r.resolvedAt, createdAt: r.createdAt,
    author: r.authorUserId ? { id: r.authorUserId, name: r.authorName ?? "", role: r.authorRole ?? "" } : null,
  };
}
export type PresentedComment = ReturnType<typeof present> & { replies: ReturnType<typeof present>[] };

async function rowsOf(clipId: string, studioId: string): Promise<Row[]> {
  return db
    .select({
      id: comments.id, parentId: comments.parentId, frame: comments.frame, body: comments.body, resolvedAt: comments.resolvedAt, createdAt: comments.createdAt,
      authorUserId: comments.authorUserId, authorName: users.name, authorRole: users.role,
    })
    .from(comments)
    .leftJoin(users, eq(users.id, comments.authorUserId))
    .where(and(eq(comments.clipId, clipId), eq(comments.studioId, studioId)))
    .orderBy(asc(comments.frame), asc(comments.createdAt));
}

/** Threads in frame order; replies under their root in time order. */
export function threadsOf(rows: Row[], captureFps: number): PresentedComment[] {
  const roots = rows.filter((r) => r.parentId === null).map((r) => ({ ...present(r, captureFps), replies: [] as ReturnType<typeof present>[] }));
  const byId = new Map(roots.map((r) => [r.id, r]));
  const replies = rows.filter((r) => r.parentId !== null).sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  for (const r of replies) byId.get(r.parentId!)?.replies.push(present(r, captureFps));
  return roots;
}

// GET /api/clips/{id}/comments
export async function listComments(actor: SignedInActor, clipId: string) {
  const loaded = await loadClip(actor, clipId);
  const [read] = await db.select({ readAt: commentReads.readAt }).from(commentReads).where(and(eq(commentReads.userId, actor.userId), eq(commentReads.clipId, clipId)));
  const threads = threadsOf(await rowsOf(clipId, loaded.clip.studioId), loaded.clip.captureFps);
  return { captureFps: loaded.clip.captureFps, frameCount: loaded.clip.frameCount, readAt: read?.readAt ?? null, threads };
}

// POST /api/clips/{id}/comments/read: everything on the clip up to now counts as read by the actor.
export async function markCommentsRead(actor: SignedInActor, clipId: string) {
  await loadClip(actor, clipId);
  const now = new Date();
  await db.insert(commentReads).values({ userId: actor.userId, clipId, readAt: now }).onConflictDoUpdate({ target: [commentReads.userId, commentReads.clipId], set: { readAt: now } });
  return { readAt: now };
}

/** People to tell about a new comment: the golfer, the fitting's fitter, the golfer's coaches, the thread's people — never the author, only those who may still see the clip. */
async function recipientsOf(loaded: LoadedClip, rootId: string | null, authorId: string): Promise<string[]> {
  const { clip, golferId } = loaded;
  const [golfer] = await db.select({ userId: golfers.userId }).from(golfers).where(eq(golfers.id, golferId));
  const [fitting] = await db.select({ fitter: fittings.fitterUserId }).from(fittings).where(eq(fittings.id, clip.fittingId));
  const coachIds = (await db.select({ id: coachGolfers.coachUserId }).from(coachGolfers).where(eq(coachGolfers.golferId, golferId))).map((c) => c.id);
  const thread = rootId
    ? (await db.select({ id: comments.authorUserId }).from(comments).where(and(eq(comments.clipId, clip.id), eq(comments.id, rootId)))).concat(
        await db.select({ id: comments.authorUserId }).from(comments).where(eq(comments.parentId, rootId)),
      ).map((r) => r.id)
    : [];
  const candidates = [...new Set([golfer?.userId, fitting?.fitter, ...coachIds, ...thread].filter((id): id is string => Boolean(id) && id !== authorId))];
  if (candidates.length === 0) return [];
  const people = await db.select({ id: users.id, role: users.role, studioId: users.studioId, disabled: users.disabled }).from(users).where(inArray(users.id, candidates));
  const coaches = new Set(coachIds);
  return people
    .filter((p) => !p.disabled && p.studioId === clip.studioId)
    .filter((p) => p.role === "admin" || p.role === "fitter" || (p.role === "golfer" && p.id === golfer?.userId) || (p.role === "coach" && coaches.has(p.id)))
    .map((p) => p.id);
}

// POST /api/clips/{id}/comments: a new thread at a frame, or a reply (at its thread's frame).
export async function createComment(actor: SignedInActor, clipId: string, input: CommentCreate) {
  const loaded = await loadClip(actor, clipId, "golfer.comment");
  const { clip } = loaded;
  let frame = input.frame;
  let rootId: string | null = null;
  if (input.parentId) {
    const [parent] = await db.select().from(comments).where(and(eq(comments.id, input.parentId), eq(comments.clipId, clipId)));
    if (!parent) throw notFound("No such comment on this clip");
    rootId = parent.parentId ?? parent.id; // a reply to a reply joins the same thread
    const [root] = rootId === parent.id ? [parent] : await db.select().from(comments).where(eq(comments.id, rootId));
    frame = root!.frame;
  }
  if (frame === undefined) throw new ApiError("validation_failed", "frame: A comment needs a frame");
  if (clip.frameCount !== null && frame >= clip.frameCount) throw new ApiError("unprocessable", `frame must be below the clip's ${clip.frameCount} frames`);
  const recipients = await recipientsOf(loaded, rootId, actor.userId);
  const row = await db.transaction(async (tx) => {
    const [created] = await tx.insert(comments).values({ studioId: clip.studioId, clipId, parentId: rootId, authorUserId: actor.userId, frame, body: input.body }).returning();
    if (recipients.length > 0) {
      await tx.insert(commentMailOutbox).values(recipients.map((recipientUserId) => ({ recipientUserId, commentId: created!.id, clipId, studioId: clip.studioId })));
    }
    const now = new Date();
    await tx.insert(commentReads).values({ userId: actor.userId, clipId, readAt: now }).onConflictDoUpdate({ target: [commentReads.userId, commentReads.clipId], set: { readAt: now } });
    return created!;
  });
  return { comment: present({ ...row, authorName: actor.name, authorRole: actor.role }, clip.captureFps), notified: recipients.length };
}

// PATCH /api/comments/{id}: resolve or reopen a thread (staff, or the thread's author).
export async function resolveComment(actor: SignedInActor, commentId: string, resolved: boolean) {
  const [row] = await db.select().from(comments).where(eq(comments.id, commentId));
  if (!row) throw notFound("No such comment");
  const loaded = await loadClip(actor, row.clipId, "golfer.comment").catch((err: unknown) => {
    throw err instanceof ApiError && err.code === "not_found" ? notFound("No such comment") : err;
  });
  if (row.studioId !== loaded.clip.studioId) throw notFound("No such comment");
  if (row.parentId !== null) throw new ApiError("unprocessable", "Resolve the thread's first comment, not a reply");
  if (!mayResolveComment(actor, row.authorUserId)) throw forbidden("Only the studio's staff or the comment's author may resolve it");
  // Resolving twice keeps the first time; reopening clears it.
  const [updated] = await db
    .update(comments)
    .set({ resolvedAt: resolved ? (row.resolvedAt ?? new Date()) : null, updatedAt: new Date() })
    .where(and(eq(comments.id, commentId), eq(comments.studioId, loaded.clip.studioId)))
    .returning({ id: comments.id, resolvedAt: comments.resolvedAt });
  return { id: commentId, resolvedAt: updated!.resolvedAt };
}

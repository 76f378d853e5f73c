import "server-only";
// Unread comment counts per clip for the signed-in person: comments by others, newer than the
// person's last read of that clip, on clips the person may see (golfer: its own; coach: the
// golfers shared with it; staff: the studio's).
import { and, count, desc, eq, gt, inArray, isNull, max, ne, or, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import type { SignedInActor } from "../access";

const { comments, commentReads, clips, fittings, golfers, builds, coachGolfers } = schema;

export type UnreadClip = { clipId: string; unread: number; latestAt: Date; golferId: string; golferName: string; view: string; buildLabel: string };

// GET /api/comments/unread
export async function unreadSummary(actor: SignedInActor, limit = 20): Promise<{ total: number; clips: UnreadClip[] }> {
  const visible =
    actor.role === "golfer"
      ? eq(fittings.golferId, actor.golferId ?? sql`null`)
      : actor.role === "coach"
        ? inArray(fittings.golferId, db.select({ id: coachGolfers.golferId }).from(coachGolfers).where(eq(coachGolfers.coachUserId, actor.userId)))
        : sql`true`;
  const rows = await db
    .select({
      clipId: comments.clipId, unread: count(), latestAt: max(comments.createdAt),
      golferId: golfers.id, golferName: golfers.name, view: clips.view, buildLabel: builds.label,
    })
    .from(comments)
    .innerJoin(clips, eq(clips.id, comments.clipId))
    .innerJoin(fittings, eq(fittings.id, clips.fittingId))
    .innerJoin(golfers, eq(golfers.id, fittings.golferId))
    .innerJoin(builds, eq(builds.id, clips.buildId))
    .leftJoin(commentReads, and(eq(commentReads.clipId, comments.clipId), eq(commentReads.userId, actor.userId)))
    .where(and(
      eq(comments.studioId, actor.studioId),
      visible,
      or(isNull(comments.authorUserId), ne(comments.authorUserId, actor.userId)),
      or(isNull(commentReads.readAt), gt(comments.createdAt, commentReads.readAt)),
    ))
    .groupBy(comments.clipId, golfers.id, golfers.name, clips.view, builds.label)
    .orderBy(desc(max(comments.createdAt)));
  const list = rows.map((r) => ({ ...r, latestAt: r.latestAt ?? new Date(0) }));
  return { total: list.reduce((n, r) => n + r.unread, 0), clips: list.slice(0, limit) };
}

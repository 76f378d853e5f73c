import "server-only";
import { and, desc, eq, notExists } from "drizzle-orm";
import { db, schema } from "@/db";
import { assertStudio, type SignedInActor } from "../access";

const { studios, clips, marks, golfers, fittings } = schema;

export async function getOwnStudio(actor: SignedInActor) {
  const [row] = await db.select({ id: studios.id, name: studios.name, slug: studios.slug, timeZone: studios.timeZone }).from(studios).where(eq(studios.id, actor.studioId));
  return row!;
}

/** Ready clips of the studio that nobody has marked yet, newest first. */
export async function listClipsNeedingMarks(actor: SignedInActor, limit = 8) {
  assertStudio(actor, "golfers.create");
  return db
    .select({ id: clips.id, view: clips.view, updatedAt: clips.updatedAt, golferName: golfers.name, fittingId: clips.fittingId })
    .from(clips)
    .innerJoin(fittings, eq(fittings.id, clips.fittingId))
    .innerJoin(golfers, eq(golfers.id, fittings.golferId))
    .where(and(eq(clips.studioId, actor.studioId), eq(clips.state, "ready"), notExists(db.select().from(marks).where(eq(marks.clipId, clips.id)))))
    .orderBy(desc(clips.updatedAt))
    .limit(limit);
}

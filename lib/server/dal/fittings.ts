import "server-only";
import { and, asc, count, desc, eq, gte, lt } from "drizzle-orm";
import type { z } from "zod";
import { db, schema } from "@/db";
import { withChecks } from "@/lib/compare/build-checks";
import type { fittingCreateSchema, fittingUpdateSchema } from "@/lib/schemas/fitting";
import { assertGolfer, assertStudio, type SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { pgErrorCode } from "../pg-errors";
import { getGolfer } from "./golfers";

const { fittings, builds, golfers, clips } = schema;

async function loadFitting(actor: SignedInActor, id: string) {
  const [row] = await db.select().from(fittings).where(eq(fittings.id, id));
  if (!row) throw notFound("No such fitting");
  await assertGolfer(actor, "golfer.read", { studioId: row.studioId, golferId: row.golferId }, "No such fitting");
  return row;
}

export async function getFitting(actor: SignedInActor, id: string) {
  const fitting = await loadFitting(actor, id);
  const buildRows = await db.select().from(builds).where(eq(builds.fittingId, id)).orderBy(asc(builds.position));
  return { ...fitting, builds: buildRows.map(withChecks) };
}

/** The fitting page: the fitting, its golfer, builds with checks and how many clips each has. */
export async function getFittingPage(actor: SignedInActor, id: string) {
  const fitting = await getFitting(actor, id);
  const [golfer] = await db.select().from(golfers).where(eq(golfers.id, fitting.golferId));
  const counts = await db.select({ buildId: clips.buildId, n: count() }).from(clips).where(eq(clips.fittingId, id)).groupBy(clips.buildId);
  const clipCount = new Map(counts.map((c) => [c.buildId, c.n]));
  return { fitting, golfer: golfer!, builds: fitting.builds.map((b) => ({ ...b, clipCount: clipCount.get(b.id) ?? 0 })) };
}

/** For writes below a fitting (builds, clips): the fitting, once the actor may change it. */
export async function fittingForWrite(actor: SignedInActor, id: string) {
  const fitting = await loadFitting(actor, id);
  await assertGolfer(actor, "golfer.write", { studioId: fitting.studioId, golferId: fitting.golferId });
  return fitting;
}

/**
 * Marks the build that new putts from the capture computer go to (null: none). A fitting has at
 * most one; the watch folder asks for it when a file appears.
 */
export async function setRecordingBuild(actor: SignedInActor, id: string, buildId: string | null) {
  const fitting = await fittingForWrite(actor, id);
  if (buildId) {
    const [build] = await db.select({ id: builds.id }).from(builds).where(and(eq(builds.id, buildId), eq(builds.fittingId, fitting.id)));
    if (!build) throw notFound("No such build in this fitting");
  }
  const [row] = await db
    .update(fittings)
    .set({ recordingBuildId: buildId, updatedAt: new Date() })
    .where(and(eq(fittings.id, id), eq(fittings.studioId, fitting.studioId)))
    .returning({ id: fittings.id, recordingBuildId: fittings.recordingBuildId })
    .catch((err: unknown) => {
      // The build was deleted between the check and the write.
      if (pgErrorCode(err) === "23503") throw notFound("No such build in this fitting");
      throw err;
    });
  return { fittingId: row!.id, recordingBuildId: row!.recordingBuildId };
}

export async function listFittingsOfGolfer(actor: SignedInActor, golferId: string) {
  await getGolfer(actor, golferId);
  return db.select().from(fittings).where(eq(fittings.golferId, golferId)).orderBy(desc(fittings.scheduledAt));
}

export async function createFitting(actor: SignedInActor, input: z.infer<typeof fittingCreateSchema>) {
  const golfer = await getGolfer(actor, input.golferId);
  await assertGolfer(actor, "golfer.write", { studioId: golfer.studioId, golferId: golfer.id });
  const [row] = await db
    .insert(fittings)
    .values({ studioId: golfer.studioId, golferId: golfer.id, fitterUserId: actor.userId, scheduledAt: input.scheduledAt, notes: input.notes })
    .returning();
  return row!;
}

export async function updateFitting(actor: SignedInActor, id: string, input: z.infer<typeof fittingUpdateSchema>) {
  const fitting = await fittingForWrite(actor, id);
  const [row] = await db
    .update(fittings)
    .set({ ...input, updatedAt: new Date() })
    .where(and(eq(fittings.id, id), eq(fittings.studioId, fitting.studioId)))
    .returning();
  return row!;
}

/** The studio home's list: the day's fittings with each golfer's name. */
export async function listStudioFittingsBetween(actor: SignedInActor, from: Date, to: Date) {
  assertStudio(actor, "golfers.create");
  return db
    .select({ fitting: fittings, golferName: golfers.name })
    .from(fittings)
    .innerJoin(golfers, eq(golfers.id, fittings.golferId))
    .where(and(eq(fittings.studioId, actor.studioId), gte(fittings.scheduledAt, from), lt(fittings.scheduledAt, to)))
    .orderBy(asc(fittings.scheduledAt));
}

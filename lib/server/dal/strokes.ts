import "server-only";
import { and, asc, eq, max } from "drizzle-orm";
import { db, schema } from "@/db";
import type { SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { fittingForWrite, getFitting } from "./fittings";

const { strokes, builds, clips } = schema;

async function buildOf(buildId: string) {
  const [build] = await db.select().from(builds).where(eq(builds.id, buildId));
  if (!build) throw notFound("No such build");
  return build;
}

/** A new stroke of a build: the clips of its views are uploaded into it one by one. */
export async function createStroke(actor: SignedInActor, buildId: string) {
  const build = await buildOf(buildId);
  await fittingForWrite(actor, build.fittingId);
  return db.transaction(async (tx) => {
    const [last] = await tx.select({ n: max(strokes.position) }).from(strokes).where(eq(strokes.buildId, buildId));
    const [row] = await tx.insert(strokes).values({ studioId: build.studioId, buildId, position: (last?.n ?? 0) + 1 }).returning();
    return row!;
  });
}

export async function listStrokesOfBuild(actor: SignedInActor, buildId: string) {
  const build = await buildOf(buildId);
  await getFitting(actor, build.fittingId);
  return db.select().from(strokes).where(eq(strokes.buildId, buildId)).orderBy(asc(strokes.position));
}

/** A stroke with its clips (one per view), each with the impact frame it is lined up at. */
export async function getStroke(actor: SignedInActor, id: string) {
  const [stroke] = await db.select().from(strokes).where(eq(strokes.id, id));
  if (!stroke) throw notFound("No such stroke");
  const build = await buildOf(stroke.buildId);
  await getFitting(actor, build.fittingId);
  const rows = await db.select().from(clips).where(and(eq(clips.strokeId, id))).orderBy(asc(clips.view));
  return {
    ...stroke,
    buildLabel: build.label,
    fittingId: build.fittingId,
    clips: rows.map((c) => ({
      id: c.id, view: c.view, state: c.state, width: c.width, height: c.height, frameCount: c.frameCount, captureFps: c.captureFps,
      // The confirmed impact when there is one, else the suggestion; null until processed.
      impactFrame: c.impactFrame ?? c.suggestedImpactFrame,
      impactConfirmed: c.impactFrame !== null,
    })),
  };
}

/** For uploads: the stroke must belong to the build the clip goes into. */
export async function assertStrokeOfBuild(strokeId: string, buildId: string) {
  const [row] = await db.select({ id: strokes.id }).from(strokes).where(and(eq(strokes.id, strokeId), eq(strokes.buildId, buildId)));
  if (!row) throw notFound("No such stroke in this build");
}

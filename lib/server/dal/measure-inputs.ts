import "server-only";
import { and, eq, inArray, sql, type SQL } from "drizzle-orm";
import { db, schema } from "@/db";
import { ApiError } from "../http/errors";
import { refreshMeasurements } from "./measurements";

const { clips, fittings } = schema;

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/**
 * Which clips an input of the measurements belongs to. A changed handedness turns every view's
 * reference directions; a static loft enters dynamic loft (face-on); the studio's friction enters
 * skid (face-on). Capture rate and mirroring are clip columns (clips.ts bumps those itself).
 */
export const clipsMeasuredWith = {
  golfer: (golferId: string): SQL => inArray(clips.fittingId, db.select({ id: fittings.id }).from(fittings).where(eq(fittings.golferId, golferId))),
  build: (buildId: string): SQL => and(eq(clips.buildId, buildId), eq(clips.view, "face-on"))!,
  studioFriction: (studioId: string): SQL => and(eq(clips.studioId, studioId), eq(clips.view, "face-on"))!,
};

/**
 * Inside the transaction that changes an input: bumps the measure revision of every clip measured
 * with it, so no reader serves a row computed from the old input (readers compare revisions).
 */
export async function bumpMeasureRevisions(tx: Tx, where: SQL): Promise<string[]> {
  const rows = await tx.update(clips).set({ measureRevision: sql`${clips.measureRevision} + 1` }).where(where).returning({ id: clips.id });
  return rows.map((r) => r.id);
}

/**
 * Writes a change to an input of the measurements and, in the same transaction, bumps the revision
 * of every clip measured with it (`affected`); once committed, recomputes them.
 */
export async function changeMeasureInput<T>(write: (tx: Tx) => Promise<T>, affected: SQL | null, computedBy: string | null): Promise<T> {
  const { result, clipIds } = await db.transaction(async (tx) => {
    const result = await write(tx);
    return { result, clipIds: affected ? await bumpMeasureRevisions(tx, affected) : [] };
  });
  await recomputeMeasurements(clipIds, computedBy);
  return result;
}

/**
 * After the change is committed: recomputes the bumped clips' measurements, up to a bound per
 * request (a studio-wide friction change may touch thousands); the rest are recomputed by the
 * first reader (measurements.ts, currentMeasurementRows), never served stale.
 */
export const RECOMPUTE_IN_REQUEST = 200;

export async function recomputeMeasurements(clipIds: readonly string[], computedBy: string | null): Promise<{ recomputed: number; deferred: number }> {
  const now = clipIds.slice(0, RECOMPUTE_IN_REQUEST);
  for (const id of now) {
    // A clip deleted since the change has nothing left to recompute.
    await refreshMeasurements(id, computedBy).catch((err: unknown) => {
      if (!(err instanceof ApiError && err.code === "not_found")) throw err;
    });
  }
  return { recomputed: now.length, deferred: clipIds.length - now.length };
}

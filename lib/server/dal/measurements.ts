import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db, schema, type Db } from "@/db";
import type { StoredMark } from "@/lib/marks/types";
import { computeMeasurements } from "@/lib/metrics/compute";
import { METRICS_BY_VIEW } from "@/lib/metrics/keys";
import type { ClipContext, Measurement } from "@/lib/metrics/types";
import type { SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { loadClip } from "./clip-access";

const { clips, fittings, golfers, builds, studios, marks, measurements } = schema;

export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
type Executor = Db | Tx;

/**
 * Locks the clip row for the rest of the transaction and returns it with what the
 * measurements need. Every write that changes a clip's measurements starts here, so
 * recomputations of one clip run one after another and the stored values match the marks.
 */
export async function lockClip(tx: Tx, clipId: string) {
  const [row] = await tx
    .select({ clip: clips, golferId: golfers.id, handedness: golfers.handedness, staticLoftDeg: builds.loftDeg, settings: studios.settings })
    .from(clips)
    .innerJoin(fittings, eq(fittings.id, clips.fittingId))
    .innerJoin(golfers, eq(golfers.id, fittings.golferId))
    .innerJoin(builds, eq(builds.id, clips.buildId))
    .innerJoin(studios, eq(studios.id, clips.studioId))
    .where(eq(clips.id, clipId))
    .for("update", { of: clips });
  if (!row) throw notFound("No such clip");
  return row;
}

export type LockedClip = Awaited<ReturnType<typeof lockClip>>;

/** The clip as the computation sees it; null until processing has measured the frames. */
export function clipContext(row: Pick<LockedClip, "clip" | "handedness" | "staticLoftDeg" | "settings">): ClipContext | null {
  const { clip } = row;
  if (clip.width == null || clip.height == null || clip.frameCount == null) return null;
  return {
    view: clip.view,
    width: clip.width,
    height: clip.height,
    frameCount: clip.frameCount,
    captureFps: clip.captureFps,
    handedness: row.handedness,
    mirrored: clip.mirrored,
    moments: { address: clip.addressFrame, takeaway: clip.takeawayFrame, top: clip.topFrame, impact: clip.impactFrame, finish: clip.finishFrame },
    staticLoftDeg: row.staticLoftDeg,
    frictionMu: row.settings.frictionMu,
  };
}

/** Marks in drawing order: when two compete for one slot the computation takes the latest drawn. */
export async function clipMarks(ex: Executor, clipId: string): Promise<StoredMark[]> {
  const rows = await ex
    .select({ id: marks.id, frame: marks.frame, kind: marks.kind, role: marks.role, points: marks.points, lengthMm: marks.lengthMm, widthMm: marks.widthMm, heightMm: marks.heightMm })
    .from(marks)
    .where(eq(marks.clipId, clipId))
    .orderBy(asc(marks.createdAt), asc(marks.id));
  return rows.map((m) => ({
    id: m.id, frame: m.frame, kind: m.kind, role: m.role, points: m.points,
    ...(m.lengthMm != null && { lengthMm: m.lengthMm }),
    ...(m.widthMm != null && { widthMm: m.widthMm }),
    ...(m.heightMm != null && { heightMm: m.heightMm }),
  }));
}

/** Recomputes and stores every measurement of a locked clip (one row per key); returns them. */
export async function recomputeMeasurements(tx: Tx, locked: LockedClip, computedBy: string): Promise<Measurement[]> {
  const context = clipContext(locked);
  if (!context) return [];
  const computed = computeMeasurements(context, await clipMarks(tx, locked.clip.id));
  const now = new Date();
  await tx
    .insert(measurements)
    .values(computed.map((m) => ({
      studioId: locked.clip.studioId,
      clipId: locked.clip.id,
      key: m.key,
      value: m.value,
      unit: m.unit,
      frames: m.value === null ? [] : m.frames,
      markIds: m.value === null ? [] : m.markIds,
      needs: m.value === null ? m.needs : [],
      method: "derived" as const,
      computedBy,
      computedAt: now,
    })))
    .onConflictDoUpdate({
      target: [measurements.clipId, measurements.key],
      set: {
        value: sql`excluded.value`, unit: sql`excluded.unit`, frames: sql`excluded.frames`, markIds: sql`excluded.mark_ids`,
        needs: sql`excluded.needs`, method: sql`excluded.method`, computedBy: sql`excluded.computed_by`, computedAt: sql`excluded.computed_at`,
      },
    });
  return computed;
}

type Window = { min: number; max: number };
type Row = typeof measurements.$inferSelect;

/** A stored row back in the computation's shape (METRICS.md). */
function fromRow(r: Row): Measurement {
  if (r.value === null) return { key: r.key, value: null, unit: r.unit, needs: r.needs };
  return { key: r.key, value: r.value, unit: r.unit, frames: r.frames, markIds: r.markIds, method: "derived" };
}

/** The API's shape plus the studio's window for the key when it has one. */
export function presentMeasurements(list: Measurement[], windows: Record<string, Window> | undefined) {
  return list.map((m) => {
    const window = windows?.[m.key];
    return window ? { ...m, window } : m;
  });
}

// GET /api/clips/{id}/measurements
export async function listMeasurements(actor: SignedInActor, clipId: string) {
  const loaded = await loadClip(actor, clipId);
  const context = clipContext(loaded);
  if (!context) return { measurements: [] };
  const stored = new Map((await db.select().from(measurements).where(and(eq(measurements.clipId, clipId), eq(measurements.studioId, loaded.clip.studioId)))).map((r) => [r.key, r]));
  const keys = METRICS_BY_VIEW[context.view].map((d) => d.key);
  const rows = keys.map((k) => stored.get(k)).filter((r): r is Row => r !== undefined);
  // Nothing stored yet (no change since the clip became ready): compute from the marks, store nothing.
  const list = rows.length === keys.length ? rows.map(fromRow) : computeMeasurements(context, await clipMarks(db, clipId));
  return { measurements: presentMeasurements(list, loaded.settings.windows) };
}

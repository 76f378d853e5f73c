import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import type { StoredMark } from "@/lib/marks/types";
import { computeMeasurements } from "@/lib/metrics/compute";
import { METRICS_BY_VIEW } from "@/lib/metrics/keys";
import type { ClipContext, Measurement } from "@/lib/metrics/types";
import type { SignedInActor } from "../access";
import { notFound } from "../http/errors";
import { loadClip, type LoadedClip } from "./clip-access";

const { clips, fittings, golfers, builds, studios, marks, measurements } = schema;

// The clip columns the computation reads (not the motion signal: hundreds of numbers it never uses).
const measuredClipColumns = {
  id: clips.id, studioId: clips.studioId, view: clips.view, width: clips.width, height: clips.height, frameCount: clips.frameCount,
  captureFps: clips.captureFps, mirrored: clips.mirrored, addressFrame: clips.addressFrame, takeawayFrame: clips.takeawayFrame,
  topFrame: clips.topFrame, impactFrame: clips.impactFrame, finishFrame: clips.finishFrame, measureRevision: clips.measureRevision,
};
type MeasuredClip = Pick<LoadedClip["clip"], keyof typeof measuredClipColumns>;

/** What the computation needs about a clip: the clip, its golfer's handedness, its build's loft, the studio's settings. */
export type MeasureSubject = Pick<LoadedClip, "handedness" | "staticLoftDeg" | "settings"> & { clip: MeasuredClip };

/** The clip as the computation sees it; null until processing has measured the frames. */
export function clipContext(row: MeasureSubject): ClipContext | null {
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

// Marks in drawing order (when two compete for one slot the computation takes the latest drawn),
// as one JSON value: one row to parse instead of one per mark. Null sizes are left out. With
// tracking turned off on the clip, its proposals are left out.
const marksJson = sql<StoredMark[]>`coalesce((
  select json_agg(json_strip_nulls(json_build_object(
    'id', m.id, 'frame', m.frame, 'kind', m.kind, 'role', m.role, 'points', m.points,
    'lengthMm', m.length_mm, 'widthMm', m.width_mm, 'heightMm', m.height_mm,
    'source', m.source, 'precisionPx', m.precision_px)) order by m.created_at, m.id)
  from ${marks} m where m.clip_id = ${clips.id} and (m.source = 'hand' or ${clips.trackingEnabled})), '[]'::json)`;

/**
 * The clip, what it is measured with, and its marks, read in one statement: one snapshot, so the
 * marks and `clip.measureRevision` belong together (every change bumps the revision in the
 * statement that makes it: marks.ts, clips.ts). Prepared once per process: every save runs it,
 * and building the query each time costs more than running it.
 */
const measureInputsQuery = db
  .select({ clip: measuredClipColumns, handedness: golfers.handedness, staticLoftDeg: builds.loftDeg, settings: studios.settings, marks: marksJson })
  .from(clips)
  .innerJoin(fittings, eq(fittings.id, clips.fittingId))
  .innerJoin(golfers, eq(golfers.id, fittings.golferId))
  .innerJoin(builds, eq(builds.id, clips.buildId))
  .innerJoin(studios, eq(studios.id, clips.studioId))
  .where(eq(clips.id, sql.placeholder("clipId")))
  .prepare("measure_inputs");

async function readMeasureInputs(clipId: string) {
  const [row] = await measureInputsQuery.execute({ clipId });
  if (!row) throw notFound("No such clip");
  return row;
}

// One computation's rows arrive as a single JSON parameter (one per key) and go in with one prepared statement.
const incoming = sql`jsonb_to_recordset(${sql.placeholder("rows")}::jsonb) as r(key text, value double precision, uncertainty double precision, unit text, frames jsonb, mark_ids jsonb, needs jsonb, method measurement_method)`;
const excluded = (column: string) => sql.raw(`excluded.${column}`);
const storeQuery = db
  .insert(measurements)
  .select(
    db
      .select({
        id: sql`gen_random_uuid()`.as("id"),
        studioId: sql`${sql.placeholder("studioId")}::uuid`.as("studio_id"),
        clipId: sql`${sql.placeholder("clipId")}::uuid`.as("clip_id"),
        key: sql`r.key`.as("key"),
        value: sql`r.value`.as("value"),
        uncertainty: sql`r.uncertainty`.as("uncertainty"),
        unit: sql`r.unit`.as("unit"),
        frames: sql`r.frames`.as("frames"),
        markIds: sql`r.mark_ids`.as("mark_ids"),
        needs: sql`r.needs`.as("needs"),
        method: sql`coalesce(r.method, 'marked'::measurement_method)`.as("method"),
        computedBy: sql`${sql.placeholder("computedBy")}::uuid`.as("computed_by"),
        computedAt: sql`now()`.as("computed_at"),
        measureRevision: sql`${sql.placeholder("measureRevision")}::int`.as("measure_revision"),
      })
      .from(incoming),
  )
  .onConflictDoUpdate({
    target: [measurements.clipId, measurements.key],
    set: {
      value: excluded("value"), uncertainty: excluded("uncertainty"), unit: excluded("unit"), frames: excluded("frames"), markIds: excluded("mark_ids"), needs: excluded("needs"),
      method: excluded("method"), computedBy: excluded("computed_by"), computedAt: excluded("computed_at"), measureRevision: excluded("measure_revision"),
    },
    // Never over a computation from a later revision: concurrent saves may finish in any order.
    setWhere: sql`${measurements.measureRevision} <= excluded.measure_revision`,
  })
  .prepare("measurements_store");

/**
 * Stores one computation, one row per key. A row is replaced only by a computation from the same
 * or a later revision, so the stored values end up matching the latest marks.
 */
async function storeMeasurements(subject: MeasureSubject, computed: Measurement[], computedBy: string | null) {
  const rows = computed.map((m) => ({
    key: m.key, value: m.value, unit: m.unit,
    ...(m.value === null
      ? { uncertainty: null, frames: [], mark_ids: [], needs: m.needs, method: null }
      : { uncertainty: m.uncertainty, frames: m.frames, mark_ids: m.markIds, needs: [], method: m.method }),
  }));
  const { clip } = subject;
  await storeQuery.execute({ rows: JSON.stringify(rows), studioId: clip.studioId, clipId: clip.id, computedBy, measureRevision: clip.measureRevision });
}

/**
 * Recomputes a clip's measurements from its current marks and stores them; called after every
 * change to the marks or the clip, once that change is committed. Returns them with the studio's windows.
 */
export async function refreshMeasurements(clipId: string, computedBy: string | null) {
  const inputs = await readMeasureInputs(clipId);
  const context = clipContext(inputs);
  if (!context) return [];
  const computed = computeMeasurements(context, inputs.marks);
  await storeMeasurements(inputs, computed, computedBy);
  return presentMeasurements(computed, inputs.settings.windows);
}

type Window = { min: number; max: number };
type Row = typeof measurements.$inferSelect;

/** A stored row back in the computation's shape (docs/measurements.md). */
function fromRow(r: Row): Measurement {
  if (r.value === null) return { key: r.key, value: null, unit: r.unit, needs: r.needs };
  const method = r.method === "tracked" || r.method === "mixed" ? r.method : "marked";
  return { key: r.key, value: r.value, uncertainty: r.uncertainty, unit: r.unit, frames: r.frames, markIds: r.markIds, method };
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
  const rows = keys.map((k) => stored.get(k)).filter((r): r is Row => r !== undefined && r.measureRevision === loaded.clip.measureRevision);
  if (rows.length === keys.length) return { measurements: presentMeasurements(rows.map(fromRow), loaded.settings.windows) };
  // Nothing stored for the clip's current revision (an input changed and its recomputation was
  // deferred, or a save stopped between its change and its recomputation): compute and store now.
  return { measurements: await refreshMeasurements(clipId, null) };
}

/**
 * The stored measurement rows of these clips that belong to each clip's current revision. A ready
 * clip without a full current set (an input changed and its recomputation was deferred, or stopped)
 * is recomputed and stored first: every list, comparison, CSV and export reads through here, so no
 * row computed from an old input is ever shown.
 */
export async function currentMeasurementRows(clipIds: readonly string[]): Promise<Row[]> {
  if (clipIds.length === 0) return [];
  const read = () =>
    db
      .select({ row: measurements, clipId: clips.id, view: clips.view, measurable: sql<boolean>`${clips.frameCount} is not null` })
      .from(measurements)
      .rightJoin(clips, and(eq(clips.id, measurements.clipId), eq(measurements.measureRevision, clips.measureRevision)))
      .where(inArray(clips.id, [...clipIds]));
  const first = await read();
  const current = new Map<string, number>();
  for (const r of first) if (r.row) current.set(r.row.clipId, (current.get(r.row.clipId) ?? 0) + 1);
  // The right join gives every clip one row at least; the unmeasured (not processed yet) are skipped.
  const stale = [...new Map(first.map((r) => [r.clipId, r])).values()]
    .filter((r) => r.measurable && (current.get(r.clipId) ?? 0) < METRICS_BY_VIEW[r.view].length);
  if (stale.length === 0) return first.flatMap((r) => (r.row ? [r.row] : []));
  for (const { clipId } of stale) await refreshMeasurements(clipId, null);
  return (await read()).flatMap((r) => (r.row ? [r.row] : []));
}

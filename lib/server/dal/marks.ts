import "server-only";
import { and, asc, eq, exists, inArray, sql } from "drizzle-orm";
import { z } from "zod";
import { db, schema } from "@/db";
import { mayChangeMark } from "@/lib/access/policy";
import { checkMarkAgainstClip, markInputSchema, type ClipFrameInfo, type ParsedMarkInput } from "@/lib/marks";
import { assertGolfer, type SignedInActor } from "../access";
import { ApiError, forbidden, notFound } from "../http/errors";
import { pgErrorCode } from "../pg-errors";
import { loadClip } from "./clip-access";
import { refreshMeasurements } from "./measurements";

const { marks, clips, fittings } = schema;
type MarkRow = typeof marks.$inferSelect;

// What a mark save needs to know about its clip: no more, as every save reads it.
const clipColumns = {
  id: clips.id, studioId: clips.studioId, view: clips.view, state: clips.state, failureReason: clips.failureReason,
  width: clips.width, height: clips.height, frameCount: clips.frameCount,
};
type Clip = { [K in keyof typeof clipColumns]: (typeof clips.$inferSelect)[K] };

const STATE_WORDS: Record<Clip["state"], string> = {
  awaiting_upload: "still awaiting its upload",
  queued: "queued for processing",
  processing: "still being processed",
  ready: "ready",
  failed: "failed to process",
};

/** The frame facts marks are checked against; 422 unless the clip is ready. */
function readyFrameInfo(clip: Clip): ClipFrameInfo {
  if (clip.state !== "ready" || clip.width == null || clip.height == null || clip.frameCount == null) {
    const reason = clip.state === "failed" && clip.failureReason ? ` (${clip.failureReason})` : "";
    throw new ApiError("unprocessable", `Marks can be drawn only on a ready clip; this clip is ${STATE_WORDS[clip.state]}${reason}.`);
  }
  return { width: clip.width, height: clip.height, frameCount: clip.frameCount, view: clip.view };
}

/** Parses and checks a mark; every problem becomes one issue of a 400 `validation_failed`. */
function validMark(body: unknown, info: ClipFrameInfo): ParsedMarkInput {
  const parsed = markInputSchema.safeParse(body);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => ({ path: i.path.join("."), message: describeIssue(i) }));
    throw new ApiError("validation_failed", `The mark was refused: ${issues.map((i) => `${i.path || "body"}: ${i.message}`).join("; ")}`, issues);
  }
  const problems = checkMarkAgainstClip(parsed.data, info);
  if (problems.length > 0) {
    throw new ApiError("validation_failed", `The mark was refused: ${problems.join(" ")}`, problems.map((message) => ({ path: "body", message })));
  }
  return parsed.data;
}

// JSON has no NaN or Infinity: a client serialising one sends null, which reads as "expected number".
function describeIssue(issue: z.core.$ZodIssue): string {
  const [head, index] = issue.path;
  if (head === "points" && typeof index === "number" && issue.code === "invalid_type" && issue.expected === "number") {
    return `point ${index + 1} has a coordinate that is not a finite number (NaN, Infinity or null)`;
  }
  return issue.message;
}

/** The drawn part of a stored mark, in the API's input shape. */
function markFields(m: MarkRow) {
  return {
    frame: m.frame, kind: m.kind, role: m.role, points: m.points,
    ...(m.lengthMm != null && { lengthMm: m.lengthMm }),
    ...(m.widthMm != null && { widthMm: m.widthMm }),
    ...(m.heightMm != null && { heightMm: m.heightMm }),
  };
}

/** A mark as the API answers it: drawn fields, who placed it (hand or tracking) and its point precision. */
function presentMark(m: MarkRow) {
  return {
    id: m.id, clipId: m.clipId, ...markFields(m), source: m.source, precisionPx: m.precisionPx,
    authorUserId: m.authorUserId, version: m.version, createdAt: m.createdAt, updatedAt: m.updatedAt,
  };
}

// The statements every save runs are prepared once per process: building a query with joins
// costs more than running it (docs/benchmarks.md, marks-save).
const placeholder = sql.placeholder;

const clipForMarkingQuery = (withMark: boolean) =>
  db
    .select({ clip: clipColumns, golferId: fittings.golferId, mark: marks })
    .from(clips)
    .innerJoin(fittings, eq(fittings.id, clips.fittingId))
    .leftJoin(marks, withMark ? and(eq(marks.id, placeholder("markId")), eq(marks.clipId, clips.id)) : sql`false`)
    .where(eq(clips.id, placeholder("clipId")))
    .prepare(withMark ? "clip_and_mark_for_marking" : "clip_for_marking");
const clipWithMark = clipForMarkingQuery(true);
const clipWithoutMark = clipForMarkingQuery(false);

/**
 * The clip (and, for a change, the mark) a save acts on, after the access rules: one query.
 * Saves take no lock: each is one statement, and the measurements follow (measurements.ts).
 */
async function clipForMarking(actor: SignedInActor, clipId: string, markId?: string) {
  const [row] = await (markId ? clipWithMark.execute({ clipId, markId }) : clipWithoutMark.execute({ clipId }));
  if (!row) throw notFound("No such clip");
  const owner = { studioId: row.clip.studioId, golferId: row.golferId };
  await assertGolfer(actor, "golfer.read", owner, "No such clip");
  await assertGolfer(actor, "golfer.mark", owner, "No such clip");
  return { clip: row.clip, info: readyFrameInfo(row.clip), mark: row.mark };
}

/**
 * A CTE that bumps the clip's measure revision in the statement that changes its marks (so a
 * reader sees marks and revision together). It takes the clip's row lock before the mark's: the
 * order cascading deletes take them in, so a save racing a clip's deletion cannot deadlock.
 * For a change, a stale version (the save will change nothing) does not bump.
 */
function bumpClip(guardMark: boolean) {
  const markStillThere = guardMark
    ? sql` and ${exists(db.select({ one: sql`1` }).from(marks).where(and(eq(marks.id, placeholder("markId")), eq(marks.version, placeholder("version")))))}`
    : sql``;
  return db.$with("bumped", { id: clips.id }).as(
    sql`update ${clips} set measure_revision = measure_revision + 1 where ${clips.id} = ${placeholder("clipId")}${markStillThere} returning ${clips.id}`,
  );
}

const bumpedClipIds = (bumped: ReturnType<typeof bumpClip>) => db.select({ id: bumped.id }).from(bumped);
const thisMarkAtVersion = (bumped: ReturnType<typeof bumpClip>) =>
  and(eq(marks.id, placeholder("markId")), eq(marks.version, placeholder("version")), inArray(marks.clipId, bumpedClipIds(bumped)));

// A mark's drawn fields as statement parameters; `drawnValues` fills them (points go as JSON text).
const drawnColumns = {
  frame: sql`${placeholder("frame")}`, kind: sql`${placeholder("kind")}`, role: sql`${placeholder("role")}`, points: sql`${placeholder("points")}`,
  lengthMm: sql`${placeholder("lengthMm")}`, widthMm: sql`${placeholder("widthMm")}`, heightMm: sql`${placeholder("heightMm")}`,
};
const drawnValues = (m: ParsedMarkInput) => ({
  frame: m.frame, kind: m.kind, role: m.role, points: JSON.stringify(m.points),
  lengthMm: "lengthMm" in m ? m.lengthMm : null,
  widthMm: "widthMm" in m ? m.widthMm : null,
  heightMm: "heightMm" in m ? m.heightMm : null,
});

const insertMark = db
  .with(bumpClip(false))
  .insert(marks)
  .values({ ...drawnColumns, studioId: placeholder("studioId"), clipId: placeholder("clipId"), authorUserId: placeholder("authorUserId") })
  .returning()
  .prepare("mark_insert");

const updateBumped = bumpClip(true);
const updateMarkAtVersion = db
  .with(updateBumped)
  .update(marks)
  // A proposal moved by hand becomes a hand mark: the fitter's placement, with a click's precision.
  .set({ ...drawnColumns, source: "hand", precisionPx: null, version: sql`${marks.version} + 1`, updatedAt: sql`now()` })
  .where(thisMarkAtVersion(updateBumped))
  .returning()
  .prepare("mark_update");

const deleteBumped = bumpClip(true);
const deleteMarkAtVersion = db.with(deleteBumped).delete(marks).where(thisMarkAtVersion(deleteBumped)).returning({ id: marks.id }).prepare("mark_delete");

/** After a committed change: the clip's measurements, recomputed and stored. */
async function withMeasurements<T extends object>(actor: SignedInActor, clipId: string, result: T) {
  return { ...result, measurements: await refreshMeasurements(clipId, actor.userId) };
}

// GET /api/clips/{id}/marks
export async function listMarks(actor: SignedInActor, clipId: string) {
  const { clip } = await loadClip(actor, clipId);
  const rows = await db.select().from(marks).where(and(eq(marks.clipId, clipId), eq(marks.studioId, clip.studioId))).orderBy(asc(marks.createdAt), asc(marks.id));
  return { marks: rows.map(presentMark) };
}

// POST /api/clips/{id}/marks
export async function createMark(actor: SignedInActor, clipId: string, body: unknown) {
  const { clip, info } = await clipForMarking(actor, clipId);
  const input = validMark(body, info);
  const [row] = await insertMark
    .execute({ ...drawnValues(input), studioId: clip.studioId, clipId, authorUserId: actor.userId })
    .catch((err: unknown) => {
      // The clip went away between the check and the insert.
      if (pgErrorCode(err) === "23503") throw notFound("No such clip");
      throw err;
    });
  return withMeasurements(actor, clipId, { mark: presentMark(row!) });
}

const versionSchema = z.number({ error: "version (the mark's current version) is required" }).int().positive();

const staleVersion = (current: number, sent: number) =>
  new ApiError("conflict", `The mark was changed by someone else (version ${current}, you sent ${sent}); reload it and try again.`);

/** The mark as read with its clip, after the author rule and the version check. */
function markForChange(actor: SignedInActor, current: MarkRow | null, version: number): MarkRow {
  if (!current) throw notFound("No such mark on this clip");
  if (!mayChangeMark(actor, current.authorUserId)) throw forbidden("A coach may change or remove only the marks it drew");
  if (current.version !== version) throw staleVersion(current.version, version);
  return current;
}

/** A write guarded by the version read a moment earlier found nothing: someone got there first. */
async function lostRace(markId: string, version: number): Promise<never> {
  const [now] = await db.select({ version: marks.version }).from(marks).where(eq(marks.id, markId));
  throw now ? staleVersion(now.version, version) : notFound("No such mark on this clip");
}

// PATCH /api/clips/{id}/marks/{markId}: body { version, ...fields to change }
export async function updateMark(actor: SignedInActor, clipId: string, markId: string, body: unknown) {
  const { version, ...changes } = z.object({ version: versionSchema }).passthrough().parse(body);
  const { info, mark } = await clipForMarking(actor, clipId, markId);
  const current = markForChange(actor, mark, version);
  const input = validMark({ ...markFields(current), ...changes }, info);
  const [row] = await updateMarkAtVersion.execute({ ...drawnValues(input), clipId, markId, version });
  if (!row) return lostRace(markId, version);
  return withMeasurements(actor, clipId, { mark: presentMark(row) });
}

// DELETE /api/clips/{id}/marks/{markId}?version=N
export async function deleteMark(actor: SignedInActor, clipId: string, markId: string, version: unknown) {
  const checkedVersion = versionSchema.parse(version);
  const { mark } = await clipForMarking(actor, clipId, markId);
  markForChange(actor, mark, checkedVersion);
  const [gone] = await deleteMarkAtVersion.execute({ clipId, markId, version: checkedVersion });
  if (!gone) return lostRace(markId, checkedVersion);
  return withMeasurements(actor, clipId, { deleted: markId });
}

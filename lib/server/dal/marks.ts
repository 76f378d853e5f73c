import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { z } from "zod";
import { db, schema } from "@/db";
import { mayChangeMark } from "@/lib/access/policy";
import { checkMarkAgainstClip, markInputSchema, type ClipFrameInfo, type ParsedMarkInput } from "@/lib/marks";
import { assertGolfer, type SignedInActor } from "../access";
import { ApiError, forbidden, notFound } from "../http/errors";
import { loadClip } from "./clip-access";
import { lockClip, presentMeasurements, recomputeMeasurements, type LockedClip, type Tx } from "./measurements";

const { marks } = schema;
type MarkRow = typeof marks.$inferSelect;
type Clip = LockedClip["clip"];

const STATE_WORDS: Record<Clip["state"], string> = {
  awaiting_upload: "still awaiting its upload",
  queued: "queued for processing",
  processing: "still being processed",
  ready: "ready",
  failed: "failed to process",
};

/** The frame facts marks are checked against; 422 unless the clip is ready. */
export function readyFrameInfo(clip: Clip): ClipFrameInfo {
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

function presentMark(m: MarkRow) {
  return { id: m.id, clipId: m.clipId, ...markFields(m), authorUserId: m.authorUserId, version: m.version, createdAt: m.createdAt, updatedAt: m.updatedAt };
}

const markColumns = (m: ParsedMarkInput) => ({
  frame: m.frame, kind: m.kind, role: m.role, points: m.points as [number, number][],
  lengthMm: "lengthMm" in m ? m.lengthMm : null,
  widthMm: "widthMm" in m ? m.widthMm : null,
  heightMm: "heightMm" in m ? m.heightMm : null,
});

/**
 * Runs a change under the clip's lock and answers with the recomputed measurements. The access
 * check uses the locked row, so a save reads the clip once.
 */
async function changeMarks<T>(actor: SignedInActor, clipId: string, change: (tx: Tx, locked: LockedClip, info: ClipFrameInfo) => Promise<T>) {
  return db.transaction(async (tx) => {
    const locked = await lockClip(tx, clipId);
    const owner = { studioId: locked.clip.studioId, golferId: locked.golferId };
    await assertGolfer(actor, "golfer.read", owner, "No such clip");
    await assertGolfer(actor, "golfer.mark", owner, "No such clip");
    const result = await change(tx, locked, readyFrameInfo(locked.clip));
    const measurements = presentMeasurements(await recomputeMeasurements(tx, locked, actor.userId), locked.settings.windows);
    return { ...result, measurements };
  });
}

// GET /api/clips/{id}/marks
export async function listMarks(actor: SignedInActor, clipId: string) {
  const { clip } = await loadClip(actor, clipId);
  const rows = await db.select().from(marks).where(and(eq(marks.clipId, clipId), eq(marks.studioId, clip.studioId))).orderBy(asc(marks.createdAt), asc(marks.id));
  return { marks: rows.map(presentMark) };
}

// POST /api/clips/{id}/marks
export async function createMark(actor: SignedInActor, clipId: string, body: unknown) {
  return changeMarks(actor, clipId, async (tx, locked, info) => {
    const input = validMark(body, info);
    const [row] = await tx.insert(marks).values({ ...markColumns(input), studioId: locked.clip.studioId, clipId, authorUserId: actor.userId }).returning();
    return { mark: presentMark(row!) };
  });
}

const versionSchema = z.number({ error: "version (the mark's current version) is required" }).int().positive();

/** The mark under the clip's lock, after the author rule and the version check. */
async function markForChange(tx: Tx, actor: SignedInActor, clipId: string, markId: string, version: number): Promise<MarkRow> {
  const [current] = await tx.select().from(marks).where(and(eq(marks.id, markId), eq(marks.clipId, clipId)));
  if (!current) throw notFound("No such mark on this clip");
  if (!mayChangeMark(actor, current.authorUserId)) throw forbidden("A coach may change or remove only the marks it drew");
  if (current.version !== version) {
    throw new ApiError("conflict", `The mark was changed by someone else (version ${current.version}, you sent ${version}); reload it and try again.`);
  }
  return current;
}

// PATCH /api/clips/{id}/marks/{markId}: body { version, ...fields to change }
export async function updateMark(actor: SignedInActor, clipId: string, markId: string, body: unknown) {
  return changeMarks(actor, clipId, async (tx, _locked, info) => {
    const { version, ...changes } = z.object({ version: versionSchema }).passthrough().parse(body);
    const current = await markForChange(tx, actor, clipId, markId, version);
    const input = validMark({ ...markFields(current), ...changes }, info);
    const [row] = await tx
      .update(marks)
      .set({ ...markColumns(input), version: sql`${marks.version} + 1`, updatedAt: new Date() })
      .where(and(eq(marks.id, markId), eq(marks.version, version)))
      .returning();
    return { mark: presentMark(row!) };
  });
}

// DELETE /api/clips/{id}/marks/{markId}?version=N
export async function deleteMark(actor: SignedInActor, clipId: string, markId: string, version: unknown) {
  return changeMarks(actor, clipId, async (tx) => {
    const checkedVersion = versionSchema.parse(version);
    await markForChange(tx, actor, clipId, markId, checkedVersion);
    await tx.delete(marks).where(and(eq(marks.id, markId), eq(marks.version, checkedVersion)));
    return { deleted: markId };
  });
}

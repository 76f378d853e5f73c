import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db, schema } from "@/db";
import { measurementsCsv, measurementsCsvWide } from "@/lib/compare/csv";
import { ERASE_WORD } from "@/lib/schemas/golfer";
import { assertGolfer, type SignedInActor } from "../access";
import { ApiError } from "../http/errors";
import { clipPrefix, deleteKeys, listKeys, presignDownload } from "../storage";
import { getFitting } from "./fittings";
import { getGolfer } from "./golfers";
import { currentMeasurementRows } from "./measurements";

const { builds, clips, fittings, marks, comments, specs, golfers, users, coachGolfers } = schema;

/** A fitting's measurements as CSV: one row per clip per measurement (or per putt, wide); putts set aside as mishits are left out. */
export async function fittingMeasurementsCsv(actor: SignedInActor, fittingId: string, layout: "long" | "wide" = "long") {
  const fitting = await getFitting(actor, fittingId);
  const clipRows = await db
    .select({ buildPosition: builds.position, buildLabel: builds.label, clipId: clips.id, view: clips.view, clipCreatedAt: clips.createdAt })
    .from(clips)
    .innerJoin(builds, eq(builds.id, clips.buildId))
    .where(and(eq(clips.fittingId, fittingId), eq(clips.studioId, fitting.studioId), isNull(clips.mishitReason)))
    .orderBy(asc(builds.position), asc(clips.createdAt), asc(clips.id));
  const byClip = new Map<string, Awaited<ReturnType<typeof currentMeasurementRows>>>();
  for (const m of await currentMeasurementRows(clipRows.map((c) => c.clipId))) byClip.set(m.clipId, [...(byClip.get(m.clipId) ?? []), m]);
  const rows = clipRows.flatMap((c) =>
    (byClip.get(c.clipId) ?? [])
      .sort((a, b) => a.key.localeCompare(b.key))
      .map((m) => ({ ...c, key: m.key, value: m.value, uncertainty: m.uncertainty, unit: m.unit, method: m.method })),
  );
  const full = rows.map((r) => ({ ...r, fittingId }));
  return layout === "wide" ? measurementsCsvWide(full) : measurementsCsv(full);
}

const LINK_SECONDS = 15 * 60;

/** Everything stored about a golfer, with short-lived links to its clips (15 minutes). */
export async function exportGolferData(actor: SignedInActor, golferId: string) {
  const golfer = await getGolfer(actor, golferId);
  await assertGolfer(actor, "golfer.export", { studioId: golfer.studioId, golferId });
  const fittingRows = await db.select().from(fittings).where(eq(fittings.golferId, golferId)).orderBy(asc(fittings.scheduledAt));
  const fittingIds = fittingRows.map((f) => f.id);
  const none = fittingIds.length === 0;
  const [buildRows, clipRows, specRows] = await Promise.all([
    none ? [] : db.select().from(builds).where(inArray(builds.fittingId, fittingIds)),
    none ? [] : db.select().from(clips).where(inArray(clips.fittingId, fittingIds)),
    db.select().from(specs).where(eq(specs.golferId, golferId)).orderBy(asc(specs.issuedAt)),
  ]);
  const clipIds = clipRows.map((c) => c.id);
  const [markRows, measurementRows, commentRows] = clipIds.length === 0 ? [[], [], []] : await Promise.all([
    db.select().from(marks).where(inArray(marks.clipId, clipIds)),
    currentMeasurementRows(clipIds),
    db.select().from(comments).where(inArray(comments.clipId, clipIds)),
  ]);
  const clipsWithLinks = await Promise.all(
    clipRows.map(async (c) => ({ ...c, motionSignal: undefined, sourceUrl: c.state === "awaiting_upload" ? null : await presignDownload(c.objectKey, LINK_SECONDS) })),
  );
  return {
    exportedAt: new Date().toISOString(),
    linksExpireInSeconds: LINK_SECONDS,
    golfer,
    fittings: fittingRows,
    builds: buildRows,
    clips: clipsWithLinks,
    marks: markRows,
    measurements: measurementRows,
    comments: commentRows,
    specs: specRows,
  };
}

/**
 * Deletes a golfer and everything recorded about it: the clips' files in storage first, then the
 * rows (fittings, builds, clips, marks, measurements, comments and specs follow by cascade) and the
 * golfer's sign-in account. Cannot be undone.
 */
export async function eraseGolferData(actor: SignedInActor, golferId: string, confirm: string | undefined) {
  const golfer = await getGolfer(actor, golferId);
  await assertGolfer(actor, "golfer.erase", { studioId: golfer.studioId, golferId });
  if (confirm !== ERASE_WORD) throw new ApiError("bad_request", `Type ${ERASE_WORD} to confirm: erasing a golfer's data cannot be undone`);
  const clipRows = await db
    .select({ id: clips.id })
    .from(clips)
    .innerJoin(fittings, eq(fittings.id, clips.fittingId))
    .where(and(eq(fittings.golferId, golferId), eq(clips.studioId, golfer.studioId)));
  let files = 0;
  for (const c of clipRows) {
    const keys = await listKeys(clipPrefix(golfer.studioId, c.id));
    if (keys.length > 0) await deleteKeys(keys);
    files += keys.length;
  }
  await db.transaction(async (tx) => {
    await tx.delete(coachGolfers).where(eq(coachGolfers.golferId, golferId));
    await tx.delete(golfers).where(and(eq(golfers.id, golferId), eq(golfers.studioId, golfer.studioId)));
    if (golfer.userId) await tx.delete(users).where(and(eq(users.id, golfer.userId), eq(users.role, "golfer")));
  });
  return { deleted: true, clips: clipRows.length, files };
}

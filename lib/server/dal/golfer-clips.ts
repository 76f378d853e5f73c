import "server-only";
// What the phone pages read: a fitting's builds with their clips, one clip with its marks,
// measurements and comments, and two clips to play side by side. Every read goes through the
// access checks of the DAL functions it calls.
import { and, asc, desc, eq, inArray, isNull } from "drizzle-orm";
import { db, schema } from "@/db";
import type { SignedInActor } from "../access";
import { notFound as nextNotFound } from "next/navigation";
import { ApiError, notFound } from "../http/errors";
import { getClip } from "./clips";
import { listComments } from "./comments";
import { getFitting } from "./fittings";
import { listMarks } from "./marks";
import { listMeasurements } from "./measurements";

const { builds, clips, specs } = schema;

/** A fitting's builds in order, each with its clips; and the build issued as the spec, if any. */
export async function getPhoneFitting(actor: SignedInActor, fittingId: string) {
  const fitting = await getFitting(actor, fittingId);
  const buildRows = fitting.builds;
  const clipRows = buildRows.length === 0 ? [] : await db
    .select({ id: clips.id, buildId: clips.buildId, view: clips.view, state: clips.state, failureReason: clips.failureReason, createdAt: clips.createdAt, impactFrame: clips.impactFrame, mishitReason: clips.mishitReason })
    .from(clips)
    .where(and(inArray(clips.buildId, buildRows.map((b) => b.id)), eq(clips.studioId, fitting.studioId)))
    .orderBy(asc(clips.createdAt));
  const [spec] = await db.select({ buildId: specs.buildId }).from(specs)
    .where(and(eq(specs.fittingId, fittingId), isNull(specs.supersededAt))).orderBy(desc(specs.issuedAt)).limit(1);
  return {
    fitting,
    chosenBuildId: spec?.buildId ?? null,
    builds: buildRows.map((b) => ({ ...b, clips: clipRows.filter((c) => c.buildId === b.id) })),
  };
}

export type PhoneFitting = Awaited<ReturnType<typeof getPhoneFitting>>;

/**
 * The marks a golfer or coach replays: the fitter's own, and the tracker's proposals only once the
 * fitter has accepted them (and tracking is on) — unconfirmed proposals are the fitter's working state.
 */
async function confirmedMarks(actor: SignedInActor, clip: Awaited<ReturnType<typeof getClip>>) {
  const accepted = clip.trackingEnabled && typeof clip.tracking?.acceptedAt === "string";
  const { marks } = await listMarks(actor, clip.id);
  return marks.filter((m) => m.source === "hand" || accepted);
}

/** One clip for the phone player: timing, moments, marks, measurements, comments. */
export async function getPhoneClip(actor: SignedInActor, clipId: string) {
  const clip = await getClip(actor, clipId);
  const [marks, { measurements }, comments, [build]] = await Promise.all([
    confirmedMarks(actor, clip),
    listMeasurements(actor, clipId),
    listComments(actor, clipId),
    db.select({ label: builds.label, isBaseline: builds.isBaseline }).from(builds).where(eq(builds.id, clip.buildId)),
  ]);
  if (!build) throw notFound("No such clip");
  return { clip, build, marks, measurements, comments };
}

export type PhoneClip = Awaited<ReturnType<typeof getPhoneClip>>;

/**
 * Two ready clips of one fitting to compare at impact: the baseline build's and the chosen
 * (spec) build's, of the same view, each the latest with an impact frame; or explicit ids.
 */
export async function getComparePair(actor: SignedInActor, fittingId: string, pick: { a?: string; b?: string; view?: string }) {
  const { builds: list, chosenBuildId } = await getPhoneFitting(actor, fittingId);
  // A putt set aside as a mishit is never offered as a build's example.
  const ready = list.flatMap((b) => b.clips.filter((c) => c.state === "ready" && c.impactFrame !== null && c.mishitReason === null).map((c) => ({ ...c, build: b })));
  const baseline = list.find((b) => b.isBaseline) ?? list[0];
  const chosen = list.find((b) => b.id === chosenBuildId) ?? list.filter((b) => b.id !== baseline?.id).at(-1);
  const latestOf = (buildId: string | undefined, view?: string) => ready.filter((c) => c.build.id === buildId && (!view || c.view === view)).at(-1);
  const a = ready.find((c) => c.id === pick.a) ?? latestOf(baseline?.id, pick.view);
  const b = ready.find((c) => c.id === pick.b) ?? latestOf(chosen?.id, a?.view ?? pick.view);
  if (!a || !b) return { pair: null, choices: ready.map((c) => ({ id: c.id, view: c.view, buildLabel: c.build.label })) };
  const [clipA, clipB] = await Promise.all([getClip(actor, a.id), getClip(actor, b.id)]);
  const [marksA, marksB] = await Promise.all([confirmedMarks(actor, clipA), confirmedMarks(actor, clipB)]);
  return {
    pair: { a: { clip: clipA, marks: marksA, buildLabel: a.build.label }, b: { clip: clipB, marks: marksB, buildLabel: b.build.label } },
    choices: ready.map((c) => ({ id: c.id, view: c.view, buildLabel: c.build.label })),
  };
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** For pages: a malformed id, a thing the actor may not see or may not use → the 404 page. */
export async function pageOr404<T>(id: string, load: (id: string) => Promise<T>): Promise<T> {
  if (!UUID.test(id)) nextNotFound();
  try {
    return await load(id);
  } catch (err) {
    if (err instanceof ApiError && (err.code === "not_found" || err.code === "forbidden")) nextNotFound();
    throw err;
  }
}

/** A coach's way in: the fittings (with clips) of the golfers shared with it, newest first. */
export async function listCoachFittings(actor: SignedInActor, limit = 20) {
  if (actor.role !== "coach") return [];
  const { fittings, golfers, coachGolfers } = schema;
  return db
    .select({ id: fittings.id, scheduledAt: fittings.scheduledAt, golferName: golfers.name })
    .from(fittings)
    .innerJoin(golfers, eq(golfers.id, fittings.golferId))
    .innerJoin(coachGolfers, and(eq(coachGolfers.golferId, golfers.id), eq(coachGolfers.coachUserId, actor.userId)))
    .where(eq(fittings.studioId, actor.studioId))
    .orderBy(desc(fittings.scheduledAt))
    .limit(limit);
}

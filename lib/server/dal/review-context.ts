import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { earlierOfSameView, puttNeighbours, puttNumbers, type PuttClip } from "@/lib/review/putts";
import type { SignedInActor } from "../access";
import type { LoadedClip } from "./clip-access";

const { clips, builds, golfers, marks } = schema;

/**
 * Where a clip sits for the review screen: golfer, build, putt number, the previous and next putt
 * of the same view, and the latest earlier clip of that view with the fitter's reference marks
 * (direction line, scale, plane) to carry over. `loaded` has already passed the access check.
 */
export async function reviewContext(_actor: SignedInActor, loaded: LoadedClip) {
  const { clip } = loaded;
  const [golfer, buildRows, clipRows] = await Promise.all([
    db.select({ name: golfers.name }).from(golfers).where(eq(golfers.id, loaded.golferId)).then((r) => r[0]),
    db.select({ id: builds.id, position: builds.position, label: builds.label }).from(builds).where(eq(builds.fittingId, clip.fittingId)).orderBy(asc(builds.position)),
    db.select({ id: clips.id, buildId: clips.buildId, view: clips.view, state: clips.state, createdAt: clips.createdAt }).from(clips).where(eq(clips.fittingId, clip.fittingId)),
  ]);
  const putts: PuttClip[] = clipRows.map((c) => ({ ...c, createdAt: c.createdAt.toISOString() }));
  const where = puttNeighbours(putts, buildRows, clip.id);
  const carry = await carrySource(putts, clip.id, clip.studioId);
  const build = buildRows.find((b) => b.id === clip.buildId);
  return {
    golferName: golfer?.name ?? "",
    fittingId: clip.fittingId,
    buildLabel: build?.label ?? "",
    buildId: clip.buildId,
    putt: where.putt,
    previous: where.previous,
    next: where.next,
    carry: carry && { ...carry, label: `putt ${puttNumbers(putts).get(carry.clipId)} of ${buildRows.find((b) => b.id === putts.find((c) => c.id === carry.clipId)?.buildId)?.label ?? "another build"}` },
  };
}

/** The latest earlier ready clip of the same view that has hand-made reference marks. */
async function carrySource(putts: PuttClip[], clipId: string, studioId: string) {
  for (const earlier of earlierOfSameView(putts, clipId).slice(0, 5)) {
    const rows = await db
      .select({ id: marks.id, frame: marks.frame, kind: marks.kind, role: marks.role, points: marks.points, lengthMm: marks.lengthMm, widthMm: marks.widthMm, heightMm: marks.heightMm, source: marks.source, version: marks.version })
      .from(marks)
      .where(and(eq(marks.clipId, earlier.id), eq(marks.studioId, studioId), eq(marks.source, "hand")))
      .orderBy(asc(marks.createdAt));
    const reference = rows.filter((m) => (m.kind === "line" && (m.role === "target" || m.role === "ground")) || m.kind === "scale" || m.kind === "plane");
    if (reference.length > 0) return { clipId: earlier.id, marks: reference };
  }
  return null;
}

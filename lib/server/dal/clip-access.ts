import "server-only";
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import type { GolferPermission } from "@/lib/access/policy";
import { assertGolfer, type SignedInActor } from "../access";
import { notFound } from "../http/errors";

const { clips, fittings, golfers, builds, studios } = schema;

/**
 * A clip with what access and the measurements need to know about it: its golfer (for the
 * access rule and handedness), its build's static loft and the studio's settings.
 * Throws 404 when the actor may not see it, 403 when it may see but not do `permission`.
 */
export async function loadClip(actor: SignedInActor, clipId: string, permission: GolferPermission = "golfer.read") {
  const [row] = await db
    .select({ clip: clips, golferId: fittings.golferId, handedness: golfers.handedness, staticLoftDeg: builds.loftDeg, settings: studios.settings })
    .from(clips)
    .innerJoin(fittings, eq(fittings.id, clips.fittingId))
    .innerJoin(golfers, eq(golfers.id, fittings.golferId))
    .innerJoin(builds, eq(builds.id, clips.buildId))
    .innerJoin(studios, eq(studios.id, clips.studioId))
    .where(eq(clips.id, clipId));
  if (!row) throw notFound("No such clip");
  await assertGolfer(actor, "golfer.read", { studioId: row.clip.studioId, golferId: row.golferId }, "No such clip");
  if (permission !== "golfer.read") await assertGolfer(actor, permission, { studioId: row.clip.studioId, golferId: row.golferId }, "No such clip");
  return row;
}

export type LoadedClip = Awaited<ReturnType<typeof loadClip>>;

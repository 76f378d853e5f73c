import "server-only";
import { count, inArray } from "drizzle-orm";
import { db, schema } from "@/db";
import type { SignedInActor } from "../access";
import { listFittingsOfGolfer } from "./fittings";
import { getGolfer } from "./golfers";
import { listSpecsOfGolfer } from "./specs";

const { clips } = schema;

/** The golfer page: the golfer, its fittings with their clip counts, and its specs. */
export async function getGolferPage(actor: SignedInActor, golferId: string) {
  const golfer = await getGolfer(actor, golferId);
  const [fittings, specs] = await Promise.all([listFittingsOfGolfer(actor, golferId), listSpecsOfGolfer(actor, golferId)]);
  const ids = fittings.map((f) => f.id);
  const counts = ids.length === 0 ? [] : await db.select({ fittingId: clips.fittingId, n: count() }).from(clips).where(inArray(clips.fittingId, ids)).groupBy(clips.fittingId);
  const byFitting = new Map(counts.map((c) => [c.fittingId, c.n]));
  return { golfer, specs, fittings: fittings.map((f) => ({ ...f, clipCount: byFitting.get(f.id) ?? 0 })) };
}

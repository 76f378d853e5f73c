import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db, schema } from "@/db";
import { compareBuilds } from "@/lib/compare/compare";
import type { SignedInActor } from "../access";
import { getFitting } from "./fittings";
import { currentMeasurementRows } from "./measurements";
import { settingsOfStudio } from "./settings";

const { clips, golfers } = schema;

/** The comparison of a fitting's builds over its ready clips, against the studio's windows; putts set aside as mishits do not count. */
export async function getComparison(actor: SignedInActor, fittingId: string) {
  const fitting = await getFitting(actor, fittingId);
  const ready = and(eq(clips.fittingId, fittingId), eq(clips.studioId, fitting.studioId), eq(clips.state, "ready"), isNull(clips.mishitReason));
  const [clipRows, settings, golfer] = await Promise.all([
    db.select({ id: clips.id, buildId: clips.buildId, view: clips.view, createdAt: clips.createdAt, strokeId: clips.strokeId }).from(clips).where(ready).orderBy(asc(clips.createdAt)),
    settingsOfStudio(fitting.studioId),
    db.select({ handedness: golfers.handedness }).from(golfers).where(eq(golfers.id, fitting.golferId)).then((r) => r[0]),
  ]);
  // Only rows of each clip's current revision: a changed handedness, loft or friction shows at once.
  const measurementRows = await currentMeasurementRows(clipRows.map((c) => c.id));
  return { fitting, settings, handedness: golfer?.handedness ?? "right", comparison: compareBuilds(fitting.builds, clipRows, measurementRows, settings.windows) };
}

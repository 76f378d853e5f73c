import "server-only";
import { and, asc, eq, isNull } from "drizzle-orm";
import { db, schema } from "@/db";
import { compareBuilds } from "@/lib/compare/compare";
import type { SignedInActor } from "../access";
import { getFitting } from "./fittings";
import { currentMeasurementRows } from "./measurements";
import { settingsOfStudio } from "./settings";

const { clips } = schema;

/** The comparison of a fitting's builds over its ready clips, against the studio's windows; putts set aside as mishits do not count. */
export async function getComparison(actor: SignedInActor, fittingId: string) {
  const fitting = await getFitting(actor, fittingId);
  const ready = and(eq(clips.fittingId, fittingId), eq(clips.studioId, fitting.studioId), eq(clips.state, "ready"), isNull(clips.mishitReason));
  const [clipRows, settings] = await Promise.all([
    db.select({ id: clips.id, buildId: clips.buildId, view: clips.view, createdAt: clips.createdAt, strokeId: clips.strokeId }).from(clips).where(ready).orderBy(asc(clips.createdAt)),
    settingsOfStudio(fitting.studioId),
  ]);
  // Only rows of each clip's current revision: a changed handedness, loft or friction shows at once.
  const measurementRows = await currentMeasurementRows(clipRows.map((c) => c.id));
  return { fitting, settings, comparison: compareBuilds(fitting.builds, clipRows, measurementRows, settings.windows) };
}

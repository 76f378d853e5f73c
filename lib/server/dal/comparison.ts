import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { db, schema } from "@/db";
import { compareBuilds } from "@/lib/compare/compare";
import type { SignedInActor } from "../access";
import { getFitting } from "./fittings";
import { settingsOfStudio } from "./settings";

const { clips, measurements } = schema;

/** The comparison of a fitting's builds over its ready clips, against the studio's windows. */
export async function getComparison(actor: SignedInActor, fittingId: string) {
  const fitting = await getFitting(actor, fittingId);
  const ready = and(eq(clips.fittingId, fittingId), eq(clips.studioId, fitting.studioId), eq(clips.state, "ready"));
  const [clipRows, measurementRows, settings] = await Promise.all([
    db.select({ id: clips.id, buildId: clips.buildId, view: clips.view, createdAt: clips.createdAt }).from(clips).where(ready).orderBy(asc(clips.createdAt)),
    db
      .select({ clipId: measurements.clipId, key: measurements.key, value: measurements.value, unit: measurements.unit })
      .from(measurements)
      .innerJoin(clips, eq(clips.id, measurements.clipId))
      .where(ready),
    settingsOfStudio(fitting.studioId),
  ]);
  return { fitting, settings, comparison: compareBuilds(fitting.builds, clipRows, measurementRows, settings.windows) };
}

import "server-only";
// A fitting as a live session: its builds in order with the recording one marked, every putt under
// its build with its state and, once ready, its key numbers with their uncertainty, and each build's
// running summary (the comparison's own per-build statistics, mishits left out). The fitting page
// and the studio screen poll it; it reads only, so a poll costs a handful of indexed selects.
import { asc, eq, sql } from "drizzle-orm";
import { db, schema } from "@/db";
import { compareBuilds } from "@/lib/compare/compare";
import { metricDefinition } from "@/lib/compare/metric-labels";
import { SESSION_KEYS, SESSION_SUMMARY_KEYS } from "@/lib/compare/session-keys";
import { signWordsFor } from "@/lib/metrics/keys";
import type { SignedInActor } from "../access";
import { getFitting } from "./fittings";
import { currentMeasurementRows } from "./measurements";
import { settingsOfStudio } from "./settings";

const { clips, golfers } = schema;

type Fitting = Awaited<ReturnType<typeof getFitting>>;
/** Where the tracker's proposals stand: numbers need an impact, which the fitter confirms by accepting them. */
type TrackingStage = "off" | "pending" | "proposed" | "accepted";

// GET /api/fittings/{id}/session
export async function getSession(actor: SignedInActor, fittingId: string) {
  return sessionOf(await getFitting(actor, fittingId));
}

/** The session of a fitting whose access has been checked (by the actor, or by a studio-screen link). */
export async function sessionOf(fitting: Fitting) {
  const [clipRows, settings, [golfer]] = await Promise.all([
    db
      .select({
        id: clips.id, buildId: clips.buildId, strokeId: clips.strokeId, view: clips.view, state: clips.state, progress: clips.progress,
        failureReason: clips.failureReason, originalName: clips.originalName, createdAt: clips.createdAt, mishitReason: clips.mishitReason,
        tracking: sql<TrackingStage>`case when not ${clips.trackingEnabled} then 'off' when ${clips.tracking} is null then 'pending'
          when ${clips.tracking} ? 'acceptedAt' then 'accepted' else 'proposed' end`,
      })
      .from(clips)
      .where(eq(clips.fittingId, fitting.id))
      .orderBy(asc(clips.createdAt), asc(clips.id)),
    settingsOfStudio(fitting.studioId),
    db.select({ handedness: golfers.handedness }).from(golfers).where(eq(golfers.id, fitting.golferId)),
  ]);
  const ready = clipRows.filter((c) => c.state === "ready");
  const rows = await currentMeasurementRows(ready.map((c) => c.id));
  const counted = ready.filter((c) => c.mishitReason === null);
  const countedIds = new Set(counted.map((c) => c.id));
  const comparison = compareBuilds(fitting.builds, counted, rows.filter((r) => countedIds.has(r.clipId)), settings.windows);
  const handedness = golfer?.handedness ?? "right";

  const byClip = new Map<string, typeof rows>();
  for (const r of rows) byClip.set(r.clipId, [...(byClip.get(r.clipId) ?? []), r]);
  const putts = clipRows.map((c) => ({
    clipId: c.id, buildId: c.buildId, strokeId: c.strokeId, view: c.view, state: c.state, progress: c.progress,
    failureReason: c.failureReason, fileName: c.originalName, createdAt: c.createdAt,
    mishit: c.mishitReason === null ? null : { reason: c.mishitReason }, tracking: c.tracking,
    numbers: SESSION_KEYS[c.view].map((key) => {
      const row = byClip.get(c.id)?.find((r) => r.key === key);
      const definition = metricDefinition(key);
      return {
        key, label: definition.label, unit: definition.unit, signWords: signWordsFor(c.view, key, handedness),
        value: row?.value ?? null, uncertainty: row?.value == null ? null : row.uncertainty, method: row?.value == null ? null : row.method,
        window: settings.windows[key] ?? null,
      };
    }),
  }));

  return {
    fitting: { id: fitting.id, status: fitting.status, recordingBuildId: fitting.recordingBuildId },
    handedness,
    builds: comparison.builds.map((b) => ({
      id: b.buildId, label: b.label, isBaseline: b.isBaseline, recording: b.buildId === fitting.recordingBuildId,
      putts: putts.filter((p) => p.buildId === b.buildId),
      summary: SESSION_SUMMARY_KEYS.map((key) => b.stats.find((s) => s.key === key)).filter((s) => s !== undefined),
      plotted: b.putts,
    })),
    // The newest putt of the fitting, whatever its state: the one the studio screen shows large.
    current: putts.at(-1) ?? null,
    leading: comparison.recommendation ? { buildId: comparison.recommendation.buildId, label: comparison.recommendation.label, basis: comparison.recommendation.basis } : null,
  };
}

export type Session = Awaited<ReturnType<typeof sessionOf>>;

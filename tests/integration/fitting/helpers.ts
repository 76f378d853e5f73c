// Test data for the fitting workflow: ready clips and their measurements written straight into
// the database (the marking UI writes them in real use), and the mail catcher's messages.
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";
import type { World } from "../../support/world";

type View = "overhead" | "face-on" | "down-the-line";

export async function addBuild(w: World, label: string, fields: Partial<typeof schema.builds.$inferInsert> = {}, position = 2) {
  const [row] = await db.insert(schema.builds).values({ studioId: w.studioA.id, fittingId: w.own.fitting.id, position, label, ...fields }).returning();
  return row!;
}

/** One ready clip per entry of `values`, each with the given measurements (value null = not computable). */
export async function addMeasuredClips(
  w: World,
  build: { id: string; fittingId: string },
  rows: Record<string, number | null>[],
  view: View = "overhead",
  startAt = Date.UTC(2026, 0, 1, 10),
) {
  const clips = [];
  for (const [i, values] of rows.entries()) {
    const [clip] = await db
      .insert(schema.clips)
      .values({
        studioId: w.studioA.id, fittingId: build.fittingId, buildId: build.id, view, state: "ready", originalName: `putt-${i + 1}.mp4`,
        contentType: "video/mp4", sizeBytes: 1000, objectKey: `studios/${w.studioA.id}/clips/pending-${i}/source`, captureFps: 240,
        createdAt: new Date(startAt + i * 60_000),
      })
      .returning();
    await db.update(schema.clips).set({ objectKey: `studios/${w.studioA.id}/clips/${clip!.id}/source` }).where(eqId(clip!.id));
    const entries = Object.entries(values);
    if (entries.length > 0) {
      await db.insert(schema.measurements).values(entries.map(([key, value]) => ({ studioId: w.studioA.id, clipId: clip!.id, key, value, unit: unitOf(key) })));
    }
    clips.push({ ...clip!, objectKey: `studios/${w.studioA.id}/clips/${clip!.id}/source` });
  }
  return clips;
}

const eqId = (id: string) => eq(schema.clips.id, id);
const unitOf = (key: string) => (key === "ball_speed" ? "m/s" : key === "roll_ratio" ? "ratio" : "deg");

export type CaughtMail = { to: string[]; subject: string; text: string; attachments: { filename: string; contentType: string; size: number; contentBase64: string }[] };

export async function mailTo(address: string): Promise<CaughtMail[]> {
  const res = await fetch(`${process.env.MAIL_URL}/messages`);
  const all = (await res.json()) as CaughtMail[];
  return all.filter((m) => m.to.includes(address));
}

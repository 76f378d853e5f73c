import "server-only";
// Demo booking set-up for scripts/seed.ts only (no actor: the seed runs as the operator).
// Invented demo values: two fitting types, Monday–Saturday 09:00–17:00 for each fitter.
import { eq } from "drizzle-orm";
import { db, schema } from "@/db";

export async function seedBookingDemo(studioId: string, fitterUserIds: string[]) {
  const existing = await db.select().from(schema.fittingTypes).where(eq(schema.fittingTypes.studioId, studioId));
  if (existing.length > 0) return;
  await db.insert(schema.bookingSettings).values({ studioId, cancelNoticeHours: 48, currency: "gbp" }).onConflictDoNothing();
  await db.insert(schema.fittingTypes).values([
    { studioId, name: "Full putter fitting", durationMin: 75, bufferMin: 15, feeMinor: 12000 },
    { studioId, name: "Spec check-up", durationMin: 30, bufferMin: 10, feeMinor: 4500 },
  ]);
  await db.insert(schema.availabilityRules).values(
    fitterUserIds.flatMap((fitterUserId) => [1, 2, 3, 4, 5, 6].map((weekday) => ({ studioId, fitterUserId, weekday, startMinute: 540, endMinute: 1020 }))),
  );
}

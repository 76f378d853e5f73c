// Demo data: an invented studio with staff, golfers, fittings and builds. Idempotent: it
// does nothing when the demo studio exists. Every name and number here is made up.
import { eq } from "drizzle-orm";
import bcrypt from "bcryptjs";
import { createHash } from "node:crypto";
import { db, pool, schema } from "@/db";
import { seedBookingDemo } from "@/lib/server/dal/booking-demo";
import { seedDemoClips } from "./demo-clips";
import { DEMO_PASSWORD, DEMO_STUDIO, DEMO_TOKEN, DEMO_USERS, defaultStudioSettings } from "./demo-data";

const existing = await db.select().from(schema.studios).where(eq(schema.studios.slug, DEMO_STUDIO.slug));
if (existing.length > 0) {
  console.log("demo data already present");
} else {
  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  const demoClipsFor = await db.transaction(async (tx) => {
    const [studio] = await tx.insert(schema.studios).values({ ...DEMO_STUDIO, settings: defaultStudioSettings }).returning();
    const userIds: Record<string, string> = {};
    for (const u of DEMO_USERS) {
      const [row] = await tx.insert(schema.users).values({ studioId: studio!.id, email: u.email, name: u.name, role: u.role, passwordHash: hash }).returning();
      userIds[u.email] = row!.id;
    }
    const fitter = DEMO_USERS.find((u) => u.role === "fitter")!;
    await tx.insert(schema.apiTokens).values({
      userId: userIds[fitter.email]!,
      name: "Capture computer (demo)",
      tokenHash: createHash("sha256").update(DEMO_TOKEN).digest("hex"),
    });
    const coach = DEMO_USERS.find((u) => u.role === "coach")!;
    const golferUsers = DEMO_USERS.filter((u) => u.role === "golfer");
    let firstFitting = "";
    for (const [i, g] of golferUsers.entries()) {
      const [golfer] = await tx
        .insert(schema.golfers)
        .values({
          studioId: studio!.id, userId: userIds[g.email]!, name: g.name, email: g.email, handedness: g.handedness ?? "right",
          isMinor: g.isMinor ?? false, intake: g.intake ?? {}, videoConsentAt: new Date(), videoConsentBy: g.isMinor ? "guardian" : "golfer",
        })
        .returning();
      if (i === 0) await tx.insert(schema.coachGolfers).values({ coachUserId: userIds[coach.email]!, golferId: golfer!.id });
      const when = new Date();
      when.setHours(10 + i * 2, 0, 0, 0);
      const [fitting] = await tx
        .insert(schema.fittings)
        .values({ studioId: studio!.id, golferId: golfer!.id, fitterUserId: userIds[fitter.email]!, scheduledAt: when, status: "planned", notes: "" })
        .returning();
      for (const [position, b] of (g.builds ?? []).entries()) {
        await tx.insert(schema.builds).values({ ...b, studioId: studio!.id, fittingId: fitting!.id, position: position + 1 });
      }
      if (i === 0) firstFitting = fitting!.id;
    }
    const fitterIds = DEMO_USERS.filter((u) => u.role === "fitter").map((u) => userIds[u.email]!);
    return { studioId: studio!.id, fittingId: firstFitting, fitterIds };
  });
  await seedBookingDemo(demoClipsFor.studioId, demoClipsFor.fitterIds);
  console.log("demo data created; generating demo clips…");
  await seedDemoClips(demoClipsFor.studioId, demoClipsFor.fittingId, demoClipsFor.fitterIds[0]!);
  console.log("demo clips queued for the worker");
}
await pool.end();
// The job queue client keeps a connection pool open; the seed is done.
process.exit(0);
